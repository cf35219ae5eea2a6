using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Simulation;

/// <summary>What a simulation run found, over the replications that finished.</summary>
/// <remarks>Immutable. When no replication finished, <see cref="Units"/> and <see cref="Groups"/> are empty and <see cref="Totals"/> is null.</remarks>
public sealed record SimulationResult
{
    /// <summary>The network simulated.</summary>
    public required Network Network { get; init; }

    /// <summary>The options used; <see cref="SimulationOptions.Replications"/> is the count run, which a precision may have raised.</summary>
    public required SimulationOptions Options { get; init; }

    /// <summary>Replications that ran to the end (fewer than requested when the run was cancelled).</summary>
    public required int ReplicationsFinished { get; init; }

    /// <summary>True when every requested replication finished.</summary>
    public bool IsComplete => ReplicationsFinished == Options.Replications;

    /// <summary>Events processed in the finished replications.</summary>
    public required long Events { get; init; }

    /// <summary>Per-unit results in file order.</summary>
    public required ImmutableArray<SimulatedUnit> Units { get; init; }

    /// <summary>Network totals; null when no replication finished.</summary>
    public required SimulatedTotals? Totals { get; init; }

    /// <summary>
    /// Whether every unit's mean wait and mean number in unit reached <see cref="SimulationOptions.Precision"/>; null
    /// when no precision was asked.
    /// </summary>
    public bool? PrecisionReached { get; init; }

    /// <summary>
    /// The largest 95% half-width relative to its mean among the units' mean waits and means in unit when a precision
    /// was asked (+∞ while some key mean has no interval); null otherwise.
    /// </summary>
    public double? WorstRelativeHalfWidth { get; init; }

    /// <summary>
    /// Where MSER-5 on the number in the network, averaged over replications, says the start-up transient ends, in
    /// hours from the start (<see cref="WarmupCheck"/>); null when it cannot say. Above the warm-up, the warm-up was
    /// too short for the measured part to start near steady state.
    /// </summary>
    public double? MserTruncationHours { get; init; }

    /// <summary>True when MSER-5 cuts beyond the warm-up used: the measured part may carry the empty start.</summary>
    public bool IsWarmupShortByMser => MserTruncationHours is double cut && cut > Options.WarmupHours;

    /// <summary>Per-group results for <see cref="Network.Groups"/>, in order.</summary>
    public required ImmutableArray<SimulatedGroup> Groups { get; init; }

    /// <summary>
    /// Per journey of <see cref="Network.Journeys"/>, in order: the figures for every patient, then, when the network
    /// has patient groups, one per named group that made the journey. Empty without journeys or when no replication finished.
    /// </summary>
    public ImmutableArray<SimulatedJourney> Journeys { get; init; } = [];
}
