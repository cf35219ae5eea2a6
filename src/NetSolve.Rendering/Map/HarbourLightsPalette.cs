using NetSolve.Model;
using NetSolve.Presentation;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Solving;

namespace NetSolve.Rendering.Map;

/// <summary>
/// The "Harbour Lights" status palette of the bottleneck map and the report.
/// </summary>
/// <remarks>
/// Designed so that status reads without colour vision: fills darken steadily with severity (pale blue, light
/// amber, orange, deep plum), so the order survives greyscale print and the common red-green deficiencies, which
/// keep the blue-orange axis; each status also has its own border (thin solid, dashed, double, dotted), glyph
/// (circle, triangle, diamond, cross) and the contract's word. Text colours meet the WCAG 2.x contrast minimum of 4.5:1 on their fill.
/// </remarks>
public static class HarbourLightsPalette
{
    /// <summary>Name shown in legends and documentation.</summary>
    public const string Name = "Harbour Lights";

    private static readonly StatusStyle OkStyle = new("\u25CB", "#E3EEF7", "#13233A", "#3D5F80", 1.5, "", false);

    private static readonly StatusStyle StrainedStyle = new("\u25B2", "#E8AE3A", "#2B1D00", "#7A5300", 2.5, "7 4", false);

    private static readonly StatusStyle BottleneckStyle = new("\u25C6", "#D9651C", "#1A0A00", "#5A2200", 2.5, "", true);

    private static readonly StatusStyle UnstableStyle = new("\u2716", "#4A1450", "#FFFFFF", "#0D0010", 3.5, "2 3", false);

    /// <summary>The style of <paramref name="status"/>.</summary>
    public static StatusStyle For(UnitStatus status) => status switch
    {
        UnitStatus.Ok => OkStyle,
        UnitStatus.Strained => StrainedStyle,
        UnitStatus.Bottleneck => BottleneckStyle,
        UnitStatus.Unstable => UnstableStyle,
        _ => throw new ArgumentOutOfRangeException(nameof(status), status, "Unknown unit status."),
    };

    /// <summary>A status cell for the map and the report: the contract's word, with the glyph as its marker.</summary>
    /// <remarks>Plain-text tables mark the word with <see cref="StatusWords.Marker"/>; here the glyph, fill and border do that.</remarks>
    public static Cell Cell(UnitStatus status) => Presentation.Metrics.Cell.Word(StatusWords.Name(status), For(status).Glyph);

    /// <summary>The status as the map and the report write it: the glyph, then the contract's word (<c>◆ bottleneck</c>).</summary>
    public static string Text(UnitStatus status) =>
        // A word has no time unit; any unit gives the same text.
        PeopleFormat.Cell(Cell(status), TimeUnit.Hour);

    /// <summary>Every status, mildest first, for legends.</summary>
    public static IReadOnlyList<UnitStatus> Order { get; } =
        [UnitStatus.Ok, UnitStatus.Strained, UnitStatus.Bottleneck, UnitStatus.Unstable];
}
