using System.Globalization;

namespace NetSolve.Rendering.Text;

/// <summary>Number formatting for every rendered output: invariant culture, units always shown.</summary>
internal static class Invariant
{
    /// <summary>A number with up to three significant digits, never in exponent form for hospital-scale values.</summary>
    public static string Number(double value)
    {
        if (value == 0.0)
        {
            return "0";
        }

        double magnitude = Math.Abs(value);
        string format = magnitude switch
        {
            >= 1000.0 => "#,0",
            >= 100.0 => "0",
            >= 10.0 => "0.#",
            >= 1.0 => "0.##",
            >= 0.1 => "0.###",
            >= 0.01 => "0.####",
            >= 0.001 => "0.#####",
            _ => "0.###E+0",
        };
        return value.ToString(format, CultureInfo.InvariantCulture);
    }

    /// <summary>A fraction as a percentage with one decimal: 0.8764 gives <c>87.6%</c>.</summary>
    public static string Percent(double fraction) =>
        (fraction * 100.0).ToString("0.0", CultureInfo.InvariantCulture) + "%";

    /// <summary>A growth factor with three decimals: <c>1.142</c>.</summary>
    public static string Factor(double factor) => factor.ToString("0.000", CultureInfo.InvariantCulture);

    /// <summary>A coordinate for SVG output: two decimals, no grouping.</summary>
    public static string Coordinate(double value) => value.ToString("0.##", CultureInfo.InvariantCulture);
}
