namespace NetSolve.Fitting.Estimation;

/// <summary>A count of events over an observed span, as a rate per hour with its exact Poisson 95% interval.</summary>
/// <param name="Count">Events seen.</param>
/// <param name="Hours">The span they were counted over.</param>
/// <param name="PerHour">Count / hours, with the Garwood interval divided by the same hours.</param>
public sealed record RateEvidence(int Count, double Hours, IntervalEstimate PerHour)
{
    /// <summary>The rate of <paramref name="count"/> events in <paramref name="hours"/>.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A negative count, or a span that is not finite and positive.</exception>
    public static RateEvidence Of(int count, double hours)
    {
        if (!double.IsFinite(hours) || hours <= 0.0)
        {
            throw new ArgumentOutOfRangeException(nameof(hours), hours, "A rate is counted over a finite, positive span.");
        }

        var interval = ConfidenceIntervals.PoissonCount(count);
        return new RateEvidence(count, hours, new IntervalEstimate(count / hours, new Interval(interval.Lower / hours, interval.Upper / hours)));
    }
}
