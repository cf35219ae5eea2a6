namespace NetSolve.Solving;

/// <summary>
/// Steady-state waits of one unit with variable arrivals and service, from <see cref="GgcFormulas.Estimate"/>.
/// Times in hours; never NaN or infinite.
/// </summary>
/// <remarks>
/// For an unstable unit (ρ ≥ 1) <see cref="IsStable"/> is false, <see cref="WaitProbability"/> is 1 and the queue
/// and time metrics are null (they do not exist). With no arrivals every queue metric is 0 and the time in the
/// unit is the mean service time. Immutable and thread-safe.
/// </remarks>
public sealed record GgcWaitEstimate
{
    /// <summary>The method used, one of the <see cref="GgcMethodNames"/> constants.</summary>
    public required string Method { get; init; }

    /// <summary>Offered load a = λ · E[S] in erlangs.</summary>
    public required double OfferedLoad { get; init; }

    /// <summary>ρ = a / c.</summary>
    public required double Utilisation { get; init; }

    /// <summary>Whether ρ &lt; 1, so that a steady state exists.</summary>
    public required bool IsStable { get; init; }

    /// <summary>
    /// The multiplier applied to the M/M/c mean wait: exactly 1 when both squared coefficients of variation are 1;
    /// (ca² + cs²)/2 for Allen–Cunneen and Pollaczek–Khinchine, that times the correction g for Kraemer–Langenbach-Belz,
    /// and the ratio of <see cref="MultiServerFactor"/> for several servers with cs² ≠ 1. Null when unstable.
    /// </summary>
    public required double? VariabilityFactor { get; init; }

    /// <summary>
    /// The chance that an arriving patient waits: Erlang C C(c, a), used as the approximation for every method (exact
    /// for M/M/c and M/G/1); 0 when the mean wait is 0 (no arrivals, or deterministic arrivals and service); 1 when unstable.
    /// </summary>
    public required double WaitProbability { get; init; }

    /// <summary>Mean number waiting (Lq = λ · Wq); null when unstable.</summary>
    public required double? MeanQueue { get; init; }

    /// <summary>Mean wait before service (Wq) in hours; null when unstable.</summary>
    public required double? MeanWaitHours { get; init; }

    /// <summary>Mean number in the unit, waiting or in service (L = Lq + a); null when unstable.</summary>
    public required double? MeanInUnit { get; init; }

    /// <summary>Mean time in the unit (W = Wq + E[S]) in hours; null when unstable.</summary>
    public required double? MeanTimeInUnitHours { get; init; }
}
