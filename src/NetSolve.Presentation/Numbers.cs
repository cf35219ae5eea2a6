using System.Globalization;

namespace NetSolve.Presentation;

/// <summary>How numbers look in tables meant for people: invariant culture, a sensible number of digits.</summary>
public static class Numbers
{
    /// <summary>A dash, for a value that does not exist (such as the wait of an unstable unit).</summary>
    public const string Missing = "-";

    /// <summary>Fixed decimals; <see cref="Missing"/> for null.</summary>
    public static string Fixed(double? value, int decimals) =>
        value is double number ? number.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) : Missing;

    /// <summary>About four significant digits without exponent for everyday magnitudes; <see cref="Missing"/> for null.</summary>
    public static string Compact(double? value)
    {
        if (value is not double number)
        {
            return Missing;
        }

        double magnitude = Math.Abs(number);
        if (magnitude == 0.0)
        {
            return "0";
        }

        if (magnitude >= 1e7 || magnitude < 1e-4)
        {
            return number.ToString("0.###E+0", CultureInfo.InvariantCulture);
        }

        int decimals = magnitude >= 1000 ? 0 : magnitude >= 100 ? 1 : magnitude >= 10 ? 2 : magnitude >= 1 ? 3 : 4;
        return number.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
    }

    /// <summary>A fraction as a percentage with one decimal, e.g. 0.8765 as <c>87.7%</c>.</summary>
    public static string Percent(double? fraction) =>
        fraction is double value ? (value * 100.0).ToString("F1", CultureInfo.InvariantCulture) + "%" : Missing;
}
