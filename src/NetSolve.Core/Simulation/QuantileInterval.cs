using MathNet.Numerics.Distributions;

namespace NetSolve.Simulation;

/// <summary>
/// The 95% interval of a percentile of time, found by inverting an interval for the distribution function at the
/// pooled percentile: each replication's share of times at most the pooled percentile q̂ is a ratio of counts, whose
/// mean over replications has an honest Student t interval [p − h, p + h]; the pooled histogram's percentiles at
/// p − h and p + h bound q. The half-width is the larger of the two sides, so the interval is symmetric and never
/// narrower than the inverted one.
/// </summary>
/// <remarks>
/// Why not the spread of each replication's own percentile (sectioning, Asmussen and Glynn, Stochastic Simulation,
/// Springer, 2007, chapter III, section 5a)? A far percentile is a strongly concave function of the share of times
/// beyond it (for an exponential tail, q = −ln(share)/θ), and on a run that sees only a few long busy periods the
/// share varies across replications by tens of percent: the replications' percentiles then vary less than the pooled
/// one does (Jensen's inequality), and the sectioning interval was measured to cover the 99th percentile of an M/M/1
/// unit with 1-day service in 78% of seeds. The share itself is a mean of indicators, an average like the mean wait,
/// whose interval covers; the percentile's interval inherits that (the distribution-free interval of a quantile
/// from one for its distribution function, Serfling, Approximation Theorems of Mathematical Statistics, Wiley, 1980,
/// section 2.6; for correlated output from the replications as independent batches, Law, Simulation Modeling and
/// Analysis, 5th ed., 2015, chapter 9).
/// </remarks>
internal static class QuantileInterval
{
    /// <summary>
    /// The <paramref name="fraction"/> percentile of <paramref name="pooled"/> with its half-width from
    /// <paramref name="replications"/> (the histograms pooled); null when nothing was observed.
    /// </summary>
    public static Estimate? Of(double fraction, DurationHistogram pooled, IReadOnlyList<DurationHistogram> replications)
    {
        ArgumentNullException.ThrowIfNull(pooled);
        return At(pooled.Quantile(fraction), pooled, replications);
    }

    /// <summary>As <see cref="Of(double, DurationHistogram, IReadOnlyList{DurationHistogram})"/>, at the pooled percentile <paramref name="point"/> already read.</summary>
    public static Estimate? At(double point, DurationHistogram pooled, IReadOnlyList<DurationHistogram> replications)
    {
        ArgumentNullException.ThrowIfNull(pooled);
        ArgumentNullException.ThrowIfNull(replications);
        if (!double.IsFinite(point))
        {
            return null;
        }

        // A replication's share is finite exactly when it counted something; with fewer than two such there is no
        // interval, and the shares (a walk of each histogram) are not read: a one-replication run of 100,000 units
        // walked each unit's histogram twice for nothing, four times over.
        int counted = 0;
        foreach (var replication in replications)
        {
            counted += replication.Count > 0 ? 1 : 0;
        }

        if (counted < 2)
        {
            return new Estimate(point, null, counted);
        }

        double centre = pooled.ShareAtMost(point);
        int n = 0;
        double sumSquares = 0.0;
        foreach (var replication in replications)
        {
            double share = replication.ShareAtMost(point);
            if (double.IsFinite(share))
            {
                n++;
                sumSquares += (share - centre) * (share - centre);
            }
        }

        return Inverted(pooled, point, centre, n, sumSquares);
    }

    /// <summary>
    /// As above, with the replications' shares read from their <paramref name="shares"/> moments rather than their
    /// histograms: the same interval to rounding, from memory that does not grow with the replications.
    /// </summary>
    public static Estimate? Of(double fraction, DurationHistogram pooled, ShareMoments shares)
    {
        ArgumentNullException.ThrowIfNull(pooled);
        return At(pooled.Quantile(fraction), pooled, shares);
    }

    /// <summary>As <see cref="Of(double, DurationHistogram, ShareMoments)"/>, at the pooled percentile <paramref name="point"/> already read.</summary>
    public static Estimate? At(double point, DurationHistogram pooled, ShareMoments shares)
    {
        ArgumentNullException.ThrowIfNull(pooled);
        ArgumentNullException.ThrowIfNull(shares);
        if (!double.IsFinite(point))
        {
            return null;
        }

        double centre = pooled.ShareAtMost(point);
        return Inverted(pooled, point, centre, shares.Replications, shares.SumOfSquares(point, centre));
    }

    /// <summary>The Student t interval of the mean share, [centre − h, centre + h], turned into durations by the pooled histogram.</summary>
    private static Estimate Inverted(DurationHistogram pooled, double point, double centre, int n, double sumSquares)
    {
        if (n < 2)
        {
            return new Estimate(point, null, n);
        }

        double t = StudentT.InvCDF(0.0, 1.0, n - 1, 0.5 + (Estimate.ConfidenceLevel / 2.0));
        double shareHalf = t * Math.Sqrt(sumSquares / (n - 1) / n);
        double low = pooled.Quantile(Math.Max(0.0, centre - shareHalf));
        double high = pooled.Quantile(Math.Min(1.0, centre + shareHalf));
        return new Estimate(point, Math.Max(point - low, high - point), n);
    }
}
