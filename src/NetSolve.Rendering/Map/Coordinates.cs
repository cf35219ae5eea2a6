using System.Globalization;

namespace NetSolve.Rendering.Map;

/// <summary>Positions and sizes written into SVG, DOT and CSS: drawing instructions, not values people read.</summary>
internal static class Coordinates
{
    /// <summary>Two decimals at most, no grouping, invariant culture: <c>12.5</c>, <c>480</c>.</summary>
    public static string Format(double value) => value.ToString("0.##", CultureInfo.InvariantCulture);
}
