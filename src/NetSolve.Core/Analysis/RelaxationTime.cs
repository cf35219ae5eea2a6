using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>
/// How long a unit takes to forget where it started: the time constant of its approach to steady state, in hours.
/// A run must be many of these long, and its warm-up several, for its means to be near the steady state the
/// formulas describe.
/// </summary>
/// <remarks>
/// For c servers at utilisation ρ with mean service 1/μ, the relaxation time of the M/M/c queue length is of order
/// 1 / (c·μ·(1 − √ρ)²): Abate and Whitt, "Transient behavior of the M/M/1 queue: starting at the origin", Queueing
/// Systems 2, 1987, pp. 41-65 (the M/M/1 case, from Morse 1955; c servers at high load behave as one server c times as
/// fast). It is used for every unit whatever its distributions, as an order of magnitude: more variable service or
/// arrivals relax more slowly still, which the warning for a long relaxation time against the run then catches.
/// Unlimited servers relax with their service, 1/μ. A unit with a capacity K is held within K − c waiting places, and a random
/// walk over m places settles in about m² steps, so its relaxation time is at most max(1, K − c)² / (c·μ), and at
/// least one mean service (an order of magnitude by hand; an Erlang loss unit relaxes with its service). An unstable unit without a capacity never settles: +∞.
/// </remarks>
public static class RelaxationTime
{
    /// <summary>1 / (c·μ·(1 − √ρ)²) in hours for <paramref name="servers"/> c (a mean over a cycle may be fractional) at utilisation ρ; +∞ from ρ = 1.</summary>
    public static double OfQueue(double servers, double serviceHours, double rho) =>
        rho < 1.0 ? serviceHours / (servers * Math.Pow(1.0 - Math.Sqrt(rho), 2.0)) : double.PositiveInfinity;

    /// <summary>The unit's relaxation time in hours (+∞ for an unstable unit without a capacity; 0 for a unit no patient reaches).</summary>
    public static double Hours(UnitResult formula)
    {
        ArgumentNullException.ThrowIfNull(formula);
        var unit = formula.Unit;
        double serviceHours = unit.EffectiveService.MeanHours;
        if (formula.ArrivalsPerHour <= 0.0)
        {
            return 0.0;
        }

        if (unit.Servers.IsUnlimited)
        {
            return serviceHours;
        }

        int servers = unit.Servers.Count;
        double serviceRatePerHour = servers / serviceHours;
        double rho = formula.ArrivalsPerHour * serviceHours / servers;
        double queueing = OfQueue(servers, serviceHours, rho);
        if (unit.Capacity is int capacity)
        {
            double places = Math.Max(1, capacity - servers);
            double bounded = places * places / serviceRatePerHour;
            return Math.Max(serviceHours, Math.Min(queueing, bounded));
        }

        return Math.Max(serviceHours, queueing);
    }
}
