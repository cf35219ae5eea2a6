namespace NetSolve.Solving;

/// <summary>
/// The peakedness of the patients a full unit sends away: the variance-to-mean ratio of the number of them that would
/// be present in an unlimited unit with exponential stays of rate θ (docs/methods.md, "Diverted overflow").
/// </summary>
/// <remarks>
/// The source is taken as the M/M/c/K birth–death chain (arrivals at rate λ, c servers of rate μ, K places); its
/// overflow is the arrival stream while the chain is at K. With m_n = E[N·1{state n}] and f_n = E[N(N−1)·1{state n}]
/// for the count N of overflow patients in the unlimited unit, the stationary balance gives the two tridiagonal systems
/// m(Q − θI) = −π_K λ e_K and f(Q − 2θI) = −2λ m_K e_K (Q the chain's generator), so M = Σm, Var = Σf + M − M² and
/// Z = Var / M. For K = c and θ = μ this is Riordan's variance formula of the overflow of an Erlang loss system,
/// Z = 1 − α + a/(c + 1 + α − a) (R. I. Wilkinson, Bell System Technical Journal 35, 1956, pp. 421–514, which gives
/// Riordan's formula; tested). Both systems are strictly diagonally dominant, so the Thomas algorithm is stable; the
/// cost is O(K). Thread-safe.
/// </remarks>
public static class OverflowPeakedness
{
    /// <summary>Z of the overflow of an M/M/c/K unit, seen by exponential stays of rate <paramref name="holdingRatePerHour"/>.</summary>
    /// <param name="servers">c, at least 1.</param>
    /// <param name="capacity">K, at least <paramref name="servers"/>.</param>
    /// <param name="offeredPerHour">λ offered to the source unit, positive and finite.</param>
    /// <param name="meanServiceHours">1/μ of the source unit, positive and finite.</param>
    /// <param name="holdingRatePerHour">θ: the service rate of the unit receiving the overflow, positive and finite.</param>
    /// <returns>Z ≥ 1 in exact arithmetic (an overflow stream is peaked); 1 when the source is never full.</returns>
    public static double Of(int servers, int capacity, double offeredPerHour, double meanServiceHours, double holdingRatePerHour)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(servers, 1);
        ArgumentOutOfRangeException.ThrowIfLessThan(capacity, servers);
        CheckPositive(offeredPerHour, nameof(offeredPerHour));
        CheckPositive(meanServiceHours, nameof(meanServiceHours));
        CheckPositive(holdingRatePerHour, nameof(holdingRatePerHour));

        double fullProbability = FullProbability(servers, capacity, offeredPerHour * meanServiceHours);
        if (!(fullProbability > 0.0))
        {
            return 1.0;
        }

        double serviceRate = 1.0 / meanServiceHours;
        double[] first = SolveTridiagonal(servers, capacity, offeredPerHour, serviceRate, holdingRatePerHour, -fullProbability * offeredPerHour);
        double[] second = SolveTridiagonal(servers, capacity, offeredPerHour, serviceRate, 2.0 * holdingRatePerHour, -2.0 * offeredPerHour * first[capacity]);
        double mean = first.Sum();
        double factorial = second.Sum();
        return mean > 0.0 ? Math.Max(1.0, 1.0 + (factorial / mean) - mean) : 1.0;
    }

    /// <summary>P(K) of M/M/c/K at offered load a, summed in logarithms from the largest weight so nothing overflows.</summary>
    internal static double FullProbability(int servers, int capacity, double offeredLoad)
    {
        var logWeights = new double[capacity + 1];
        double largest = 0.0;
        for (int n = 1; n <= capacity; n++)
        {
            logWeights[n] = logWeights[n - 1] + Math.Log(offeredLoad / Math.Min(n, servers));
            largest = Math.Max(largest, logWeights[n]);
        }

        double total = logWeights.Sum(log => Math.Exp(log - largest));
        return Math.Exp(logWeights[capacity] - largest) / total;
    }

    /// <summary>
    /// Solves x(Q − θI) = r·e_K for the birth–death generator Q, written column by column:
    /// λ·x_(n−1) − (λ[n &lt; K] + min(n, c)μ + θ)·x_n + min(n + 1, c)μ·x_(n+1) = r[n = K].
    /// </summary>
    private static double[] SolveTridiagonal(int servers, int capacity, double arrivals, double serviceRate, double theta, double lastRight)
    {
        int size = capacity + 1;
        var upper = new double[size];
        var right = new double[size];
        double previousUpper = 0.0;
        double previousRight = 0.0;
        for (int n = 0; n < size; n++)
        {
            double lower = n > 0 ? arrivals : 0.0;
            double diagonal = -((n < capacity ? arrivals : 0.0) + (Math.Min(n, servers) * serviceRate) + theta);
            double above = n < capacity ? Math.Min(n + 1, servers) * serviceRate : 0.0;
            double rhs = n == capacity ? lastRight : 0.0;
            double pivot = diagonal - (lower * previousUpper);
            upper[n] = above / pivot;
            right[n] = (rhs - (lower * previousRight)) / pivot;
            previousUpper = upper[n];
            previousRight = right[n];
        }

        var x = new double[size];
        x[size - 1] = right[size - 1];
        for (int n = size - 2; n >= 0; n--)
        {
            x[n] = right[n] - (upper[n] * x[n + 1]);
        }

        return x;
    }

    private static void CheckPositive(double value, string name)
    {
        if (!double.IsFinite(value) || !(value > 0.0))
        {
            throw new ArgumentOutOfRangeException(name, value, "The value is positive and finite.");
        }
    }
}
