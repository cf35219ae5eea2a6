using System.Collections.Immutable;

namespace NetSolve.Analysis;

/// <summary>How <see cref="HourlyStaffingSearch"/> shapes and checks its rosters. Immutable.</summary>
public sealed record HourlyStaffingOptions
{
    /// <summary>The defaults: a roster hour by hour, checked by a short simulation.</summary>
    public static HourlyStaffingOptions Default { get; } = new();

    /// <summary>
    /// Hours of day (0–23, ascending) at which shifts start; each block runs to the next start (the last to the first,
    /// across midnight) with the same servers throughout. Empty: every hour is staffed on its own.
    /// </summary>
    public ImmutableArray<int> ShiftStarts { get; init; } = [];

    /// <summary>
    /// True: the exact periodic chain for rosters up to 50 servers (the reference). False: the hour-by-hour solver's own
    /// choice: MOL where the load stays below the servers, the chain for heavily loaded small units and where MOL has
    /// no answer.
    /// </summary>
    public bool ExactChain { get; init; } = true;

    /// <summary>Whether to confirm the roster by simulation (<see cref="HourlySimulationCheck"/>).</summary>
    public bool Simulate { get; init; } = true;

    /// <summary>Seed of the confirming simulation.</summary>
    public ulong Seed { get; init; } = 1;

    /// <summary>Replications of the confirming simulation.</summary>
    public int Replications { get; init; } = 4;

    /// <summary>Days simulated per replication after a warm-up of 7 days.</summary>
    public int SimulatedDays { get; init; } = 56;

    /// <summary>
    /// The most evaluations of the whole cycle per unit (adding and then removing servers); each is one solve of the
    /// periodic queue (the exact chain costs up to seconds on a slow unit near its servers).
    /// </summary>
    public int MaxEvaluations { get; init; } = 200;
}
