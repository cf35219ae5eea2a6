namespace NetSolve.Simulation;

/// <summary>
/// Checks the warm-up against the output: MSER-5 (<see cref="MserTruncation"/>) on the number of patients in the
/// network, sampled evenly over each replication from time 0 and averaged over the replications, says where the
/// start-up transient ends. A cut beyond the warm-up means the measured part still carried the empty start.
/// </summary>
/// <remarks>
/// Averaging the replications' series point by point keeps the transient (the same in every replication) and shrinks
/// the noise, so the rule sees the transient rather than chance swings (White, Cobb and Spratt, Proceedings of the 2000
/// Winter Simulation Conference, pp. 755-760, apply it so). The check does not change the run: the warm-up stays
/// as planned or given, so the numbers do not depend on it.
/// </remarks>
internal static class WarmupCheck
{
    /// <summary>
    /// The time, in hours from the start, at which MSER-5 cuts the averaged series; null when it finds no cut in the
    /// first half (the series is too short or too noisy to say) or there are no series.
    /// </summary>
    public static double? TruncationHours(IReadOnlyList<IReadOnlyList<double>> series, double endHours)
    {
        if (series.Count == 0)
        {
            return null;
        }

        var sum = new double[series[0].Count];
        foreach (var replication in series)
        {
            for (int i = 0; i < sum.Length; i++)
            {
                sum[i] += replication[i];
            }
        }

        return TruncationHours(sum, series.Count, endHours);
    }

    /// <summary>
    /// As above, from the replications' series summed point by point (<paramref name="sum"/>) over
    /// <paramref name="replications"/> of them, as the run pools them without keeping each.
    /// </summary>
    public static double? TruncationHours(IReadOnlyList<double> sum, int replications, double endHours)
    {
        ArgumentNullException.ThrowIfNull(sum);
        if (replications == 0 || sum.Count == 0)
        {
            return null;
        }

        var mean = new double[sum.Count];
        for (int i = 0; i < mean.Length; i++)
        {
            mean[i] = sum[i] / replications;
        }

        return MserTruncation.TruncatedBatches(mean) is int batches
            ? batches * MserTruncation.BatchSize * (endHours / mean.Length)
            : null;
    }
}
