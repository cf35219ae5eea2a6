using ScottPlot;

namespace NetSolve.Rendering.Report;

/// <summary>
/// Line styles of the report's charts: each series differs in colour, dash pattern and marker, so curves can be told
/// apart in greyscale print and by colour-blind readers.
/// </summary>
public static class ChartSeriesStyles
{
    /// <summary>Colours, dark enough for 3:1 against white (WCAG 2.x non-text contrast).</summary>
    public static IReadOnlyList<string> Colours { get; } =
        ["#1F4E79", "#B5470F", "#2E6B30", "#6B3FA0", "#7A5300", "#0E6670", "#9E2A2B", "#444444"];

    /// <summary>Dash patterns, repeated in turn; with the colours and markers no two series look alike.</summary>
    public static IReadOnlyList<LinePattern> Patterns { get; } = [LinePattern.Solid, LinePattern.Dashed, LinePattern.Dotted, LinePattern.DenselyDashed];

    /// <summary>Markers, one per series.</summary>
    public static IReadOnlyList<MarkerShape> Markers { get; } =
        [MarkerShape.FilledCircle, MarkerShape.FilledSquare, MarkerShape.FilledTriangleUp, MarkerShape.FilledDiamond, MarkerShape.OpenCircle, MarkerShape.OpenSquare, MarkerShape.OpenTriangleUp, MarkerShape.Cross];

    /// <summary>Gives series <paramref name="index"/> (0-based, below <see cref="Count"/>) its colour, dash and marker.</summary>
    public static void Apply(ScottPlot.Plottables.Scatter series, int index)
    {
        ArgumentNullException.ThrowIfNull(series);
        series.Color = Color.FromHex(Colours[index]);
        series.LineWidth = 2;
        series.LinePattern = Patterns[index % Patterns.Count];
        series.MarkerShape = Markers[index];
        series.MarkerSize = 5;
    }

    /// <summary>Number of distinct series styles; the chart shows at most this many units.</summary>
    public static int Count => Colours.Count;
}
