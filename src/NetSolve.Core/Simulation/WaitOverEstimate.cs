namespace NetSolve.Simulation;

/// <summary>The chance that a patient starting service at a unit waited longer than a given time.</summary>
/// <param name="WaitHours">The time t in hours.</param>
/// <param name="Probability">
/// P(wait &gt; t) among patients who started service: the pooled share over all replications with a sectioning
/// interval (<see cref="Estimate.Sectioned"/>). When no patient waited longer than t, its mean is 0 and its half-width
/// <see cref="UpperBound"/>, so that the interval [0, upper bound] says what the run can and cannot rule out.
/// </param>
/// <param name="UpperBound">
/// Only when no patient in any replication waited longer than t: the one-sided 95% upper bound 3/n on P(wait &gt; t),
/// n the patients who started service (the rule of three, Hanley and Lippman-Hand, "If nothing goes wrong, is
/// everything all right?", JAMA 249(13), 1983, 1743-1745). Null when the event was observed, or when nobody started service.
/// </param>
public sealed record WaitOverEstimate(double WaitHours, Estimate Probability, double? UpperBound = null)
{
    /// <summary>The numerator of the rule of three: −ln(0.05) ≈ 3, the events that would be seen 95% of the time.</summary>
    public const double RuleOfThree = 3.0;
}
