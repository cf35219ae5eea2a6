namespace NetSolve.Rendering.Map;

/// <summary>Font sizes, spacing and line widths of the map, in map units (one unit prints as 1/96 inch at 100%).</summary>
public static class MapTypography
{
    /// <summary>The font stack: DejaVu Sans first because box sizes are estimated from its (wide) advance widths.</summary>
    public const string FontFamily = "DejaVu Sans, Liberation Sans, Arial, Helvetica, sans-serif";

    /// <summary>Unit labels (bold).</summary>
    public const double LabelSize = 12.5;

    /// <summary>Status word and metrics inside boxes.</summary>
    public const double DetailSize = 12.0;

    /// <summary>Rates on flow lines. No text on the map is smaller than <see cref="DetailSize"/> and this.</summary>
    public const double RateSize = 12.0;

    /// <summary>Line height as a multiple of the font size.</summary>
    public const double LineSpacing = 1.3;

    /// <summary>Space between box border and text.</summary>
    public const double Padding = 7.0;

    /// <summary>Labels longer than this are wrapped onto further lines.</summary>
    public const double MaxLabelWidth = 96.0;

    /// <summary>A unit label takes at most this many lines; the rest is cut with an ellipsis (full text in the tooltip).</summary>
    public const int MaxLabelLines = 4;

    /// <summary>A single word wider than <see cref="MaxLabelWidth"/> keeps its own line up to this width, then is cut with an ellipsis.</summary>
    public const double MaxLabelWordWidth = 2.0 * MaxLabelWidth;

    /// <summary>On a large map a label takes one line, cut with an ellipsis beyond this width (full text in the tooltip).</summary>
    public const double MaxCompactLabelWidth = 1.5 * MaxLabelWidth;

    /// <summary>The map's title is cut with an ellipsis beyond this width or the graph's, whichever is wider.</summary>
    public const double MaxTitleWidth = 960.0;

    /// <summary>Boxes are at least this wide, so short labels still leave room for the metrics.</summary>
    public const double MinUnitWidth = 90.0;

    /// <summary>Width of the flow line carrying the largest flow.</summary>
    public const double MaxStrokeWidth = 10.0;

    /// <summary>Thinnest flow line drawn, so a small flow stays visible.</summary>
    public const double MinStrokeWidth = 1.0;

    /// <summary>Space around the laid-out graph.</summary>
    public const double Margin = 16.0;
}
