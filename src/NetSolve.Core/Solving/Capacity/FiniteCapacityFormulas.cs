using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// A unit with c servers that holds at most K patients (K ≥ c), fed by Poisson arrivals: the M/M/c/K queue, and the
/// Erlang loss system M/G/c/c when K = c.
/// </summary>
/// <remarks>
/// <para>
/// The number in the unit is a birth–death chain with birth rate λ and death rate min(n, c)·μ, so
/// p_n ∝ a^n/n! for n ≤ c and p_c·ρ^(n−c) for c &lt; n ≤ K, with a = λ/μ and ρ = a/c (Gross, Shortle, Thompson and
/// Harris, <i>Fundamentals of Queueing Theory</i>, 4th ed., section 2.5). The powers and factorials are never formed:
/// the weights are built outward from the most likely state by the ratios p_n/p_(n−1) = a/min(n, c), so each is at
/// most 1 and nothing overflows; the walk stops where a weight underflows to 0. Cost O(K) at worst, usually far less.
/// </para>
/// <para>
/// When K = c nobody waits and P(full) is Erlang B, which depends on the service-time distribution only through its
/// mean (the insensitivity of the Erlang loss formula): exact for any length of stay. When K &gt; c the values are exact
/// for exponential service; other services use the two-moment approximation of <see cref="TwoMomentFiniteCapacity"/>. A finite unit is never unstable: ρ ≥ 1 is allowed and simply blocks more patients.
/// Thread-safe (pure functions).
/// </para>
/// </remarks>
public static class FiniteCapacityFormulas
{
    /// <summary>The method named when capacity equals servers.</summary>
    public const string ErlangLossMethod = "Erlang B (M/G/c/c, exact for any length of stay)";

    /// <summary>The method named when capacity exceeds servers.</summary>
    public const string MarkovianMethod = "M/M/c/K (exact for Poisson arrivals and exponential service)";

    /// <summary>The method named when capacity exceeds servers and the service is not exponential.</summary>
    public const string TwoMomentMethod = "M/G/c/K (two-moment truncation)";

    /// <summary>Blocking, admitted rate, queue, occupancy and waits of admitted patients in a unit of limited capacity.</summary>
    /// <param name="servers">c: at least 1.</param>
    /// <param name="capacity">K: patients in service and waiting at most; at least <paramref name="servers"/>.</param>
    /// <param name="arrivalsPerHour">λ: offered arrivals per hour, finite and not negative; any load, even above c.</param>
    /// <param name="meanServiceHours">1/μ in hours, positive and finite.</param>
    /// <returns>Finite values; with no arrivals every rate, queue and P(full) is 0 and the time in unit is the mean service.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside the ranges above, or λ/μ is not finite.</exception>
    public static FiniteCapacityResult Solve(int servers, int capacity, double arrivalsPerHour, double meanServiceHours) =>
        Solve(servers, capacity, arrivalsPerHour, meanServiceHours, 1.0, null);

    /// <summary>
    /// As <see cref="Solve(int, int, double, double)"/> for a service time of any variability: exactly M/M/c/K when
    /// <paramref name="serviceScv"/> is 1, exactly Erlang loss for any service when K = c, and otherwise the two-moment
    /// M/G/c/K approximation of <see cref="TwoMomentFiniteCapacity"/> (docs/methods.md, "Bed limits").
    /// </summary>
    /// <param name="servers">c: at least 1.</param>
    /// <param name="capacity">K: patients in service and waiting at most; at least <paramref name="servers"/>.</param>
    /// <param name="arrivalsPerHour">λ: offered arrivals per hour, finite and not negative; any load, even above c.</param>
    /// <param name="meanServiceHours">E[S] in hours, positive and finite.</param>
    /// <param name="serviceScv">cs², the squared coefficient of variation of the service time, 0 to <see cref="GgcFormulas.MaximumScv"/>.</param>
    /// <param name="serviceShape">The service distribution for the light-traffic term when cs² &gt; 1; null: a gamma.</param>
    /// <returns>Finite values; with no arrivals every rate, queue and P(full) is 0 and the time in unit is the mean service.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside the ranges above, or λE[S] is not finite.</exception>
    public static FiniteCapacityResult Solve(int servers, int capacity, double arrivalsPerHour, double meanServiceHours, double serviceScv,
        ServiceDistribution? serviceShape)
    {
        if (!(serviceScv >= 0.0) || serviceScv > GgcFormulas.MaximumScv)
        {
            throw new ArgumentOutOfRangeException(nameof(serviceScv), serviceScv, "A squared coefficient of variation is between 0 and 1e6.");
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(servers, 1);
        ArgumentOutOfRangeException.ThrowIfLessThan(capacity, servers);
        if (!double.IsFinite(arrivalsPerHour) || arrivalsPerHour < 0.0)
        {
            throw new ArgumentOutOfRangeException(nameof(arrivalsPerHour), arrivalsPerHour, "An arrival rate is finite and not negative.");
        }

        if (!double.IsFinite(meanServiceHours) || !(meanServiceHours > 0.0))
        {
            throw new ArgumentOutOfRangeException(nameof(meanServiceHours), meanServiceHours, "A mean service time is positive and finite.");
        }

        double offeredLoad = arrivalsPerHour * meanServiceHours;
        if (!double.IsFinite(offeredLoad))
        {
            throw new ArgumentOutOfRangeException(nameof(arrivalsPerHour), arrivalsPerHour, "The offered load λ/μ must be finite.");
        }

        bool exponential = serviceScv == 1.0;
        string method = capacity == servers ? ErlangLossMethod : exponential ? MarkovianMethod : TwoMomentMethod;
        if (offeredLoad == 0.0)
        {
            return new FiniteCapacityResult(0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, meanServiceHours, method);
        }

        if (capacity == servers)
        {
            return ErlangLoss(servers, arrivalsPerHour, meanServiceHours, offeredLoad);
        }

        return exponential
            ? Markovian(servers, capacity, arrivalsPerHour, meanServiceHours, offeredLoad)
            : TwoMomentFiniteCapacity.Solve(servers, capacity, arrivalsPerHour, meanServiceHours, offeredLoad, serviceScv, serviceShape);
    }

    private static FiniteCapacityResult ErlangLoss(int servers, double arrivalsPerHour, double meanServiceHours, double offeredLoad)
    {
        // From the recurrence B(c) = a·B(c−1) / (c + a·B(c−1)): 1 − B(c) = c / (c + a·B(c−1)), which keeps its digits
        // when B(c) is close to 1 (a hugely overloaded unit still carries about c erlangs), where 1 − B would round to 0.
        double previous = servers == 1 ? 1.0 : ErlangFormulas.BlockingProbability(servers - 1, offeredLoad);
        double denominator = servers + (offeredLoad * previous);
        double blocking = offeredLoad * previous / denominator;
        double notBlocked = servers / denominator;
        double carried = offeredLoad * notBlocked;
        return new FiniteCapacityResult(
            blocking, arrivalsPerHour * notBlocked, arrivalsPerHour * blocking, Math.Min(1.0, carried / servers),
            0.0, 0.0, carried, 0.0, meanServiceHours, ErlangLossMethod);
    }

    private static FiniteCapacityResult Markovian(int servers, int capacity, double arrivalsPerHour, double meanServiceHours, double offeredLoad)
    {
        var sums = new Sums(servers, capacity);

        // The weights rise while a/min(n, c) ≥ 1 and fall after, so the most likely state is where that ratio crosses 1.
        int mode = offeredLoad >= servers ? capacity : (int)Math.Floor(offeredLoad);
        sums.Add(mode, 1.0);
        double weight = 1.0;
        for (int n = mode; n > 0 && weight > 0.0; n--)
        {
            weight *= Math.Min(n, servers) / offeredLoad;
            sums.Add(n - 1, weight);
        }

        weight = 1.0;
        for (int n = mode + 1; n <= capacity && weight > 0.0; n++)
        {
            weight *= offeredLoad / Math.Min(n, servers);
            sums.Add(n, weight);
        }

        double total = sums.Total;
        double full = sums.Full / total;
        double notFull = sums.BelowCapacity / total;
        double busy = sums.BusyServers / total;
        double admitted = arrivalsPerHour * notFull;
        if (!(admitted > 0.0))
        {
            // Only when 1 − p_K underflows: the admitted rate is then the service completions, busy/mean service.
            admitted = busy / meanServiceHours;
        }

        double queue = sums.Queue / total;
        double inUnit = sums.InUnit / total;
        return new FiniteCapacityResult(
            full,
            admitted,
            arrivalsPerHour * full,
            Math.Min(1.0, busy / servers),
            Math.Min(1.0, sums.WaitOnArrival / sums.BelowCapacity),
            queue,
            inUnit,
            queue / admitted,
            inUnit / admitted,
            MarkovianMethod);
    }

    /// <summary>Running sums of the unnormalised weights; each weight is in [0, 1], so none overflows.</summary>
    private sealed class Sums(int servers, int capacity)
    {
        public double Total { get; private set; }

        public double Full { get; private set; }

        public double BelowCapacity { get; private set; }

        public double BusyServers { get; private set; }

        public double WaitOnArrival { get; private set; }

        public double Queue { get; private set; }

        public double InUnit { get; private set; }

        public void Add(int n, double weight)
        {
            Total += weight;
            InUnit += n * weight;
            BusyServers += Math.Min(n, servers) * weight;
            Queue += Math.Max(0, n - servers) * weight;
            if (n == capacity)
            {
                Full += weight;
                return;
            }

            BelowCapacity += weight;
            if (n >= servers)
            {
                WaitOnArrival += weight;
            }
        }
    }
}
