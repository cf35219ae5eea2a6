namespace NetSolve.Fitting.Estimation;

/// <summary>Whether an arrival profile (hour of day or day of week) is written, and if not, why.</summary>
public enum ProfileDecision
{
    /// <summary>Enough data and a shape beyond chance: the profile is written.</summary>
    Written,

    /// <summary>The extract is too short (fewer than 7 days for hours, 4 weeks for days).</summary>
    TooShort,

    /// <summary>Too few entries: fewer than 10 per hour or per day on average.</summary>
    TooFewEntries,

    /// <summary>Enough data, but the shape is within chance of a constant rate (chi-squared test, 5% level).</summary>
    Flat,
}
