namespace NetSolve.Fitting.Estimation;

/// <summary>The observed waits for a server in one unit.</summary>
/// <param name="Count">Waits recorded.</param>
/// <param name="Waited">How many of them were longer than 0.</param>
/// <param name="Mean">
/// The mean wait in hours with a 95% interval mean ± 1.96·s/√n (normal approximation; waits are skewed, so read it as
/// rough below about 30 waits); zero width when fewer than 2 waits.
/// </param>
public sealed record WaitEvidence(int Count, int Waited, IntervalEstimate Mean)
{
    /// <summary>The evidence of <paramref name="waitHours"/>; null when there are none.</summary>
    public static WaitEvidence? Of(IReadOnlyList<double> waitHours)
    {
        ArgumentNullException.ThrowIfNull(waitHours);
        if (waitHours.Count == 0)
        {
            return null;
        }

        double mean = waitHours.Average();
        double half = waitHours.Count < 2 ? 0.0
            : EvidenceThresholds.NormalQuantile * Math.Sqrt(waitHours.Sum(wait => (wait - mean) * (wait - mean)) / (waitHours.Count - 1) / waitHours.Count);
        return new WaitEvidence(waitHours.Count, waitHours.Count(wait => wait > 0.0), new IntervalEstimate(mean, new Interval(Math.Max(0.0, mean - half), mean + half)));
    }
}
