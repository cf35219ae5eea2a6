using System.Collections.Immutable;
using MathNet.Numerics;

namespace NetSolve.Solving;

/// <summary>
/// Each unit's arrival SCV as the value of its arrival flow's variability function at the time scale of the unit's
/// own queue (W. Whitt, Management Science 41(10), 1995, pp. 1704–1715): the two-moment equations are solved once per
/// destination, with every merged stream weighed at the destination's load and every unit's departures weighing its
/// service by how long the destination looks compared with how long that unit's queue remembers.
/// </summary>
/// <remarks>
/// <para>For destination j at load ρ_j and source i at ρ_i (docs/methods.md, "Variability functions"):</para>
/// <list type="bullet">
/// <item>merging at every unit k: w_k = 1 / (1 + 4(1 − ρ_j)²(v_k − 1)) (Whitt 1983's weight, read in 1995 as the
/// superposition's variability function at the destination's load);</item>
/// <item>departures of i: cd²_i − 1 = (1 − ω_ij)(ca²_i − 1) + ω_ij(x_i − 1), ω_ij = c*(x_j / τ_i), with
/// x_j = ρ_j²(ca²_j + cs²_j) / (2λ_j(1 − ρ_j)²) the time a queue at j looks back over (the maximiser of the
/// robust-queueing workload bound, W. Whitt and W. You, Operations Research 66(1), 2018, pp. 184–199, from memory),
/// τ_i = ρ_i²(ca²_i + cs²_i) / (λ_i(1 − ρ_i)²) the relaxation time of i's queue in heavy traffic and c* the
/// correlation function of stationary reflected Brownian motion, c*(t) = 2(1 − 2t − t²)Φᶜ(√t) + 2√t(1 + t)φ(√t)
/// (J. Abate and W. Whitt, from memory), which weighs departures by their heavy-traffic variance function (Whitt and
/// You, Stochastic Systems, from memory): service variability over windows short against τ_i, the arrivals' over long ones.</item>
/// </list>
/// <para>
/// The ca² in the time scales are the decomposition's, so each system stays linear. A unit with unlimited servers has
/// ω = 0 (its departures carry its arrivals); a saturated source has τ = ∞ and ω = 1; a saturated destination looks
/// over an unbounded window (ω = 0, w = 1: the asymptotic method). With Poisson external arrivals and exponential
/// service every constant term is 0 and every ca² is exactly 1, as in the decomposition.
/// </para>
/// </remarks>
internal static class VariabilityFunctions
{
    /// <summary>The arrival SCVs by variability functions; departures as the decomposition gives them (interval SCVs).</summary>
    /// <param name="units">Checked units.</param>
    /// <param name="routes">Checked routes.</param>
    /// <param name="decomposition">The decomposition's solution, for the ca² in the time scales.</param>
    /// <param name="deviations">Solves one built system for its deviations ca² − 1, residual checked.</param>
    public static ArrivalVariabilitySolution Solve(IReadOnlyList<ArrivalVariabilityUnit> units, IReadOnlyList<ArrivalVariabilityRoute> routes,
        ArrivalVariabilitySolution decomposition, Func<ArrivalVariabilitySystem, double[]> deviations)
    {
        int n = units.Count;
        var relaxation = new double[n];
        for (int i = 0; i < n; i++)
        {
            relaxation[i] = RelaxationHours(units[i], decomposition.ArrivalScv[i]);
        }

        var arrival = ImmutableArray.CreateBuilder<double>(n);
        var weight = new double[n];
        for (int j = 0; j < n; j++)
        {
            if (!(units[j].ArrivalsPerHour > 0.0))
            {
                arrival.Add(decomposition.ArrivalScv[j]);
                continue;
            }

            double window = WindowHours(units[j], decomposition.ArrivalScv[j]);
            for (int i = 0; i < n; i++)
            {
                weight[i] = ServiceWeight(ArrivalVariabilitySystem.Load(units[i]), window, relaxation[i]);
            }

            var system = ArrivalVariabilitySystem.Build(units, routes, weight, ArrivalVariabilitySystem.Load(units[j]));
            arrival.Add(system.IsReached[j] ? ArrivalVariability.Clamp(1.0 + deviations(system)[j]) : decomposition.ArrivalScv[j]);
        }

        return decomposition with { ArrivalScv = arrival.MoveToImmutable() };
    }

    /// <summary>ω = c*(window / relaxation): 1 for a saturated source, 0 for a source with unlimited servers or an unbounded window.</summary>
    private static double ServiceWeight(double rho, double windowHours, double relaxationHours)
    {
        if (rho <= 0.0)
        {
            return 0.0;
        }

        double ratio = double.IsPositiveInfinity(relaxationHours)
            ? 0.0
            : double.IsPositiveInfinity(windowHours) ? double.PositiveInfinity : windowHours / relaxationHours;
        return BrownianCorrelation(ratio);
    }

    /// <summary>x = ρ²(ca² + cs²) / (2λ(1 − ρ)²) hours; 0 for unlimited servers, ∞ at a load of 1 or more.</summary>
    internal static double WindowHours(ArrivalVariabilityUnit unit, double arrivalScv) => 0.5 * RelaxationHours(unit, arrivalScv);

    /// <summary>τ = ρ²(ca² + cs²) / (λ(1 − ρ)²) hours: 0 with unlimited servers or no flow, ∞ at a load of 1 or more.</summary>
    private static double RelaxationHours(ArrivalVariabilityUnit unit, double arrivalScv)
    {
        double rho = ArrivalVariabilitySystem.Load(unit);
        if (rho >= 1.0)
        {
            return double.PositiveInfinity;
        }

        if (rho <= 0.0 || !(unit.ArrivalsPerHour > 0.0))
        {
            return 0.0;
        }

        double idle = 1.0 - rho;
        return rho * rho * (arrivalScv + unit.ServiceScv) / (unit.ArrivalsPerHour * idle * idle);
    }

    /// <summary>c*(t) = 2(1 − 2t − t²)Φᶜ(√t) + 2√t(1 + t)φ(√t): 1 at t = 0, 4(φ(1) − Φᶜ(1)) ≈ 0.333 at t = 1, falling to 0.</summary>
    internal static double BrownianCorrelation(double t)
    {
        if (double.IsPositiveInfinity(t) || t > 200.0)
        {
            return 0.0;
        }

        double root = Math.Sqrt(t);
        double tail = 0.5 * SpecialFunctions.Erfc(root / Math.Sqrt(2.0));
        double density = Math.Exp(-0.5 * t) / Math.Sqrt(2.0 * Math.PI);
        return Math.Max(0.0, (2.0 * (1.0 - (2.0 * t) - (t * t)) * tail) + (2.0 * root * (1.0 + t) * density));
    }
}
