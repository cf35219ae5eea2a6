using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Presentation.Solution;
using NetSolve.Solving;

namespace NetSolve.Presentation.Scenarios;

/// <summary>
/// Writes a <see cref="ComparisonResult"/> for people: per scenario, a unit table of base, scenario and change, the
/// network totals, the status changes and the bottleneck.
/// </summary>
/// <remarks>
/// The unit table sets base and scenario side by side with their change, a shape of its own, so it is laid out here;
/// its headers are the registry's and every number is formatted by <see cref="PeopleFormat"/> and <see cref="ChangeFormat"/>.
/// </remarks>
public static class ScenarioTableWriter
{
    private static readonly Column<UnitResult> Utilisation = UnitColumns.Utilisation;
    private static readonly Column<UnitResult> Wait = UnitColumns.MeanWait;
    private static readonly Column<UnitResult> Time = UnitColumns.MeanTimeInUnit;

    /// <summary>Writes the title, then one section per scenario.</summary>
    public static void Write(ComparisonResult comparison, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(comparison);
        ArgumentNullException.ThrowIfNull(output);
        var timeUnit = comparison.Base.Network.TimeUnit;
        output.Write($"Base: {comparison.BaseName}  ({SolutionTableWriter.Title(timeUnit, comparison.Base.StrainThreshold)}; change = scenario minus base)\n");
        foreach (var scenario in comparison.Scenarios)
        {
            output.Write($"\nScenario: {scenario.Name}\n");
            var table = new TextTable(
                UnitColumns.Id.Header, ">" + UnitColumns.Servers.Header,
                $">{Utilisation.Header} base", ">" + Utilisation.Header, ">change",
                $">{Wait.Header} base", ">" + Wait.Header, ">change", ">change %",
                $">{Time.Header} base", ">" + Time.Header, UnitColumns.Status.Header);
            foreach (var unit in scenario.Units)
            {
                var wait = ComparedMetrics.Change(Wait, unit.Before, unit.After);
                table.Add(
                    unit.UnitId,
                    Servers(unit, timeUnit),
                    Value(Utilisation, unit.Before, timeUnit),
                    Value(Utilisation, unit.After, timeUnit),
                    ChangeFormat.Absolute(ComparedMetrics.Change(Utilisation, unit.Before, unit.After).Absolute, Utilisation.Dimension, timeUnit),
                    Value(Wait, unit.Before, timeUnit),
                    Value(Wait, unit.After, timeUnit),
                    ChangeFormat.Absolute(wait.Absolute, Wait.Dimension, timeUnit),
                    ChangeFormat.Relative(wait.Relative),
                    Value(Time, unit.Before, timeUnit),
                    Value(Time, unit.After, timeUnit),
                    PeopleFormat.Cell(ScenarioStatus.Cell(unit), timeUnit));
            }

            table.Write(output);
            output.Write("\n" + Totals(scenario, timeUnit) + "\n");
            output.Write(StatusChanges(scenario) + "\n");
            output.Write(Bottleneck(comparison, scenario) + "\n");
        }
    }

    /// <summary>One line: network totals before and after.</summary>
    public static string Totals(ScenarioComparison scenario, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        string Line(Column<NetworkTotals> column) => column.Header + " "
            + ChangeFormat.BeforeAfter(ComparedMetrics.Change(column, scenario.BaseTotals, scenario.Solution.Totals), column.Dimension, timeUnit);
        return $"{Line(TotalsColumns.MeanInSystem)}; {Line(TotalsColumns.MeanTimeInSystem)}"
            + (scenario.Solution.IsStable ? string.Empty : "; the scenario is UNSTABLE: network totals do not exist");
    }

    /// <summary>One line listing units whose status changed.</summary>
    public static string StatusChanges(ScenarioComparison scenario)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        var changes = scenario.StatusChanges.Select(unit => $"{unit.UnitId} {ScenarioStatus.Base(unit)} -> {ScenarioStatus.Scenario(unit)}").ToList();
        return changes.Count == 0 ? "status changes: none" : "status changes: " + string.Join("; ", changes);
    }

    /// <summary>One line naming the scenario's bottleneck and whether it moved.</summary>
    public static string Bottleneck(ComparisonResult comparison, ScenarioComparison scenario)
    {
        ArgumentNullException.ThrowIfNull(comparison);
        ArgumentNullException.ThrowIfNull(scenario);
        string now = scenario.Bottlenecks.IsEmpty ? "none" : string.Join(", ", scenario.Bottlenecks);
        string was = comparison.BaseBottlenecks.IsEmpty ? "none" : string.Join(", ", comparison.BaseBottlenecks);
        return scenario.Bottlenecks.SequenceEqual(comparison.BaseBottlenecks)
            ? $"bottleneck: {now} (unchanged)"
            : $"new bottleneck: {now} (was {was})";
    }

    private static string Value(Column<UnitResult> column, UnitResult? result, TimeUnit timeUnit) =>
        PeopleFormat.Cell(ComparedMetrics.Read(column, result), timeUnit);

    /// <summary>The servers, or <c>base -&gt; scenario</c> when they differ; <c>-</c> for a unit added or closed.</summary>
    private static string Servers(UnitComparison unit, TimeUnit timeUnit)
    {
        string Of(UnitResult? result) => result is null ? PeopleFormat.Missing : Value(UnitColumns.Servers, result, timeUnit);
        string before = Of(unit.Before);
        string after = Of(unit.After);
        return before == after ? after : $"{before} -> {after}";
    }
}
