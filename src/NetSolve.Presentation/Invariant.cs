using System.Globalization;

namespace NetSolve.Presentation;

/// <summary>Number formatting for every rendered output: invariant culture, units always shown.</summary>
public static class Invariant
{
    /// <summary>Magnitudes below this print as "&lt; 0.001": too small to plan with, and kept out of exponent form.</summary>
    public const double Smallest = 0.001;

    /// <summary>A number with up to three significant digits, never in exponent form for hospital-scale values.</summary>
    public static string Number(double value)
    {
        if (value == 0.0)
        {
            return "0";
        }

        if (Math.Abs(value) < Smallest)
        {
            return value > 0.0 ? "< 0.001" : "> -0.001";
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
            _ => "0.#####",
        };
        return value.ToString(format, CultureInfo.InvariantCulture);
    }

    /// <summary>Two significant digits below 10, for the tight space of a map box: 0.0385 gives <c>0.039</c>; from 10 up as <see cref="Number"/>.</summary>
    public static string Brief(double value)
    {
        double magnitude = Math.Abs(value);
        if (magnitude >= 10.0 || value == 0.0)
        {
            return Number(value);
        }

        int decimals = Math.Max(1, 1 - (int)Math.Floor(Math.Log10(magnitude)));
        return Math.Round(value, decimals).ToString("0." + new string('#', decimals), CultureInfo.InvariantCulture);
    }

    /// <summary>A fraction as a percentage with one decimal: 0.8764 gives <c>87.6%</c>.</summary>
    public static string Percent(double fraction) =>
        (fraction * 100.0).ToString("0.0", CultureInfo.InvariantCulture) + "%";

    /// <summary>A growth factor with three decimals: <c>1.142</c>.</summary>
    public static string Factor(double factor) => factor.ToString("0.000", CultureInfo.InvariantCulture);

    /// <summary>A coordinate for SVG output: two decimals, no grouping.</summary>
    public static string Coordinate(double value) => value.ToString("0.##", CultureInfo.InvariantCulture);
}
