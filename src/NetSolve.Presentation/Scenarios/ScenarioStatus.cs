using NetSolve.Analysis;
using NetSolve.Presentation.Metrics;
using NetSolve.Solving;

namespace NetSolve.Presentation.Scenarios;

/// <summary>A unit's status in the base and in a scenario, with the words for a unit only one of them has.</summary>
public static class ScenarioStatus
{
    /// <summary>The status word for a unit the scenario added (absent from the base).</summary>
    public const string Added = "added";

    /// <summary>The status word for a unit the scenario closed (absent from the scenario).</summary>
    public const string Closed = "closed";

    /// <summary>The base's status word, or <see cref="Added"/>.</summary>
    public static string Base(UnitComparison unit)
    {
        ArgumentNullException.ThrowIfNull(unit);
        return unit.Before is null ? Added : StatusWords.Name(unit.Before.Status);
    }

    /// <summary>The scenario's status word, or <see cref="Closed"/>.</summary>
    public static string Scenario(UnitComparison unit)
    {
        ArgumentNullException.ThrowIfNull(unit);
        return unit.After is null ? Closed : StatusWords.Name(unit.After.Status);
    }

    /// <summary><c>ok -&gt; strained</c> when the status changed, else the word; for people, marked as in <c>solve</c> by the scenario's status.</summary>
    public static Cell Cell(UnitComparison unit)
    {
        ArgumentNullException.ThrowIfNull(unit);
        string text = unit.StatusChanged ? $"{Base(unit)} -> {Scenario(unit)}" : Scenario(unit);
        return Metrics.Cell.Word(text, StatusWords.Marker(unit.After?.Status ?? UnitStatus.Ok));
    }
}
