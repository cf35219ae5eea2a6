namespace NetSolve.Solving;

/// <summary>Accuracy and iteration limit of <see cref="CapacityFlows"/>.</summary>
/// <remarks>Immutable; the defaults suit networks of up to thousands of units. Ranges are checked when solving.</remarks>
public sealed record CapacityFlowOptions
{
    /// <summary>The defaults below.</summary>
    public static CapacityFlowOptions Default { get; } = new();

    /// <summary>
    /// Relative to the largest offered flow: iteration stops when no flow changes by more than this in one step.
    /// In (0, 0.1]; default 1e-12, near double precision, because a step costs little and callers compare flows exactly.
    /// </summary>
    public double Tolerance { get; init; } = 1e-12;

    /// <summary>Most substitution steps before <see cref="CapacityFlowsException"/>; at least 1, default 100,000.</summary>
    public int MaxIterations { get; init; } = 100_000;

    /// <summary>
    /// ω in (0, 1]: each step moves the flows the fraction ω of the way to the substituted values. Default 1 (no
    /// damping): the map is monotone, so the undamped steps already rise steadily to the fixed point; a smaller ω
    /// only slows them and is kept for callers that substitute other blocking functions.
    /// </summary>
    public double Damping { get; init; } = 1.0;
}
