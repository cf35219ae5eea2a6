namespace NetSolve.Simulation;

/// <summary>
/// What the interval of a percentile needs from the replications, kept without keeping the replications: for a
/// duration x known only once the run ends (the pooled percentile), the number of replications that saw anything and
/// Σ (share_r(x) − c)², where share_r(x) is replication r's share of durations at most x, exactly as
/// <see cref="DurationHistogram.ShareAtMost"/> reads it. Memory grows with the buckets the run touched, never with the
/// number of replications.
/// </summary>
/// <remarks>
/// Inside bucket k, share_r(x) = a_r(k) + b_r(k)·t, with a_r(k) the replication's share below the bucket, b_r(k) its
/// share in it and t the position of x in the bucket (0 to 1), so the sum of squares is a quadratic in t whose
/// coefficients are sums over replications: Σa, Σa², Σab, Σb, Σb². Σb, Σb² and Σab are non-zero only where a
/// replication counted something, so they are added at its non-empty buckets; a_r is a step function that rises after
/// each of them, so Σa and Σa² are kept as their rises (a² after minus a² before, which add up), summed from the first
/// bucket to k at the end. Each replication costs a visit to its non-empty buckets. Shares lie in [0, 1], so the
/// expanded square loses at most about n·2⁻⁵² of the sum to rounding, far below the interval's own error; the sums
/// are added in replication order, so the result does not depend on the thread count.
/// </remarks>
internal sealed class ShareMoments
{
    private readonly Dictionary<long, Terms> _terms = [];
    private double _zeroSum;
    private double _zeroSquares;

    /// <summary>Replications added that counted at least one duration.</summary>
    public int Replications { get; private set; }

    /// <summary>Adds one replication's counts (nothing when it counted nothing: its share is undefined).</summary>
    public void Add(DurationHistogram replication)
    {
        ArgumentNullException.ThrowIfNull(replication);
        if (replication.Count == 0)
        {
            return;
        }

        double count = replication.Count;
        long below = replication.Zeros;
        double before = below / count;
        Replications++;
        _zeroSum += before;
        _zeroSquares += before * before;
        foreach (var (low, _, inBucket) in replication.Buckets())
        {
            long key = DurationHistogram.BucketOf(low);
            double share = inBucket / count;
            var at = TermsAt(key);
            at.InBucket += share;
            at.InBucketSquares += share * share;
            at.BelowTimesIn += before * share;
            below += inBucket;
            double after = below / count;
            var next = TermsAt(key + 1);
            next.Rise += after - before;
            next.RiseOfSquares += (after * after) - (before * before);
            before = after;
        }
    }

    /// <summary>Σ over the replications of (share_r(<paramref name="duration"/>) − <paramref name="centre"/>)², never negative.</summary>
    public double SumOfSquares(double duration, double centre)
    {
        double sum = _zeroSum;
        double squares = _zeroSquares;
        double t = 0.0;
        Terms? at = null;
        if (duration > 0.0)
        {
            long key = DurationHistogram.BucketOf(duration);
            foreach (var (k, terms) in _terms.OrderBy(entry => entry.Key))
            {
                if (k > key)
                {
                    break;
                }

                sum += terms.Rise;
                squares += terms.RiseOfSquares;
            }

            double low = DurationHistogram.LowerEdge(key);
            t = (duration - low) / (DurationHistogram.LowerEdge(key + 1) - low);
            at = _terms.GetValueOrDefault(key);
        }

        double inBucket = at?.InBucket ?? 0.0;
        double value = squares
            + (2.0 * t * (at?.BelowTimesIn ?? 0.0))
            + (t * t * (at?.InBucketSquares ?? 0.0))
            - (2.0 * centre * (sum + (t * inBucket)))
            + (Replications * centre * centre);
        return Math.Max(0.0, value);
    }

    private Terms TermsAt(long key)
    {
        if (!_terms.TryGetValue(key, out var terms))
        {
            terms = new Terms();
            _terms[key] = terms;
        }

        return terms;
    }

    /// <summary>The sums over replications kept at one bucket.</summary>
    private sealed class Terms
    {
        /// <summary>Σ of the rise of a_r at the start of this bucket (after a replication's non-empty bucket just below).</summary>
        public double Rise;

        /// <summary>Σ of the rise of a_r² at the start of this bucket.</summary>
        public double RiseOfSquares;

        /// <summary>Σ b_r: the replications' shares in this bucket.</summary>
        public double InBucket;

        /// <summary>Σ b_r².</summary>
        public double InBucketSquares;

        /// <summary>Σ a_r·b_r.</summary>
        public double BelowTimesIn;
    }
}
