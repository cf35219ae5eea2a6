using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Simulation;

namespace NetSolve.Presentation.Simulation;

/// <summary>
/// The registry of a simulated unit's metrics: the contract's ids (as in <c>solve</c>, each estimate with its
/// <c>_ci</c> half-width), the headers people read, dimensions and accessors. The table, CSV and JSON of
/// <c>simulate</c> read a unit through these; each format picks the columns it has always carried.
/// </summary>
public static class SimulatedUnitColumns
{
    /// <summary>The unit's id.</summary>
    public static readonly Column<SimulatedUnitRow> Id = Columns.Words<SimulatedUnitRow>("id", "unit", row => row.Simulated.Unit.Id);

    /// <summary>The unit's display name.</summary>
    public static readonly Column<SimulatedUnitRow> Label = Columns.Words<SimulatedUnitRow>("label", "label", row => row.Simulated.Unit.Label, Audience.Machines);

    /// <summary>Servers; absent for unlimited.</summary>
    public static readonly Column<SimulatedUnitRow> Servers = new("servers", "servers", MetricDimension.Servers, row => Cell.Of(row.Simulated.Unit.Servers));

    /// <summary>Patients admitted per hour (not those turned away or diverted).</summary>
    public static readonly EstimateMetric<SimulatedUnitRow> ArrivalRate = new("arrival_rate", "arrivals", MetricDimension.Rate, row => row.Simulated.ArrivalsPerHour);

    /// <summary>Mean visits per patient entering the network.</summary>
    public static readonly Column<SimulatedUnitRow> Visits = Columns.Number<SimulatedUnitRow>("visits_per_patient", "visits", MetricDimension.Plain, row => row.VisitsPerPatient);

    /// <summary>Simulated arrivals times mean service, in erlangs.</summary>
    public static readonly Column<SimulatedUnitRow> OfferedLoad = Columns.Number<SimulatedUnitRow>("offered_load", "load", MetricDimension.Plain, row => row.OfferedLoad);

    /// <summary>Mean busy servers over servers.</summary>
    public static readonly EstimateMetric<SimulatedUnitRow> Utilisation = new("utilisation", "util", MetricDimension.Fraction, row => row.Simulated.Utilisation);

    /// <summary>The share of patients who waited before service.</summary>
    public static readonly EstimateMetric<SimulatedUnitRow> WaitProbability = new("p_wait", "P(wait)", MetricDimension.Probability, row => row.Simulated.WaitProbability);

    /// <summary>Time-average number waiting.</summary>
    public static readonly EstimateMetric<SimulatedUnitRow> MeanQueue = new("mean_queue", "queue", MetricDimension.Count, row => row.Simulated.MeanQueue);

    /// <summary>Mean wait before service.</summary>
    public static readonly EstimateMetric<SimulatedUnitRow> MeanWait = new("mean_wait", "wait", MetricDimension.Time, row => row.Simulated.MeanWaitHours);

    /// <summary>Time-average number in the unit.</summary>
    public static readonly EstimateMetric<SimulatedUnitRow> MeanInUnit = new("mean_in_unit", "in unit", MetricDimension.Count, row => row.Simulated.MeanInUnit);

    /// <summary>Mean time from admission to the end of service.</summary>
    public static readonly EstimateMetric<SimulatedUnitRow> MeanTimeInUnit = new("mean_time_in_unit", "time", MetricDimension.Time, row => row.Simulated.MeanTimeInUnitHours);

    /// <summary>Servers over simulated offered load.</summary>
    public static readonly Column<SimulatedUnitRow> Headroom = Columns.Number<SimulatedUnitRow>("headroom", "headroom", MetricDimension.Factor, row => row.Headroom);

    /// <summary>The contract's status word.</summary>
    public static readonly Column<SimulatedUnitRow> Status = new("status", "status", MetricDimension.Plain, row => StatusWords.Cell(row.Status));

    /// <summary>Patients the unit holds at most, in service and waiting; absent when not limited.</summary>
    public static readonly Column<SimulatedUnitRow> Capacity = Columns.Number<SimulatedUnitRow>("capacity", "capacity", MetricDimension.Count, row => row.Simulated.Unit.Capacity);

    /// <summary>The share of arrivals who found the unit full.</summary>
    public static readonly EstimateMetric<SimulatedUnitRow> FullProbability = new("p_full", "P(full)", MetricDimension.Probability, row => row.Simulated.FullProbability);

    /// <summary>The share of arrivals who found the unit full, for people: absent for a unit without a capacity, which is never full.</summary>
    public static readonly Column<SimulatedUnitRow> FullProbabilityForPeople = FullProbability.ForPeople with
    {
        Read = row => EstimateCell.Of(row.Simulated.Unit.Capacity is null ? null : row.Simulated.FullProbability, MetricDimension.Probability),
    };

    /// <summary>Patients per hour turned away (they left the network).</summary>
    public static readonly EstimateMetric<SimulatedUnitRow> TurnedAwayRate = new("turned_away_rate", "turned away", MetricDimension.Rate, row => row.Simulated.TurnedAwayPerHour);

    /// <summary>Patients per hour diverted to the unit's overflow unit.</summary>
    public static readonly EstimateMetric<SimulatedUnitRow> DivertedRate = new("diverted_rate", "diverted", MetricDimension.Rate, row => row.Simulated.DivertedPerHour);

    /// <summary>The unit table people read, in order.</summary>
    public static readonly ImmutableArray<Column<SimulatedUnitRow>> ForPeople =
    [
        Id, Servers, ArrivalRate.ForPeople, Utilisation.ForPeople, WaitProbability.ForPeople, MeanQueue.ForPeople, MeanWait.ForPeople,
        MeanInUnit.ForPeople, MeanTimeInUnit.ForPeople, FullProbabilityForPeople, Status,
    ];

    /// <summary>The flat fields of a unit's JSON object, in the contract's order (the nested ones follow them).</summary>
    public static readonly ImmutableArray<Column<SimulatedUnitRow>> ForJson =
    [
        Id, Label, Servers, .. ArrivalRate.ForMachines, Visits, OfferedLoad, .. Utilisation.ForMachines, .. WaitProbability.ForMachines,
        .. MeanQueue.ForMachines, .. MeanWait.ForMachines, .. MeanInUnit.ForMachines, .. MeanTimeInUnit.ForMachines, Headroom, Status,
        Capacity, .. FullProbability.ForMachines, .. TurnedAwayRate.ForMachines, .. DivertedRate.ForMachines,
    ];

    /// <summary>The leading columns of a CSV row, each estimate followed by its half-width (the per-run columns follow them).</summary>
    public static readonly ImmutableArray<Column<SimulatedUnitRow>> ForCsv =
    [
        Id, Label, Servers, .. new[] { ArrivalRate, Utilisation, WaitProbability, MeanQueue, MeanWait, MeanInUnit, MeanTimeInUnit, FullProbability, TurnedAwayRate, DivertedRate }
            .SelectMany(metric => metric.ForMachines),
    ];

    /// <summary>The contract's key of a percentile: <c>p50</c>, <c>p95</c>.</summary>
    public static string PercentileKey(double percent) => "p" + percent.ToString("0", CultureInfo.InvariantCulture);

    /// <summary>The <paramref name="index"/>-th percentile of the time in the unit (<c>time_in_unit_p50</c>).</summary>
    public static EstimateMetric<SimulatedUnitRow> TimeInUnitPercentile(int index, double percent) =>
        new("time_in_unit_" + PercentileKey(percent), PercentileKey(percent), MetricDimension.Time, row => row.Simulated.TimeInUnitPercentiles[index].Hours);

    /// <summary>P(wait &gt; t) for the <paramref name="index"/>-th threshold t; its id carries t in the network's time unit (<c>p_wait_over_4</c>).</summary>
    public static EstimateMetric<SimulatedUnitRow> WaitOver(int index, double thresholdHours, TimeUnit timeUnit) =>
        new("p_wait_over_" + MachineFormat.Csv(MachineFormat.Convert(thresholdHours, MetricDimension.Time, timeUnit)), PeopleFormat.Time(thresholdHours),
            MetricDimension.Probability, row => row.Simulated.WaitOver[index].Probability);

    /// <summary>P(wait &gt; t) for people: ± its half-width, or <c>&lt; bound</c> when such a wait was never seen.</summary>
    public static Column<SimulatedUnitRow> WaitOverForPeople(int index, double thresholdHours, TimeUnit timeUnit) =>
        new(WaitOver(index, thresholdHours, timeUnit).Id, PeopleFormat.Time(thresholdHours), MetricDimension.Probability,
            row => WaitOverColumns.ForPeople(row.Simulated.WaitOver[index]), Audience.People);

    /// <summary>The rule-of-three upper bound of P(wait &gt; t) for the <paramref name="index"/>-th threshold (<c>p_wait_over_4_upper_bound</c>); empty when such a wait was seen.</summary>
    public static Column<SimulatedUnitRow> WaitOverUpperBound(int index, double thresholdHours, TimeUnit timeUnit) =>
        new(WaitOver(index, thresholdHours, timeUnit).Id + "_" + WaitOverColumns.UpperBound.Id, PeopleFormat.Time(thresholdHours), MetricDimension.Probability,
            row => Cell.Of(row.Simulated.WaitOver[index].UpperBound, MetricDimension.Probability), Audience.Machines);

    /// <summary>The mean queue in hour of day <paramref name="hour"/> (<c>mean_queue_h00</c> for 00:00-01:00).</summary>
    public static EstimateMetric<SimulatedUnitRow> QueueAtHour(int hour) =>
        new("mean_queue_h" + hour.ToString("00", CultureInfo.InvariantCulture), hour.ToString("00", CultureInfo.InvariantCulture), MetricDimension.Count, row => row.Simulated.MeanQueueByHour[hour]);

    /// <summary>Every CSV column of <paramref name="result"/>: <see cref="ForCsv"/>, then the means of the percentiles, of P(wait &gt; t) and of the queue by hour.</summary>
    public static ImmutableArray<Column<SimulatedUnitRow>> ForCsvOf(SimulationResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        var percents = result.Units.IsEmpty ? [] : result.Units[0].TimeInUnitPercentiles.Select(p => p.Percent).ToImmutableArray();
        var thresholds = result.Options.WaitThresholdsHours.IsDefault ? [] : result.Options.WaitThresholdsHours;
        return
        [
            .. ForCsv,
            .. percents.Select((percent, i) => TimeInUnitPercentile(i, percent).Mean),
            .. thresholds.SelectMany((threshold, i) => new[] { WaitOver(i, threshold, result.Network.TimeUnit).Mean, WaitOverUpperBound(i, threshold, result.Network.TimeUnit) }),
            .. Enumerable.Range(0, TimeOfDayQueues.HoursOfDay).Select(hour => QueueAtHour(hour).Mean),
        ];
    }
}
