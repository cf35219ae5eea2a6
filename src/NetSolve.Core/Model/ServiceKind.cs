namespace NetSolve.Model;

/// <summary>The family of a service-time distribution.</summary>
public enum ServiceKind
{
    /// <summary>Exponential: coefficient of variation 1 (the Jackson model's assumption).</summary>
    Exponential,

    /// <summary>Lognormal with a given mean and coefficient of variation; typical of lengths of stay.</summary>
    Lognormal,

    /// <summary>Gamma with a given mean and coefficient of variation; cv 1 is exponential.</summary>
    Gamma,

    /// <summary>Every patient holds a server for exactly the mean: coefficient of variation 0.</summary>
    Deterministic,

    /// <summary>Resampled from a list of observed durations.</summary>
    Empirical,
}
