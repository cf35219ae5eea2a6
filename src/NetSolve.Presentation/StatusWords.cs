using NetSolve.Presentation.Metrics;
using NetSolve.Solving;

namespace NetSolve.Presentation;

/// <summary>The contract's status words and the markers that make them stand out in plain text, in one place.</summary>
public static class StatusWords
{
    /// <summary>The contract's word: <c>ok</c>, <c>strained</c>, <c>bottleneck</c> or <c>unstable</c>.</summary>
    public static string Name(UnitStatus status) => status switch
    {
        UnitStatus.Ok => "ok",
        UnitStatus.Strained => "strained",
        UnitStatus.Bottleneck => "bottleneck",
        UnitStatus.Unstable => "unstable",
        _ => throw new ArgumentOutOfRangeException(nameof(status), status, "Unknown status."),
    };

    /// <summary>The sign printed before the word in plain text, so status reads at a glance without colour.</summary>
    public static string Marker(UnitStatus status) => status switch
    {
        UnitStatus.Unstable => "!!",
        UnitStatus.Bottleneck => ">>",
        UnitStatus.Strained => " !",
        _ => "  ",
    };

    /// <summary>A status cell: the word, with its marker for people.</summary>
    public static Cell Cell(UnitStatus status) => Metrics.Cell.Word(Name(status), Marker(status));
}
