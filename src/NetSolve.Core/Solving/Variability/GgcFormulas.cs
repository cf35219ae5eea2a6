using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// Mean waits and waiting-time tails of a unit with c identical servers when arrivals and service are not
/// exponential, from the two moments of each: λ with the squared coefficient of variation ca² of the times between
/// arrivals, E[S] with the squared coefficient of variation cs² of the service time.
/// </summary>
/// <remarks>
/// <para>Every method multiplies the exact M/M/c mean wait Wq(M/M/c) = C(c, a) · E[S] / (c − a) by a variability
/// factor, so with ca² = cs² = 1 the factor is exactly 1.0 and the result is Erlang C to the last bit:</para>
/// <list type="bullet">
/// <item>ca² = cs² = 1: Erlang C (M/M/c), exact.</item>
/// <item>c = 1, ca² = 1: Pollaczek–Khinchine (M/G/1), factor (1 + cs²)/2, exact for any service distribution.</item>
/// <item>c = 1, ca² ≠ 1: Kraemer–Langenbach-Belz (G/G/1), factor (ca² + cs²)/2 · g with
/// g = exp(−2(1 − ρ)(1 − ca²)² / (3ρ(ca² + cs²))) for ca² &lt; 1 and g = exp(−(1 − ρ)(ca² − 1) / (ca² + 4cs²)) for
/// ca² &gt; 1 (W. Kraemer and M. Langenbach-Belz, 8th International Teletraffic Congress, 1976; the ca² &lt; 1 branch as
/// restated by W. Whitt, Bell System Technical Journal 62(9), 1983, pp. 2779–2815). Chosen over Kingman's
/// (ca² + cs²)/2 because it is much closer to the exact GI/M/1 waits at light and moderate load (docs/methods.md).</item>
/// <item>c &gt; 1, cs² = 1: Allen–Cunneen (G/G/c), factor (ca² + 1)/2 (A. O. Allen, Probability, Statistics, and
/// Queueing Theory, 2nd ed., Academic Press, 1990).</item>
/// <item>c &gt; 1, cs² ≠ 1: an M/G/c ratio times (ca² + cs²)/(1 + cs²): Cosmetatos' interpolation for cs² &lt; 1, a
/// light/heavy-traffic interpolation that follows the service distribution for cs² &gt; 1 (<see cref="MultiServerFactor"/>).</item>
/// </list>
/// <para>The chance of waiting is Erlang C for every method (exact for M/M/c and M/G/1, an approximation otherwise).
/// Cost O(c) for the Erlang recurrence; stable for c up to 100,000 and ρ up to 1 − 1e−15. Pure, thread-safe.</para>
/// </remarks>
public static class GgcFormulas
{
    /// <summary>The largest squared coefficient of variation accepted (a coefficient of variation of 1,000), which keeps every result finite.</summary>
    public const double MaximumScv = 1e6;

    /// <summary>Mean waits of a unit with <paramref name="servers"/> servers, by the method its variability calls for.</summary>
    /// <param name="servers">c, at least 1.</param>
    /// <param name="arrivalsPerHour">λ, finite and not negative.</param>
    /// <param name="meanServiceHours">E[S] in hours, positive and finite.</param>
    /// <param name="arrivalScv">ca², the squared coefficient of variation of the times between arrivals: 1 for Poisson arrivals, 0 for a fixed schedule; 0 to <see cref="MaximumScv"/>.</param>
    /// <param name="serviceScv">cs², the squared coefficient of variation of the service time: 1 for exponential, 0 for fixed; 0 to <see cref="MaximumScv"/>.</param>
    /// <returns>The estimate; see <see cref="GgcWaitEstimate"/> for its values with no arrivals and when unstable.</returns>
    /// <param name="serviceShape">The service distribution, for the light-traffic term of several servers with cs² &gt; 1 (<see cref="MultiServerFactor"/>); null: a gamma with cs².</param>
    public static GgcWaitEstimate Estimate(int servers, double arrivalsPerHour, double meanServiceHours, double arrivalScv, double serviceScv,
        ServiceDistribution? serviceShape = null)
    {
        CheckArguments(servers, arrivalsPerHour, meanServiceHours, arrivalScv, serviceScv);
        string method = MethodFor(servers, arrivalScv, serviceScv);
        double offeredLoad = arrivalsPerHour * meanServiceHours;
        double utilisation = offeredLoad / servers;
        if (utilisation >= 1.0)
        {
            return new GgcWaitEstimate
            {
                Method = method,
                OfferedLoad = offeredLoad,
                Utilisation = utilisation,
                IsStable = false,
                VariabilityFactor = null,
                WaitProbability = 1.0,
                MeanQueue = null,
                MeanWaitHours = null,
                MeanInUnit = null,
                MeanTimeInUnitHours = null,
            };
        }

        double factor = Factor(servers, utilisation, arrivalScv, serviceScv, serviceShape);
        if (arrivalsPerHour == 0.0 || factor == 0.0)
        {
            return new GgcWaitEstimate
            {
                Method = method,
                OfferedLoad = offeredLoad,
                Utilisation = utilisation,
                IsStable = true,
                VariabilityFactor = factor,
                WaitProbability = 0.0,
                MeanQueue = 0.0,
                MeanWaitHours = 0.0,
                MeanInUnit = offeredLoad,
                MeanTimeInUnitHours = meanServiceHours,
            };
        }

        // The same expressions, in the same order, as the M/M/c metrics of UnitMetrics: multiplying by a factor of
        // exactly 1.0 then changes no bit, so every cv equal to 1 reproduces the Jackson results exactly.
        double waitProbability = ErlangFormulas.WaitProbability(servers, offeredLoad);
        double meanQueue = waitProbability * utilisation / (1.0 - utilisation) * factor;
        double meanWaitHours = meanQueue / arrivalsPerHour;
        return new GgcWaitEstimate
        {
            Method = method,
            OfferedLoad = offeredLoad,
            Utilisation = utilisation,
            IsStable = true,
            VariabilityFactor = factor,
            WaitProbability = waitProbability,
            MeanQueue = meanQueue,
            MeanWaitHours = meanWaitHours,
            MeanInUnit = meanQueue + offeredLoad,
            MeanTimeInUnitHours = meanWaitHours + meanServiceHours,
        };
    }

    /// <summary>
    /// The chance that a patient waits longer than <paramref name="waitHours"/>: P(Wq &gt; t) ≈ C · exp(−t · C / E[Wq]),
    /// an exponential conditional wait whose mean E[Wq] / C matches the approximate mean wait.
    /// </summary>
    /// <remarks>
    /// Equals the exact M/M/c tail C · exp(−(cμ − λ)t) of <see cref="ErlangFormulas.WaitLongerThan"/> bit for bit when
    /// ca² = cs² = 1 (the decay rate is (c − a)/E[S] divided by a factor of exactly 1.0). Returns 1 when unstable and 0
    /// when the mean wait is 0. Integrates over t to the approximate mean wait, so the tail and the mean agree.
    /// </remarks>
    /// <param name="servers">c, at least 1.</param>
    /// <param name="arrivalsPerHour">λ, finite and not negative.</param>
    /// <param name="meanServiceHours">E[S] in hours, positive and finite.</param>
    /// <param name="arrivalScv">ca², 0 to <see cref="MaximumScv"/>.</param>
    /// <param name="serviceScv">cs², 0 to <see cref="MaximumScv"/>.</param>
    /// <param name="waitHours">t in hours, not negative (may be +∞, giving 0 for a stable unit).</param>
    /// <param name="serviceShape">As for <see cref="Estimate"/>.</param>
    public static double WaitLongerThan(int servers, double arrivalsPerHour, double meanServiceHours, double arrivalScv, double serviceScv, double waitHours,
        ServiceDistribution? serviceShape = null)
    {
        CheckArguments(servers, arrivalsPerHour, meanServiceHours, arrivalScv, serviceScv);
        if (!(waitHours >= 0.0))
        {
            throw new ArgumentOutOfRangeException(nameof(waitHours), waitHours, "A waiting time is not negative.");
        }

        double offeredLoad = arrivalsPerHour * meanServiceHours;
        double utilisation = offeredLoad / servers;
        if (utilisation >= 1.0)
        {
            return 1.0;
        }

        double factor = Factor(servers, utilisation, arrivalScv, serviceScv, serviceShape);
        if (arrivalsPerHour == 0.0 || factor == 0.0)
        {
            return 0.0;
        }

        // E[Wq] / C = factor · E[S] / (c − a): the decay rate is the M/M/c drain rate divided by the factor.
        double waitProbability = ErlangFormulas.WaitProbability(servers, offeredLoad);
        double drainPerHour = (servers - offeredLoad) / meanServiceHours;
        return waitProbability * Math.Exp(-(drainPerHour / factor) * waitHours);
    }

    /// <summary>The name of the method <see cref="Estimate"/> uses for these servers and this variability.</summary>
    /// <param name="servers">c, at least 1.</param>
    /// <param name="arrivalScv">ca², 0 to <see cref="MaximumScv"/>.</param>
    /// <param name="serviceScv">cs², 0 to <see cref="MaximumScv"/>.</param>
    public static string MethodFor(int servers, double arrivalScv, double serviceScv)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(servers, 1);
        CheckScv(arrivalScv, nameof(arrivalScv));
        CheckScv(serviceScv, nameof(serviceScv));
        // Exactly 1 is the documented switch: a cv written as 1 means Poisson arrivals or exponential service.
        bool poissonArrivals = arrivalScv == 1.0;
        bool exponentialService = serviceScv == 1.0;
        if (poissonArrivals && exponentialService)
        {
            return GgcMethodNames.ErlangC;
        }

        if (servers > 1)
        {
            if (exponentialService)
            {
                return GgcMethodNames.AllenCunneen;
            }

            return serviceScv < 1.0 ? GgcMethodNames.Cosmetatos : GgcMethodNames.LightHeavyTraffic;
        }

        return poissonArrivals ? GgcMethodNames.PollaczekKhinchine : GgcMethodNames.KraemerLangenbachBelz;
    }

    /// <summary>
    /// The factor f that <see cref="Estimate"/> multiplies the M/M/c mean wait by, for searches that step through
    /// server counts with their own Erlang recurrence: exactly 1.0 when both SCVs are 1.
    /// </summary>
    /// <param name="servers">c, at least 1.</param>
    /// <param name="utilisation">ρ, from 0 to below 1.</param>
    /// <param name="arrivalScv">ca², 0 to <see cref="MaximumScv"/>.</param>
    /// <param name="serviceScv">cs², 0 to <see cref="MaximumScv"/>.</param>
    /// <param name="serviceShape">As for <see cref="Estimate"/>.</param>
    public static double VariabilityFactor(int servers, double utilisation, double arrivalScv, double serviceScv, ServiceDistribution? serviceShape = null)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(servers, 1);
        CheckScv(arrivalScv, nameof(arrivalScv));
        CheckScv(serviceScv, nameof(serviceScv));
        return Factor(servers, utilisation, arrivalScv, serviceScv, serviceShape);
    }

    private static double Factor(int servers, double utilisation, double arrivalScv, double serviceScv, ServiceDistribution? serviceShape)
    {
        if (servers > 1)
        {
            return MultiServerFactor.For(servers, utilisation, arrivalScv, serviceScv, serviceShape);
        }

        double twoMoment = (arrivalScv + serviceScv) / 2.0;
        if (arrivalScv == 1.0 || twoMoment == 0.0)
        {
            return twoMoment;
        }

        // Kraemer–Langenbach-Belz correction. With ρ > 0 and ca² + cs² > 0 the exponent is finite or −∞ (tiny ρ), and
        // exp(−∞) = 0: never NaN.
        double correction = arrivalScv < 1.0
            ? Math.Exp(-2.0 * (1.0 - utilisation) * (1.0 - arrivalScv) * (1.0 - arrivalScv) / (3.0 * utilisation * (arrivalScv + serviceScv)))
            : Math.Exp(-(1.0 - utilisation) * (arrivalScv - 1.0) / (arrivalScv + (4.0 * serviceScv)));
        return twoMoment * correction;
    }

    private static void CheckArguments(int servers, double arrivalsPerHour, double meanServiceHours, double arrivalScv, double serviceScv)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(servers, 1);
        if (!double.IsFinite(arrivalsPerHour) || arrivalsPerHour < 0.0)
        {
            throw new ArgumentOutOfRangeException(nameof(arrivalsPerHour), arrivalsPerHour, "An arrival rate is finite and not negative.");
        }

        if (!(meanServiceHours > 0.0) || !double.IsFinite(meanServiceHours))
        {
            throw new ArgumentOutOfRangeException(nameof(meanServiceHours), meanServiceHours, "A mean service time is positive and finite.");
        }

        CheckScv(arrivalScv, nameof(arrivalScv));
        CheckScv(serviceScv, nameof(serviceScv));
    }

    private static void CheckScv(double scv, string name)
    {
        if (!(scv >= 0.0) || scv > MaximumScv)
        {
            throw new ArgumentOutOfRangeException(name, scv, "A squared coefficient of variation is between 0 and 1e6.");
        }
    }
}
