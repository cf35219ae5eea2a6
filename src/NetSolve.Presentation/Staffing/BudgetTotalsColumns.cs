using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;
using NetSolve.Presentation.Solution;
using NetSolve.Solving;

namespace NetSolve.Presentation.Staffing;

/// <summary>The registry of a budget allocation's totals: ids as the contract's top-level fields.</summary>
public static class BudgetTotalsColumns
{
    /// <summary>Extra servers to place.</summary>
    public static readonly Column<BudgetPlan> Budget = Columns.Number<BudgetPlan>("budget", "budget", MetricDimension.Servers, plan => plan.Budget);

    /// <summary>Servers placed.</summary>
    public static readonly Column<BudgetPlan> Placed = Columns.Number<BudgetPlan>("placed", "placed", MetricDimension.Servers, plan => plan.Placed);

    /// <summary>Why the budget cannot make every unit stable; absent when it can. People read it under the table.</summary>
    public static readonly Column<BudgetPlan> Impossible = new("impossible", "impossible", MetricDimension.Plain, plan => plan.Impossible is string why ? Cell.Word(why) : Cell.Of(null, MetricDimension.Plain), Audience.Machines);

    /// <summary>Mean time in the network as given.</summary>
    public static readonly Column<BudgetPlan> MeanTimeInSystemBefore = BeforeAndAfter.Before<BudgetPlan, NetworkTotals>(TotalsColumns.MeanTimeInSystem, plan => plan.Before.Totals);

    /// <summary>Mean time in the network with the servers placed.</summary>
    public static readonly Column<BudgetPlan> MeanTimeInSystemAfter = BeforeAndAfter.After<BudgetPlan, NetworkTotals>(TotalsColumns.MeanTimeInSystem, plan => plan.After?.Totals);

    /// <summary>Mean patients in the network as given; for people, beside the time.</summary>
    public static readonly Column<BudgetPlan> MeanInSystemBefore = BeforeAndAfter.Before<BudgetPlan, NetworkTotals>(TotalsColumns.MeanInSystem with { Audience = Audience.People }, plan => plan.Before.Totals);

    /// <summary>Mean patients in the network with the servers placed; for people.</summary>
    public static readonly Column<BudgetPlan> MeanInSystemAfter = BeforeAndAfter.After<BudgetPlan, NetworkTotals>(TotalsColumns.MeanInSystem with { Audience = Audience.People }, plan => plan.After?.Totals);

    /// <summary>Every total, in the contract's order; the patients in the network are for people only.</summary>
    public static readonly ImmutableArray<Column<BudgetPlan>> All =
    [
        Budget, Placed, Impossible, MeanTimeInSystemBefore, MeanTimeInSystemAfter, MeanInSystemBefore, MeanInSystemAfter,
    ];

    /// <summary>The one-row totals table of <paramref name="plan"/>.</summary>
    public static ResultTable Table(BudgetPlan plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        return ResultTable.Build(All, [plan], plan.Before.Network.TimeUnit);
    }
}
