using MathNet.Numerics.Distributions;

namespace NetSolve.Fitting.Estimation;

/// <summary>95% intervals for a proportion and for a count of events.</summary>
public static class ConfidenceIntervals
{
    /// <summary>
    /// The Wilson score interval for <paramref name="successes"/> out of <paramref name="trials"/> (Wilson, "Probable
    /// inference, the law of succession, and statistical inference", JASA 22, 1927, 209–212; method 3 of Newcombe,
    /// Statistics in Medicine 17, 1998, 857–872): (p + z²/2n ± z√(p(1−p)/n + z²/4n²)) / (1 + z²/n). Unlike p ± z·SE it
    /// stays inside [0, 1] and is not of zero width at 0 or n successes, which matters for thin routes.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">No trials, or successes outside [0, trials].</exception>
    public static Interval Wilson(int successes, int trials)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(trials, 1);
        ArgumentOutOfRangeException.ThrowIfNegative(successes);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(successes, trials);
        const double z = EvidenceThresholds.NormalQuantile;
        double n = trials;
        double p = successes / n;
        double zSquared = z * z;
        double centre = p + (zSquared / (2.0 * n));
        double half = z * Math.Sqrt((p * (1.0 - p) / n) + (zSquared / (4.0 * n * n)));
        double scale = 1.0 + (zSquared / n);
        // The ends are exactly 0 and 1 at 0 and n successes; rounding must not push them past.
        double lower = successes == 0 ? 0.0 : Math.Max(0.0, (centre - half) / scale);
        double upper = successes == trials ? 1.0 : Math.Min(1.0, (centre + half) / scale);
        return new Interval(lower, upper);
    }

    /// <summary>
    /// The exact (Garwood) interval for the mean of a Poisson count <paramref name="events"/> (Garwood, "Fiducial limits
    /// for the Poisson distribution", Biometrika 28, 1936, 437–442): lower χ²(0.025; 2k)/2 (0 when k = 0), upper
    /// χ²(0.975; 2k + 2)/2, with MathNet's chi-squared quantiles. Conservative: it covers at least 95% for every mean.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">A negative count.</exception>
    public static Interval PoissonCount(int events)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(events);
        double tail = (1.0 - EvidenceThresholds.Confidence) / 2.0;
        double lower = events == 0 ? 0.0 : ChiSquared.InvCDF(2.0 * events, tail) / 2.0;
        double upper = ChiSquared.InvCDF((2.0 * events) + 2.0, 1.0 - tail) / 2.0;
        return new Interval(lower, upper);
    }
}
