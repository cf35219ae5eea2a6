namespace NetSolve.Solving;

/// <summary>Erlang B and Erlang C for c identical servers, stable for c up to 100,000 and ρ up to 0.9999.</summary>
/// <remarks>
/// Never forms a^c or c!: Erlang B comes from the recurrence B(k) = a·B(k−1) / (k + a·B(k−1)), B(0) = 1,
/// run on its reciprocal (terms at least 1), and Erlang C from B. Cost is O(c). Thread-safe (pure functions).
/// </remarks>
public static class ErlangFormulas
{
    /// <summary>Erlang B: the chance that all <paramref name="servers"/> are busy in a loss system offered <paramref name="offeredLoad"/> erlangs.</summary>
    /// <param name="servers">At least 1.</param>
    /// <param name="offeredLoad">a = λ/μ in erlangs, finite and not negative.</param>
    public static double BlockingProbability(int servers, double offeredLoad)
    {
        CheckArguments(servers, offeredLoad);
        if (offeredLoad == 0.0)
        {
            return 0.0;
        }

        // The same recurrence on the reciprocal, 1/B(k) = 1 + (k/a)·1/B(k−1): a multiply-add per step instead of a
        // division, so c = 100,000 costs well under a millisecond. Every term is at least 1, so nothing underflows
        // into slow subnormals; once the reciprocal overflows, B is 0 to double precision and stays so.
        double inverseLoad = 1.0 / offeredLoad;
        double reciprocal = 1.0;
        for (int k = 1; k <= servers; k++)
        {
            reciprocal = 1.0 + (k * inverseLoad * reciprocal);
            if (double.IsPositiveInfinity(reciprocal))
            {
                return 0.0;
            }
        }

        return 1.0 / reciprocal;
    }

    /// <summary>Erlang C: the chance that an arriving patient waits in an M/M/c queue.</summary>
    /// <remarks>C = B / (1 − ρ(1 − B)) with ρ = a/c. Returns 1 when ρ ≥ 1 (every patient eventually waits).</remarks>
    /// <param name="servers">At least 1.</param>
    /// <param name="offeredLoad">a = λ/μ in erlangs, finite and not negative.</param>
    public static double WaitProbability(int servers, double offeredLoad)
    {
        double utilisation = offeredLoad / servers;
        if (utilisation >= 1.0)
        {
            CheckArguments(servers, offeredLoad);
            return 1.0;
        }

        double blocking = BlockingProbability(servers, offeredLoad);
        return Math.Min(1.0, blocking / (1.0 - (utilisation * (1.0 - blocking))));
    }

    /// <summary>
    /// The chance that a patient waits longer than <paramref name="waitHours"/> in a stable M/M/c queue:
    /// P(Wq &gt; t) = C · exp(−(cμ − λ) t).
    /// </summary>
    /// <param name="servers">At least 1.</param>
    /// <param name="offeredLoad">a = λ/μ, below <paramref name="servers"/>.</param>
    /// <param name="meanServiceHours">1/μ in hours, positive.</param>
    /// <param name="waitHours">t in hours, not negative.</param>
    public static double WaitLongerThan(int servers, double offeredLoad, double meanServiceHours, double waitHours)
    {
        if (!(meanServiceHours > 0.0) || !double.IsFinite(meanServiceHours))
        {
            throw new ArgumentOutOfRangeException(nameof(meanServiceHours), meanServiceHours, "A mean service time is positive and finite.");
        }

        if (!(waitHours >= 0.0))
        {
            throw new ArgumentOutOfRangeException(nameof(waitHours), waitHours, "A waiting time is not negative.");
        }

        if (offeredLoad >= servers)
        {
            CheckArguments(servers, offeredLoad);
            return 1.0;
        }

        double waitProbability = WaitProbability(servers, offeredLoad);
        double drainPerHour = (servers - offeredLoad) / meanServiceHours;
        return waitProbability * Math.Exp(-drainPerHour * waitHours);
    }

    private static void CheckArguments(int servers, double offeredLoad)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(servers, 1);
        if (!double.IsFinite(offeredLoad) || offeredLoad < 0.0)
        {
            throw new ArgumentOutOfRangeException(nameof(offeredLoad), offeredLoad, "An offered load is finite and not negative.");
        }
    }
}
