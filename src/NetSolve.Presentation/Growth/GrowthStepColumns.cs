using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;
using NetSolve.Presentation.Solution;
using NetSolve.Solving;

namespace NetSolve.Presentation.Growth;

/// <summary>
/// The registry of one growth step: its factor, the network totals and the unit metrics each step reports. Ids as in
/// the contract's <c>steps</c> objects; the totals and unit metrics are the solution's own registries, not copies.
/// </summary>
public static class GrowthStepColumns
{
    /// <summary>The multiple of today's demand.</summary>
    public static readonly Column<GrowthStep> Factor = Columns.Number<GrowthStep>("factor", "factor", MetricDimension.Factor, step => step.Factor);

    /// <summary>Patients arriving from outside at the step's demand.</summary>
    public static readonly Column<NetworkTotals> ExternalArrivalRate = TotalsColumns.ExternalArrivalRate;

    /// <summary>Mean time in the network at the step's demand; absent when unstable.</summary>
    public static readonly Column<NetworkTotals> MeanTimeInSystem = TotalsColumns.MeanTimeInSystem;

    /// <summary>The metrics of each unit at a step, in the contract's order.</summary>
    public static readonly ImmutableArray<Column<UnitResult>> Units =
        [UnitColumns.Id, UnitColumns.Utilisation, UnitColumns.MeanWait, UnitColumns.MeanTimeInUnit, UnitColumns.Status];

    /// <summary>The units of one step.</summary>
    public static ResultTable UnitTable(GrowthStep step, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(step);
        return ResultTable.Build(Units, step.Solution.Units, timeUnit);
    }

    /// <summary>
    /// One metric of the units at <paramref name="columns"/> (indexes in file order) across the steps: a row per
    /// factor, a column per unit, headed by the unit's id.
    /// </summary>
    public static ResultTable Grid(GrowthResult growth, IEnumerable<int> columns, Column<UnitResult> metric)
    {
        ArgumentNullException.ThrowIfNull(growth);
        ArgumentNullException.ThrowIfNull(metric);
        var units = columns.Select(index => new Column<GrowthStep>(
            growth.Network.Units[index].Id, growth.Network.Units[index].Id, metric.Dimension, step => metric.Read(step.Solution.Units[index]), Audience.People));
        return ResultTable.Build([Factor, .. units], growth.Steps, growth.Network.TimeUnit);
    }
}
