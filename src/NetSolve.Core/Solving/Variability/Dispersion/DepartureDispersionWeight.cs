namespace NetSolve.Solving;

/// <summary>
/// The weight w(t) of a queue's arrivals in the index of dispersion of its departures over a window of t hours,
/// I_d(t) = w(t)·I_a(t) + (1 − w(t))·I_s(t): the heavy-traffic form of W. Whitt and W. You (Stochastic Systems 8(2),
/// 2018, pp. 143–165, from memory), used for the departure flows by the same authors (Naval Research Logistics 69(1),
/// 2022, pp. 36–56, from memory).
/// </summary>
/// <remarks>
/// <para>
/// w(t) = w*(t/τ) with w*(x) = 1 − (1 − c*(x))/(2x), c* the correlation function of stationary reflected Brownian
/// motion (<see cref="VariabilityFunctions.BrownianCorrelation"/>). It follows from Var(Q(t) − Q(0)) = 2 Var Q·(1 − c*):
/// over short windows the queue moves with its net input, so departures are the service completions (w → 0, because
/// c*(x) = 1 − 2x + o(x)); over long windows the queue's change is bounded, so departures are the arrivals (w → 1).
/// </para>
/// <para>
/// τ is the relaxation time of the queue's Brownian approximation, variance over squared drift of its net input:
/// τ = m(ρ·I_a(∞) + cs²) / (c(1 − ρ)²) hours for c servers of mean service m at load ρ, the arrivals' variability
/// taken as their long-run index (the Brownian limit of a non-renewal flow). For one server this is the published
/// scaling up to the factor ρ on I_a(∞), equal in heavy traffic; c servers are treated as one server c times as fast.
/// </para>
/// </remarks>
internal static class DepartureDispersionWeight
{
    /// <summary>Below this x, w*(x) is taken as its limit 0 (the series is 1 − (1 − c*)/(2x) = O(√x)).</summary>
    private const double ShortestRatio = 1e-12;

    /// <summary>w*(x) = 1 − (1 − c*(x))/(2x): 0 at x = 0, rising to 1 as x → ∞.</summary>
    public static double Canonical(double x)
    {
        if (!(x > ShortestRatio))
        {
            return 0.0;
        }

        if (double.IsPositiveInfinity(x))
        {
            return 1.0;
        }

        return Math.Clamp(1.0 - ((1.0 - VariabilityFunctions.BrownianCorrelation(x)) / (2.0 * x)), 0.0, 1.0);
    }

    /// <summary>τ = m(ρ·I_a(∞) + cs²) / (c(1 − ρ)²) hours; ∞ at a load of 1 or more.</summary>
    /// <param name="meanServiceHours">m, positive.</param>
    /// <param name="servers">c, at least 1.</param>
    /// <param name="utilisation">ρ per server, not negative.</param>
    /// <param name="longRunArrivalDispersion">I_a(∞), not negative.</param>
    /// <param name="serviceScv">cs², not negative.</param>
    public static double RelaxationHours(double meanServiceHours, int servers, double utilisation, double longRunArrivalDispersion, double serviceScv)
    {
        if (utilisation >= 1.0)
        {
            return double.PositiveInfinity;
        }

        double idle = 1.0 - utilisation;
        return meanServiceHours * ((utilisation * longRunArrivalDispersion) + serviceScv) / (servers * idle * idle);
    }
}
