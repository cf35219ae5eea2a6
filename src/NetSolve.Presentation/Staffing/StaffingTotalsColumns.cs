using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;
using NetSolve.Presentation.Solution;
using NetSolve.Solving;

namespace NetSolve.Presentation.Staffing;

/// <summary>The registry of a targets search's totals: ids as the contract's top-level fields.</summary>
public static class StaffingTotalsColumns
{
    /// <summary>Servers added over all units.</summary>
    public static readonly Column<StaffingPlan> TotalAdded = Columns.Number<StaffingPlan>("total_added", "added", MetricDimension.Servers, plan => plan.TotalAdded);

    /// <summary>Cost of the added servers over all units.</summary>
    public static readonly Column<StaffingPlan> TotalCost = Columns.Number<StaffingPlan>("total_cost", "cost", MetricDimension.Plain, plan => plan.TotalCost);

    /// <summary>Mean time in the network as given.</summary>
    public static readonly Column<StaffingPlan> MeanTimeInSystemBefore = BeforeAndAfter.Before<StaffingPlan, NetworkTotals>(TotalsColumns.MeanTimeInSystem, plan => plan.Before.Totals);

    /// <summary>Mean time in the network with the required servers; absent when some unit cannot meet the targets.</summary>
    public static readonly Column<StaffingPlan> MeanTimeInSystemAfter = BeforeAndAfter.After<StaffingPlan, NetworkTotals>(TotalsColumns.MeanTimeInSystem, plan => plan.After?.Totals);

    /// <summary>Every total, in the contract's order.</summary>
    public static readonly ImmutableArray<Column<StaffingPlan>> All = [TotalAdded, TotalCost, MeanTimeInSystemBefore, MeanTimeInSystemAfter];

    /// <summary>The one-row totals table of <paramref name="plan"/>.</summary>
    public static ResultTable Table(StaffingPlan plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        return ResultTable.Build(All, [plan], plan.Before.Network.TimeUnit);
    }
}
