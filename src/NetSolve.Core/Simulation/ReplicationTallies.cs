namespace NetSolve.Simulation;

/// <summary>
/// What one finished replication counted behind its percentiles and tail probabilities, handed whole to the
/// <see cref="ReplicationPool"/>: the pooled histogram gives the point estimate of a percentile and the pooled counts
/// the point estimate of P(wait &gt; t), each from every observation of the run rather than an average of
/// per-replication estimates (which is biased for a percentile on short runs).
/// </summary>
/// <param name="UnitTimes">Per unit, the time in unit of every patient who finished there, in hours.</param>
/// <param name="GroupTimes">Per group (0 the patients of no named group), the time in network, in hours.</param>
/// <param name="Starts">Per unit, the patients who started service.</param>
/// <param name="WaitOver">Per unit and threshold (unit × thresholds + t), the starts that waited longer than t.</param>
internal sealed record ReplicationTallies(
    IReadOnlyList<DurationHistogram> UnitTimes,
    IReadOnlyList<DurationHistogram> GroupTimes,
    IReadOnlyList<long> Starts,
    IReadOnlyList<long> WaitOver)
{
    /// <summary>One histogram holding every count of <paramref name="histograms"/>.</summary>
    public static DurationHistogram Pool(IEnumerable<DurationHistogram> histograms)
    {
        ArgumentNullException.ThrowIfNull(histograms);
        var pooled = new DurationHistogram();
        foreach (var histogram in histograms)
        {
            pooled.Add(histogram);
        }

        return pooled;
    }
}
