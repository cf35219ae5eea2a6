using System.Collections.Immutable;

namespace NetSolve.Simulation;

/// <summary>Network totals of a simulation. Times in hours, rates per hour.</summary>
public sealed record SimulatedTotals
{
    /// <summary>The model's mean external arrivals per hour, all groups (an input, as in <c>solve</c>).</summary>
    public required double ExternalArrivalsPerHour { get; init; }

    /// <summary>Patients entering the network per hour, as simulated.</summary>
    public required Estimate EnteredPerHour { get; init; }

    /// <summary>Patients leaving the network after service per hour.</summary>
    public required Estimate ThroughputPerHour { get; init; }

    /// <summary>Patients turned away per hour (they left without finishing).</summary>
    public required Estimate TurnedAwayPerHour { get; init; }

    /// <summary>Time-average number of patients in the network.</summary>
    public required Estimate MeanInSystem { get; init; }

    /// <summary>Mean time from entering to leaving the network; null when nobody left.</summary>
    public required Estimate? MeanTimeInSystemHours { get; init; }

    /// <summary>Percentiles 50, 90, 95 and 99 of the time in the network.</summary>
    public required ImmutableArray<PercentileEstimate> TimeInSystemPercentiles { get; init; }
}
