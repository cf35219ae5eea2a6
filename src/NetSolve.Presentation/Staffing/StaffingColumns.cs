using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;
using NetSolve.Presentation.Solution;
using NetSolve.Solving;

namespace NetSolve.Presentation.Staffing;

/// <summary>
/// The registry of a targets search's units: ids as in the contract's <c>units</c> objects and CSV columns, headers
/// for people. The metrics before and after are the solve registry's own (<see cref="UnitColumns"/>).
/// </summary>
public static class StaffingColumns
{
    /// <summary>The unit's id.</summary>
    public static readonly Column<StaffingRow> Id = Columns.Words<StaffingRow>("id", "unit", row => row.Unit.UnitId);

    /// <summary>Servers today; absent for unlimited.</summary>
    public static readonly Column<StaffingRow> Servers = new("servers", "servers", MetricDimension.Servers, row => Cell.Of(row.Unit.CurrentServers, MetricDimension.Servers));

    /// <summary>The fewest servers that meet every target; absent (not <c>unlimited</c>) for unlimited servers or when impossible.</summary>
    public static readonly Column<StaffingRow> Required = Columns.Number<StaffingRow>("required", "needed", MetricDimension.Plain, row => row.Unit.RequiredServers, Audience.Machines);

    /// <summary>
    /// <see cref="Required"/> for people: <c>unlimited</c> for a unit without a limit, <c>-</c> when no number of servers
    /// meets the targets (the line under the table says why).
    /// </summary>
    public static readonly Column<StaffingRow> Needed = new("required", "needed", MetricDimension.Servers, Needs, Audience.People);

    /// <summary>Servers to add.</summary>
    public static readonly Column<StaffingRow> Added = Columns.Number<StaffingRow>("added", "added", MetricDimension.Servers, row => row.Unit.Added);

    /// <summary>The weight of one added server here (1 unless given).</summary>
    public static readonly Column<StaffingRow> CostPerServer = Columns.Number<StaffingRow>("cost_per_server", "cost per server", MetricDimension.Plain, row => row.Unit.CostPerServer, Audience.Machines);

    /// <summary>Added servers times their cost.</summary>
    public static readonly Column<StaffingRow> Cost = Columns.Number<StaffingRow>("cost", "cost", MetricDimension.Plain, row => row.Unit.Cost);

    /// <summary>Utilisation as given.</summary>
    public static readonly Column<StaffingRow> UtilisationBefore = BeforeAndAfter.Before<StaffingRow, UnitResult>(UnitColumns.Utilisation, row => row.Before);

    /// <summary>Utilisation with the required servers.</summary>
    public static readonly Column<StaffingRow> UtilisationAfter = BeforeAndAfter.After<StaffingRow, UnitResult>(UnitColumns.Utilisation, row => row.After);

    /// <summary>Mean wait as given.</summary>
    public static readonly Column<StaffingRow> MeanWaitBefore = BeforeAndAfter.Before<StaffingRow, UnitResult>(UnitColumns.MeanWait, row => row.Before);

    /// <summary>Mean wait with the required servers.</summary>
    public static readonly Column<StaffingRow> MeanWaitAfter = BeforeAndAfter.After<StaffingRow, UnitResult>(UnitColumns.MeanWait, row => row.After);

    /// <summary>
    /// The share of patients waiting longer than the wait-tail target's time, with the required servers; absent without
    /// that target. A share compared with a percentage target, so people read it as a percentage.
    /// </summary>
    public static readonly Column<StaffingRow> LongWaitAfter = Columns.Number<StaffingRow>("p_wait_over_after", "P(long wait) after", MetricDimension.Fraction, LongWait);

    /// <summary>
    /// P(full) with the required servers: the share of arriving patients who find the unit full; absent for a unit
    /// without a capacity. A share compared with the --max-turned-away target, so people read it as a percentage.
    /// </summary>
    public static readonly Column<StaffingRow> FullAfter = Columns.Number<StaffingRow>("p_full_after", "P(full) after", MetricDimension.Fraction,
        row => row.After is { Unit.Capacity: not null } result ? result.PFull : null);

    /// <summary>Why no number of servers meets the targets; absent when they can be met. JSON only: people read it under the table.</summary>
    public static readonly Column<StaffingRow> Impossible = new("impossible", "impossible", MetricDimension.Plain, row => row.Unit.Impossible is string why ? Cell.Word(why) : Cell.Of(null, MetricDimension.Plain), Audience.Machines);

    /// <summary>The network's time unit. CSV only: each row says the unit of its times.</summary>
    public static readonly Column<StaffingRow> TimeUnit = Columns.Words<StaffingRow>("time_unit", "time unit", row => TimeConstants.Name(row.TimeUnit), Audience.Machines);

    /// <summary>The columns every format shares (people's and programs' variants), in the contract's order, without <see cref="FullAfter"/>.</summary>
    public static readonly ImmutableArray<Column<StaffingRow>> All =
    [
        Id, Servers, Required, Needed, Added, CostPerServer, Cost, UtilisationBefore, UtilisationAfter, MeanWaitBefore, MeanWaitAfter, LongWaitAfter,
    ];

    /// <summary>The table for people of a network with a unit of limited capacity: <see cref="All"/> and <see cref="FullAfter"/>.</summary>
    public static readonly ImmutableArray<Column<StaffingRow>> WithCapacity = [.. All, FullAfter];

    /// <summary>The JSON <c>units</c> objects: <see cref="All"/>, <see cref="FullAfter"/> and <see cref="Impossible"/>.</summary>
    public static readonly ImmutableArray<Column<StaffingRow>> Json = [.. All, FullAfter, Impossible];

    /// <summary>The CSV columns: <see cref="All"/>, <see cref="FullAfter"/> and <see cref="TimeUnit"/>.</summary>
    public static readonly ImmutableArray<Column<StaffingRow>> Csv = [.. All, FullAfter, TimeUnit];

    /// <summary>The rows of <paramref name="plan"/>, in file order.</summary>
    public static IEnumerable<StaffingRow> Rows(StaffingPlan plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        return plan.Units.Select((unit, i) => new StaffingRow(unit, plan.Before.Units[i], plan.After?.Units[i], plan.Targets, plan.Before.Network.TimeUnit));
    }

    /// <summary>The table of <paramref name="plan"/>'s units over <paramref name="columns"/>.</summary>
    public static ResultTable Table(StaffingPlan plan, IEnumerable<Column<StaffingRow>> columns)
    {
        ArgumentNullException.ThrowIfNull(plan);
        return ResultTable.Build(columns, Rows(plan), plan.Before.Network.TimeUnit);
    }

    private static Cell Needs(StaffingRow row) => row.Unit switch
    {
        { RequiredServers: int required } => Cell.Of(required, MetricDimension.Servers),
        { CurrentServers: null } => Cell.Of(null, MetricDimension.Servers),
        _ => Cell.Of(null, MetricDimension.Plain),
    };

    private static double? LongWait(StaffingRow row) =>
        row.Targets.WaitTail is WaitTailTarget tail && row.After is { } result ? tail.ShareWaitingLonger(result) : null;
}
