namespace NetSolve.Solving;

/// <summary>Truncation and convergence settings of the exact time-dependent chain. Immutable.</summary>
public sealed record ExactChainOptions
{
    /// <summary>The default options.</summary>
    public static ExactChainOptions Default { get; } = new();

    /// <summary>Most servers (in any hour) for which the hour-by-hour solver falls back on the exact chain.</summary>
    public int MaxServers { get; init; } = 50;

    /// <summary>Absolute: the chain is cut where the chance of the last state stays below this in every step of the cycle.</summary>
    public double TruncationMass { get; init; } = 1e-12;

    /// <summary>Absolute, in total variation: the start of the cycle is periodic when its estimated distance to the periodic distribution is below this.</summary>
    public double Tolerance { get; init; } = 1e-10;

    /// <summary>Most cycles run towards the periodic distribution before giving up.</summary>
    public int MaxCycles { get; init; } = 20_000;

    /// <summary>Most states (patients 0 to this − 1) before giving up on the truncation.</summary>
    public int MaxStates { get; init; } = 20_000;

    /// <summary>
    /// Largest expected number of jumps Λh in one step of the chain (Λ = λ + cμ): Simpson's rule on the hourly means
    /// then errs by about (Λh)⁴/2880 of the swing within a step, 2e-5 at the default 0.5.
    /// </summary>
    public double MaxJumpsPerStep { get; init; } = 0.5;
}
