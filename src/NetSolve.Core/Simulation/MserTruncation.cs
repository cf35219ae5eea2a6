namespace NetSolve.Simulation;

/// <summary>
/// The MSER-5 warm-up rule: how much of the start of an output series to discard so that the mean of the rest is
/// least uncertain.
/// </summary>
/// <remarks>
/// White, "An effective truncation heuristic for bias reduction in simulation output", Simulation 69(6), 1997,
/// pp. 323-334; with batches of 5, White, Cobb and Spratt, "A comparison of five steady-state truncation heuristics
/// for simulation", Proceedings of the 2000 Winter Simulation Conference, pp. 755-760. The series is cut into batches
/// of <see cref="BatchSize"/> observations; for each d the rule scores the batch means from d on by
/// Σ (Z_j − Z̄(d))² / (k − d)², the squared standard error of their mean, and discards the d batches with the
/// smallest score. Only the first half is searched: a minimum in the second half means the series is too short to
/// say, which <see cref="TruncatedBatches"/> reports as null.
/// </remarks>
public static class MserTruncation
{
    /// <summary>Observations per batch (the 5 of MSER-5).</summary>
    public const int BatchSize = 5;

    /// <summary>
    /// The number of whole batches of <see cref="BatchSize"/> to discard from the start of <paramref name="series"/>
    /// (observations beyond the last whole batch are ignored); null when the best cut lies in the second half of the
    /// batches or there are fewer than two batches.
    /// </summary>
    public static int? TruncatedBatches(IReadOnlyList<double> series)
    {
        ArgumentNullException.ThrowIfNull(series);
        int batches = series.Count / BatchSize;
        if (batches < 2)
        {
            return null;
        }

        var means = new double[batches];
        for (int j = 0; j < batches; j++)
        {
            double sum = 0.0;
            for (int i = 0; i < BatchSize; i++)
            {
                sum += series[(j * BatchSize) + i];
            }

            means[j] = sum / BatchSize;
        }

        // From the end backwards, so each d's sums come from d + 1's in one pass (Welford's update, stable for large values).
        var scores = new double[batches];
        double mean = 0.0;
        double squares = 0.0;
        for (int d = batches - 1; d >= 0; d--)
        {
            int n = batches - d;
            double delta = means[d] - mean;
            mean += delta / n;
            squares += delta * (means[d] - mean);
            scores[d] = squares / ((double)n * n);
        }

        int best = 0;
        for (int d = 1; d < batches - 1; d++)
        {
            if (scores[d] < scores[best])
            {
                best = d;
            }
        }

        return best < batches / 2 ? best : null;
    }
}
