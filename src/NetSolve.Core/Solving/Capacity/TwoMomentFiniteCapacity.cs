using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// A unit of c servers and capacity K &gt; c, Poisson arrivals and a service time with any SCV: the M/G/c/K queue by
/// truncating an approximate M/G/c distribution of the number present.
/// </summary>
/// <remarks>
/// <para>
/// <b>Truncation.</b> With Poisson arrivals the time-average probabilities of a finite unit below its capacity are
/// those of the same unit without a limit, scaled by one constant: p_n(K) = γ·p_n(∞) for n &lt; K. This is exact for
/// M/G/1/K and for M/M/c/K and is the approximation H. C. Tijms proposes for M/G/c/c+N (Tijms, <i>A First Course in
/// Stochastic Models</i>, Wiley, 2003, chapter on multi-server queues with finite waiting room; from memory). The two
/// unknowns γ and P(full) = p_K follow from the total probability and from the work carried: the admitted patients
/// keep on average a(1 − p_K) servers busy, a = λE[S].
/// </para>
/// <para>
/// <b>The unlimited unit.</b> Below c present, the M/M/c probabilities p_n ∝ aⁿ/n! (insensitive to the service
/// distribution in light traffic; they give P(n ≥ c) = Erlang C, the chance of waiting every NetSolve method uses).
/// From c on, a geometric tail p_(c+m) = C·(1 − σ)·σᵐ whose mean queue Cσ/(1 − σ) equals the two-moment mean queue
/// f·Cρ/(1 − ρ) of <see cref="GgcFormulas.VariabilityFactor"/>: σ = fρ/(1 − ρ + fρ). With f = 1 (exponential
/// service) σ = ρ and the chain is M/M/c/K. The unlimited unit exists only for ρ &lt; 1; for ρ ≥ 1 the tail ratio is
/// σ = ρ^(1/f∞) with the heavy-traffic factor f∞ = (1 + cs²)/2 (the decay of a Brownian queue whose variance is scaled
/// by f∞; NetSolve's own choice, continuous at ρ = 1 and equal to ρ for exponential service).
/// </para>
/// <para>Weights are summed in logarithms from the largest, so nothing overflows for any K or load. Thread-safe.</para>
/// </remarks>
internal static class TwoMomentFiniteCapacity
{
    /// <summary>Metrics of the unit; the arguments are checked by <see cref="FiniteCapacityFormulas.Solve(int, int, double, double, double, ServiceDistribution?)"/>.</summary>
    public static FiniteCapacityResult Solve(int servers, int capacity, double arrivalsPerHour, double meanServiceHours, double offeredLoad,
        double serviceScv, ServiceDistribution? serviceShape)
    {
        double utilisation = offeredLoad / servers;
        var (ratioAtServers, tailRatio, factor) = Ratios(servers, utilisation, serviceScv, serviceShape);

        // Logarithms of the unnormalised weights of n = 0 .. K: ratios a/n below c, ratioAtServers at c, tailRatio above.
        var logWeights = new double[capacity + 1];
        double largest = 0.0;
        for (int n = 1; n <= capacity; n++)
        {
            double ratio = n < servers ? offeredLoad / n : n == servers ? ratioAtServers : tailRatio;
            logWeights[n] = logWeights[n - 1] + Math.Log(ratio);
            largest = Math.Max(largest, logWeights[n]);
        }

        double below = 0.0, busy = 0.0, queue = 0.0, inUnit = 0.0, waiting = 0.0, excessWork = 0.0;
        for (int n = 0; n < capacity; n++)
        {
            double weight = Math.Exp(logWeights[n] - largest);
            below += weight;
            busy += Math.Min(n, servers) * weight;
            queue += Math.Max(0, n - servers) * weight;
            inUnit += n * weight;
            if (n >= servers)
            {
                waiting += weight;
            }

            excessWork += (offeredLoad - Math.Min(n, servers)) * weight;
        }

        // The weight of "full" (p_K/γ) from the carried work: a·(weights below K) = busy + c·full. Below ρ = 1 it equals
        // the unlimited unit's tail beyond K times (c − a)/c, written so that it cannot cancel to a negative number.
        double fullWeight = utilisation < 1.0
            ? (1.0 - utilisation + (factor * utilisation)) * Math.Exp(logWeights[capacity] - largest)
            : Math.Max(0.0, excessWork) / servers;
        double total = below + fullWeight;
        double full = fullWeight / total;
        double admitted = arrivalsPerHour * (below / total);
        double meanQueue = (queue + ((capacity - servers) * fullWeight)) / total;
        double meanInUnit = (inUnit + (capacity * fullWeight)) / total;
        double busyServers = (busy + (servers * fullWeight)) / total;
        if (!(admitted > 0.0))
        {
            admitted = busyServers / meanServiceHours;
        }

        return new FiniteCapacityResult(
            full,
            admitted,
            arrivalsPerHour * full,
            Math.Min(1.0, busyServers / servers),
            below > 0.0 ? Math.Min(1.0, waiting / below) : 1.0,
            meanQueue,
            meanInUnit,
            meanQueue / admitted,
            meanInUnit / admitted,
            FiniteCapacityFormulas.TwoMomentMethod);
    }

    /// <summary>p_c/p_(c−1), p_(n+1)/p_n above c, and the variability factor f used (f∞ from ρ = 1 on).</summary>
    private static (double AtServers, double Tail, double Factor) Ratios(int servers, double utilisation, double serviceScv, ServiceDistribution? serviceShape)
    {
        if (utilisation < 1.0)
        {
            double factor = GgcFormulas.VariabilityFactor(servers, utilisation, 1.0, serviceScv, serviceShape);
            double denominator = 1.0 - utilisation + (factor * utilisation);
            return (utilisation / denominator, factor * utilisation / denominator, factor);
        }

        double heavyTraffic = (1.0 + serviceScv) / 2.0;
        double tail = Math.Pow(utilisation, 1.0 / heavyTraffic);

        // p_c/p_(c−1) = ρ(1 − σ)/(1 − ρ), whose limit at ρ = 1 is 1/f∞.
        double atServers = utilisation == 1.0 ? 1.0 / heavyTraffic : utilisation * (tail - 1.0) / (utilisation - 1.0);
        return (atServers, tail, heavyTraffic);
    }
}
