namespace NetSolve.Solving;

/// <summary>Grid and convergence settings of the hour-by-hour solution. Immutable; the defaults suit every example network.</summary>
public sealed record TimeVaryingOptions
{
    /// <summary>The default options.</summary>
    public static TimeVaryingOptions Default { get; } = new();

    /// <summary>Fewest time steps per hour: 60 is a one-minute grid, fine against hourly profiles.</summary>
    public int MinStepsPerHour { get; init; } = 60;

    /// <summary>Most time steps per hour (one second), a bound on the cost for units of very short service.</summary>
    public int MaxStepsPerHour { get; init; } = 3600;

    /// <summary>
    /// Largest step as a share of the fastest service stage's mean: 0.25 keeps the linear interpolation of flows
    /// between units within a fraction of a percent of the stage's own curvature.
    /// </summary>
    public double MaxStepPerStageMean { get; init; } = 0.25;

    /// <summary>
    /// Relative: sweeps round loops of routes stop when no flow between units changes by more than this share of
    /// the largest flow.
    /// </summary>
    public double LoopTolerance { get; init; } = 1e-11;

    /// <summary>Most sweeps round loops of routes; each removes the share of flow that returns round a loop.</summary>
    public int MaxLoopSweeps { get; init; } = 10_000;

    /// <summary>
    /// Use the exact chain for every unit of at most <see cref="ExactChainOptions.MaxServers"/> servers, not only heavily
    /// loaded ones and where MOL has no answer. Slower; the reference when checking MOL.
    /// </summary>
    public bool ExactForSmallUnits { get; init; }
}
