namespace NetSolve.Rendering.Report;

/// <summary>
/// Line styles of the wait chart: each series differs in colour, dash pattern and marker, so curves can be told
/// apart in greyscale print and by colour-blind readers.
/// </summary>
public static class ChartSeriesStyles
{
    /// <summary>Colours, dark enough for 3:1 against white (WCAG 2.x non-text contrast).</summary>
    public static IReadOnlyList<string> Colours { get; } =
        ["#1F4E79", "#B5470F", "#2E6B30", "#6B3FA0", "#7A5300", "#0E6670", "#9E2A2B", "#444444"];

    /// <summary>Number of distinct series styles; the chart shows at most this many units.</summary>
    public static int Count => Colours.Count;
}
