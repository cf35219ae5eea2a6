using System.Globalization;

namespace NetSolve.Tests.Presentation;

/// <summary>
/// Reads back a number as people see it (docs/map-and-report.md, "Numbers for people") into the interval of values
/// that print that way, so a test can check that a printed number stands for the machine value.
/// </summary>
internal static class PeopleNumber
{
    private static readonly (string Suffix, double InFileUnit)[] NoTimeSuffix = [(string.Empty, 1.0)];

    /// <summary>
    /// The closed interval of values that print as <paramref name="text"/>, in the file's time unit for times
    /// (<paramref name="hoursPerFileUnit"/> hours in one file unit); null for <c>-</c> or <c>unlimited</c>.
    /// </summary>
    public static (double Low, double High)? Interval(string text, double hoursPerFileUnit)
    {
        text = text.Trim();
        if (text is "-" or "unlimited")
        {
            return null;
        }

        (string Suffix, double Factor)[] times =
        [
            (" min", 1.0 / 60.0 / hoursPerFileUnit),
            (" h", 1.0 / hoursPerFileUnit),
            (" d", 24.0 / hoursPerFileUnit),
        ];
        foreach (var (suffix, factor) in times.Concat(NoTimeSuffix))
        {
            if (suffix.Length > 0 && !text.EndsWith(suffix, StringComparison.Ordinal))
            {
                continue;
            }

            string number = text[..^suffix.Length];
            double scale = factor;
            if (number.EndsWith('%'))
            {
                number = number[..^1];
                scale /= 100.0;
            }

            if (number.StartsWith("< ", StringComparison.Ordinal))
            {
                return (0.0, Parse(number[2..]) * scale);
            }

            double value = Parse(number);
            int dot = number.IndexOf('.', StringComparison.Ordinal);
            double halfDigit = 0.5 * Math.Pow(10, dot < 0 ? 0 : -(number.Length - dot - 1));
            return ((value - halfDigit) * scale, (value + halfDigit) * scale);
        }

        throw new FormatException($"'{text}' is not a number for people");
    }

    private static double Parse(string number) =>
        double.Parse(number.Replace(",", string.Empty, StringComparison.Ordinal), NumberStyles.Float, CultureInfo.InvariantCulture);
}
