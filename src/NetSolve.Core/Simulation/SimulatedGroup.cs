using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Simulation;

/// <summary>A named patient group's simulated flow through the network. Times in hours, rates per hour.</summary>
public sealed record SimulatedGroup
{
    /// <summary>The group.</summary>
    public required PatientGroup Group { get; init; }

    /// <summary>Patients of the group leaving the network after service per hour.</summary>
    public required Estimate ThroughputPerHour { get; init; }

    /// <summary>Mean time in the network of the group's patients; null when none left.</summary>
    public required Estimate? MeanTimeInSystemHours { get; init; }

    /// <summary>Percentiles 50, 90, 95 and 99 of the group's time in the network.</summary>
    public required ImmutableArray<PercentileEstimate> TimeInSystemPercentiles { get; init; }
}
