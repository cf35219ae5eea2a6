using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Simulation;

/// <summary>One unit's simulated metrics: the metrics of <c>solve</c>, each with a 95% confidence half-width, and more.</summary>
/// <remarks>Times in hours, rates per hour. A unit no patient reached reports 0 and its mean service time, as <c>solve</c> does.</remarks>
public sealed record SimulatedUnit
{
    /// <summary>The unit.</summary>
    public required Unit Unit { get; init; }

    /// <summary>Patients admitted to the unit per hour (not counting those it turned away or diverted).</summary>
    public required Estimate ArrivalsPerHour { get; init; }

    /// <summary>Mean busy servers / servers; 0 for unlimited servers.</summary>
    public required Estimate Utilisation { get; init; }

    /// <summary>The share of patients starting service who waited first.</summary>
    public required Estimate WaitProbability { get; init; }

    /// <summary>Time-average number waiting.</summary>
    public required Estimate MeanQueue { get; init; }

    /// <summary>Mean wait before service, over all patients starting service.</summary>
    public required Estimate MeanWaitHours { get; init; }

    /// <summary>Time-average number in the unit, waiting or in service.</summary>
    public required Estimate MeanInUnit { get; init; }

    /// <summary>Mean time from admission to the unit to the end of service.</summary>
    public required Estimate MeanTimeInUnitHours { get; init; }

    /// <summary>The share of patients arriving who found the unit at its capacity.</summary>
    public required Estimate FullProbability { get; init; }

    /// <summary>Patients per hour the unit turned away (they left the network).</summary>
    public required Estimate TurnedAwayPerHour { get; init; }

    /// <summary>Patients per hour the unit diverted to its <see cref="Model.WhenFull"/> unit.</summary>
    public required Estimate DivertedPerHour { get; init; }

    /// <summary>Percentiles 50, 90, 95 and 99 of the time in the unit.</summary>
    public required ImmutableArray<PercentileEstimate> TimeInUnitPercentiles { get; init; }

    /// <summary>P(wait &gt; t) for each requested t, in the order given.</summary>
    public required ImmutableArray<WaitOverEstimate> WaitOver { get; init; }

    /// <summary>Mean number waiting in each hour of the day, 00-01 first (24 estimates); null for an hour the run never covered.</summary>
    public required IReadOnlyList<Estimate?> MeanQueueByHour { get; init; }
}
