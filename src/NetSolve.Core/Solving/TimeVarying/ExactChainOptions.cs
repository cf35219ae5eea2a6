namespace NetSolve.Solving;

/// <summary>Truncation and convergence settings of the exact time-dependent chain. Immutable.</summary>
public sealed record ExactChainOptions
{
    /// <summary>The default options.</summary>
    public static ExactChainOptions Default { get; } = new();

    /// <summary>Most servers (in any hour) for which the hour-by-hour solver falls back on the exact chain.</summary>
    public int MaxServers { get; init; } = 50;

    /// <summary>
    /// Share of the servers the offered load reaches in its busiest hour from which units of at most
    /// <see cref="MaxServers"/> servers get the exact chain instead of MOL: MOL misses the carried-over queue of units
    /// loaded near their servers (docs/time-of-day.md, section 7).
    /// </summary>
    public double HeavyPeakLoad { get; init; } = 0.8;

    /// <summary>
    /// Units of more than <see cref="MaxServers"/> servers loaded past <see cref="HeavyPeakLoad"/> also get the exact
    /// chain when their servers complete at most this many services an hour when all busy (c/E[S]): the chain's cost
    /// grows with that rate, and this is the rate of the busiest unit the server limit already admits (50 servers, 15
    /// minutes). Slow large units are where MOL misleads most (an assessment unit of 64 beds and stays near a day:
    /// docs/time-of-day.md, section 8).
    /// </summary>
    public double MaxCompletionsPerHour { get; init; } = 200.0;

    /// <summary>Absolute: the chain is cut where the chance of the last state stays below this in every step of the cycle.</summary>
    public double TruncationMass { get; init; } = 1e-12;

    /// <summary>Absolute, in total variation: the start of the cycle is periodic when its estimated distance to the periodic distribution is below this.</summary>
    public double Tolerance { get; init; } = 1e-10;

    /// <summary>Most cycles run towards the periodic distribution before giving up.</summary>
    public int MaxCycles { get; init; } = 20_000;

    /// <summary>Most states (patients 0 to this − 1) before giving up on the truncation.</summary>
    public int MaxStates { get; init; } = 20_000;

    /// <summary>
    /// Largest expected number of jumps Λh (Λ = λ + cμ) in one uniformization sum; a longer step of the chain is cut
    /// into equal sums. A sum needs about Λh + 6√Λh products, so long sums are cheaper per hour; 50 keeps e^(−Λh)
    /// far above the smallest double.
    /// </summary>
    public double MaxJumpsPerStep { get; init; } = 50.0;
}
