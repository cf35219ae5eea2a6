using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;
using NetSolve.Solving;

namespace NetSolve.Presentation.Solution;

/// <summary>
/// The registry of a solved unit's metrics: the contract's id (JSON field, CSV column), the header people read, the
/// dimension and the accessor. Table, CSV, JSON, report and map all read a unit through these.
/// </summary>
public static class UnitColumns
{
    /// <summary>The unit's id.</summary>
    public static readonly Column<UnitResult> Id = Columns.Words<UnitResult>("id", "unit", result => result.Unit.Id);

    /// <summary>The unit's display name.</summary>
    public static readonly Column<UnitResult> Label = Columns.Words<UnitResult>("label", "label", result => result.Unit.Label, Audience.Machines);

    /// <summary>Servers; absent for unlimited.</summary>
    public static readonly Column<UnitResult> Servers = new("servers", "servers", MetricDimension.Servers, result => Cell.Of(result.Unit.Servers));

    /// <summary>Total flow into the unit.</summary>
    public static readonly Column<UnitResult> ArrivalRate = Columns.Number<UnitResult>("arrival_rate", "arrivals", MetricDimension.Rate, result => result.ArrivalsPerHour);

    /// <summary>Mean visits per patient entering the network.</summary>
    public static readonly Column<UnitResult> Visits = Columns.Number<UnitResult>("visits_per_patient", "visits", MetricDimension.Plain, result => result.VisitsPerPatient);

    /// <summary>Offered load in erlangs.</summary>
    public static readonly Column<UnitResult> OfferedLoad = Columns.Number<UnitResult>("offered_load", "load", MetricDimension.Plain, result => result.OfferedLoad);

    /// <summary>Utilisation: load over servers.</summary>
    public static readonly Column<UnitResult> Utilisation = Columns.Number<UnitResult>("utilisation", "util", MetricDimension.Fraction, result => result.Utilisation);

    /// <summary>The chance an arriving patient waits.</summary>
    public static readonly Column<UnitResult> WaitProbability = Columns.Number<UnitResult>("p_wait", "P(wait)", MetricDimension.Probability, result => result.WaitProbability);

    /// <summary>Mean number waiting.</summary>
    public static readonly Column<UnitResult> MeanQueue = Columns.Number<UnitResult>("mean_queue", "queue", MetricDimension.Count, result => result.MeanQueue);

    /// <summary>Mean wait before service.</summary>
    public static readonly Column<UnitResult> MeanWait = Columns.Number<UnitResult>("mean_wait", "wait", MetricDimension.Time, result => result.MeanWaitHours);

    /// <summary>Mean number in the unit.</summary>
    public static readonly Column<UnitResult> MeanInUnit = Columns.Number<UnitResult>("mean_in_unit", "in unit", MetricDimension.Count, result => result.MeanInUnit);

    /// <summary>Mean time in the unit, wait plus service.</summary>
    public static readonly Column<UnitResult> MeanTimeInUnit = Columns.Number<UnitResult>("mean_time_in_unit", "time", MetricDimension.Time, result => result.MeanTimeInUnitHours);

    /// <summary>Servers over load: how far every arrival rate can grow.</summary>
    public static readonly Column<UnitResult> Headroom = Columns.Number<UnitResult>("headroom", "headroom", MetricDimension.Factor, result => result.Headroom);

    /// <summary>The contract's status word.</summary>
    public static readonly Column<UnitResult> Status = new("status", "status", MetricDimension.Plain, result => StatusWords.Cell(result.Status));

    /// <summary>
    /// The unit's targets it misses, beside the status (docs/network-file.md, "Targets"): shown only when some unit has a
    /// target, so outputs without targets keep their columns; JSON writes it as an array of keys.
    /// </summary>
    public static readonly Column<UnitResult> TargetsBreached = new("targets_breached", "targets", MetricDimension.Plain, TargetWords.Cell);

    /// <summary>The method the unit's metrics come from; people read it in the line under the table (SolutionTableWriter.Methods).</summary>
    public static readonly Column<UnitResult> Method = Columns.Words<UnitResult>("method", "method", result => result.Method, Audience.Machines);

    /// <summary>Squared coefficient of variation of the arrivals.</summary>
    public static readonly Column<UnitResult> ArrivalScv = Columns.Number<UnitResult>("arrival_scv", "arrival scv", MetricDimension.Plain, result => result.ArrivalScv, Audience.Machines);

    /// <summary>Squared coefficient of variation of the service time.</summary>
    public static readonly Column<UnitResult> ServiceScv = Columns.Number<UnitResult>("service_scv", "service scv", MetricDimension.Plain, result => result.ServiceScv, Audience.Machines);

    /// <summary>The chance an arriving patient finds the unit full.</summary>
    public static readonly Column<UnitResult> PFull = Columns.Number<UnitResult>("p_full", "P(full)", MetricDimension.Probability, result => result.PFull);

    /// <summary>Patients turned away because the unit is full.</summary>
    public static readonly Column<UnitResult> TurnedAwayRate = Columns.Number<UnitResult>("turned_away_rate", "turned away", MetricDimension.Rate, result => result.TurnedAwayPerHour);

    /// <summary>Patients diverted to another unit because this one is full.</summary>
    public static readonly Column<UnitResult> DivertedRate = Columns.Number<UnitResult>("diverted_rate", "diverted", MetricDimension.Rate, result => result.DivertedPerHour);

    /// <summary>Every column, in the contract's order.</summary>
    public static readonly ImmutableArray<Column<UnitResult>> All =
    [
        Id, Label, Servers, ArrivalRate, Visits, OfferedLoad, Utilisation, WaitProbability, MeanQueue, MeanWait,
        MeanInUnit, MeanTimeInUnit, Headroom, Status, Method, ArrivalScv, ServiceScv, PFull, TurnedAwayRate, DivertedRate,
    ];

    /// <summary>The columns about full units: shown to people only when some unit has a capacity.</summary>
    private static readonly ImmutableArray<Column<UnitResult>> CapacityColumns = [PFull, TurnedAwayRate, DivertedRate];

    /// <summary>The unit table of <paramref name="solution"/>.</summary>
    public static ResultTable Table(NetworkSolution solution)
    {
        ArgumentNullException.ThrowIfNull(solution);
        return ResultTable.Build(For(solution), solution.Units, solution.Network.TimeUnit);
    }

    /// <summary>
    /// The columns of <paramref name="solution"/>'s unit table: the capacity columns for machines only when no unit has
    /// a capacity, the missed targets beside the status when some unit has a target.
    /// </summary>
    public static ImmutableArray<Column<UnitResult>> For(NetworkSolution solution)
    {
        ArgumentNullException.ThrowIfNull(solution);
        bool anyCapacity = solution.Network.Units.Any(unit => unit.Capacity is not null);
        var columns = anyCapacity ? All : All.Select(column => CapacityColumns.Contains(column) ? column with { Audience = Audience.Machines } : column);
        if (TargetWords.AnyTargets(solution))
        {
            columns = columns.SelectMany(column => column == Status ? [column, TargetsBreached] : new[] { column });
        }

        return [.. columns];
    }
}
