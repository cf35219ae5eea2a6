using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Simulation;

/// <summary>
/// A journey's simulated time per patient, from entering its set of units to leaving it (<see cref="Journey"/>),
/// exact per patient and pooled over replications like the units' times. Times in hours, rates per hour.
/// </summary>
public sealed record SimulatedJourney
{
    /// <summary>The journey.</summary>
    public required Journey Journey { get; init; }

    /// <summary>The patient group these figures are for; null for every patient.</summary>
    public PatientGroup? Group { get; init; }

    /// <summary>Journeys finished per hour after the warm-up.</summary>
    public required Estimate PerHour { get; init; }

    /// <summary>Mean journey time; null when no journey finished.</summary>
    public required Estimate? MeanHours { get; init; }

    /// <summary>Percentiles 50, 90, 95 and 99 of the journey time.</summary>
    public required ImmutableArray<PercentileEstimate> Percentiles { get; init; }

    /// <summary>
    /// P(journey time &gt; t) for each of the journey's times t, in its order (<see cref="WaitOverEstimate.WaitHours"/>
    /// holds t): the pooled share with a sectioning interval, or 0 with the rule-of-three bound when none was longer.
    /// </summary>
    public required ImmutableArray<WaitOverEstimate> Over { get; init; }
}
