namespace NetSolve.Cli.Settings;

/// <summary>
/// The largest values the options take. Each is far beyond any planning question, and each keeps a typing slip
/// (an extra zero, <c>1e308</c>) a usage error rather than a run that never ends or runs out of memory.
/// </summary>
internal static class SettingLimits
{
    /// <summary>Most rows in a growth table.</summary>
    public const int MaxSteps = 10_000;

    /// <summary>Most servers <c>staff --budget</c> places: as many as one unit may have (docs/network-file.md).</summary>
    public const int MaxBudget = 1_000_000;

    /// <summary>Most replications: the half-width shrinks with their square root, so 10,000 is already 30 times finer than 10.</summary>
    public const int MaxReplications = 10_000;

    /// <summary>Most replications run at once.</summary>
    public const int MaxThreads = 1_024;

    /// <summary>Largest growth factor: a thousand times today's arrivals.</summary>
    public const double MaxGrowthFactor = 1_000.0;

    /// <summary>Largest cost of one server in <c>staff --cost</c>.</summary>
    public const double MaxCost = 1e9;

    /// <summary>Longest warm-up or measured time of one replication: ten years; longer runs are better spent as more replications.</summary>
    public const double MaxSimulatedDays = 3_650.0;

    /// <summary>
    /// Most simulated events (about two per visit: arrival and departure, times the run length and the replications)
    /// before <c>simulate</c> and <c>report --simulate</c> ask for <c>--allow-long</c>: at about 10 million events a
    /// second per core (docs/performance.md) this is a minute and a half of one core, where a planning run takes
    /// seconds: the default run of the busiest bundled network (fenwick-winter-surge, 10 replications of the planned
    /// length) is about 3e7 events, and a <c>--precision</c> run up to its default 200 replications about 6e8. Lowered from 1e10 (a quarter of an hour) after runs of 10,000
    /// replications on a loaded machine took minutes with no word of warning.
    /// </summary>
    public const double MaxSimulatedEvents = 1e9;

    /// <summary>
    /// Most estimated state-steps of the exact chain (<see cref="NetSolve.Analysis.ExactChainWork"/>) before
    /// <c>staff --by-hour --exact</c> asks for <c>--allow-long</c>: 2e8, at most about twenty seconds of one core. Measured
    /// (docs/hardening.md): the wrenfield emergency roster, estimated at 1.5e9, had not finished after 49 s of processor
    /// time (a debug build), so the chain does fewer than 3e7 state-steps a second and a search above the bound is long.
    /// </summary>
    public const double MaxExactChainStateSteps = 2e8;
}
