using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;
using NetSolve.Presentation.Solution;
using NetSolve.Solving;

namespace NetSolve.Presentation.Staffing;

/// <summary>
/// The registry of a budget allocation's units: ids as in the contract's <c>units</c> objects and CSV columns,
/// headers for people. The metrics before and after are the solve registry's own (<see cref="UnitColumns"/>).
/// </summary>
public static class BudgetColumns
{
    /// <summary>The unit's id.</summary>
    public static readonly Column<BudgetRow> Id = Columns.Words<BudgetRow>("id", "unit", row => row.Unit.UnitId);

    /// <summary>Servers today (always a number: only units with a limit take servers).</summary>
    public static readonly Column<BudgetRow> Servers = Columns.Number<BudgetRow>("servers", "servers", MetricDimension.Servers, row => row.Unit.CurrentServers);

    /// <summary>Servers placed here.</summary>
    public static readonly Column<BudgetRow> Added = Columns.Number<BudgetRow>("added", "added", MetricDimension.Servers, row => row.Unit.Added);

    /// <summary>Of the servers placed here, how many were needed only to make the unit stable.</summary>
    public static readonly Column<BudgetRow> AddedForStability = Columns.Number<BudgetRow>("added_for_stability", "for stability", MetricDimension.Servers, row => row.Unit.NeededForStability);

    /// <summary>Utilisation as given.</summary>
    public static readonly Column<BudgetRow> UtilisationBefore = BeforeAndAfter.Before<BudgetRow, UnitResult>(UnitColumns.Utilisation, row => row.Before);

    /// <summary>Utilisation with the servers placed.</summary>
    public static readonly Column<BudgetRow> UtilisationAfter = BeforeAndAfter.After<BudgetRow, UnitResult>(UnitColumns.Utilisation, row => row.After);

    /// <summary>Mean wait as given.</summary>
    public static readonly Column<BudgetRow> MeanWaitBefore = BeforeAndAfter.Before<BudgetRow, UnitResult>(UnitColumns.MeanWait, row => row.Before);

    /// <summary>Mean wait with the servers placed.</summary>
    public static readonly Column<BudgetRow> MeanWaitAfter = BeforeAndAfter.After<BudgetRow, UnitResult>(UnitColumns.MeanWait, row => row.After);

    /// <summary>The network's time unit. CSV only: each row says the unit of its times.</summary>
    public static readonly Column<BudgetRow> TimeUnit = Columns.Words<BudgetRow>("time_unit", "time unit", row => TimeConstants.Name(row.TimeUnit), Audience.Machines);

    /// <summary>The columns of the table and of the JSON <c>units</c> objects, in the contract's order.</summary>
    public static readonly ImmutableArray<Column<BudgetRow>> All =
    [
        Id, Servers, Added, AddedForStability, UtilisationBefore, UtilisationAfter, MeanWaitBefore, MeanWaitAfter,
    ];

    /// <summary>The CSV columns: <see cref="All"/> and <see cref="TimeUnit"/>.</summary>
    public static readonly ImmutableArray<Column<BudgetRow>> Csv = [.. All, TimeUnit];

    /// <summary>The rows of <paramref name="plan"/>: the units that can take servers, in file order.</summary>
    public static IEnumerable<BudgetRow> Rows(BudgetPlan plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        var index = plan.Before.Network.BuildIndex();
        return plan.Units.Select(unit => new BudgetRow(
            unit, plan.Before.Units[index[unit.UnitId]], plan.After?.Units[index[unit.UnitId]], plan.Before.Network.TimeUnit));
    }

    /// <summary>The table of <paramref name="plan"/>'s units over <paramref name="columns"/>.</summary>
    public static ResultTable Table(BudgetPlan plan, IEnumerable<Column<BudgetRow>> columns)
    {
        ArgumentNullException.ThrowIfNull(plan);
        return ResultTable.Build(columns, Rows(plan), plan.Before.Network.TimeUnit);
    }
}
