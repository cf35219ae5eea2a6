using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>
/// Demand growth: multiplies every external arrival stream (or one) by a range of factors and reports where the
/// network saturates, reusing solved flows instead of solving the traffic equations at every factor.
/// </summary>
/// <remarks>
/// The traffic equations λ = γ + Pᵀλ are linear in γ. Growing every stream by f gives λ(f) = f·λ, so unit i
/// saturates at f = c_i/a_i, its headroom. Growing one stream s by f gives λ(f) = λ_rest + f·λ_s, with λ_rest solved
/// for the other streams and λ_s = λ − λ_rest from the solution: one solve in all, however many factors.
/// <para>
/// Bed limits break the linearity: a unit with a capacity is never unstable, it turns away or diverts the patients who
/// find it full, and those patients change the flows elsewhere. So when the network has capacities every step is
/// solved afresh by <see cref="NetworkSolver.Solve"/>, fixed point of turn-away and diversion included, and units with
/// a capacity are left out of the saturation order. For each of them <see cref="BedLimits"/> finds by bisection the
/// factor at which P(full) passes 1% and 5% by the solver's own one-unit formula (M/M/c/K, Erlang loss or the
/// two-moment M/G/c/K for the unit's service variability): P(full) rises monotonically with the offered rate, and the unit's offered
/// rate is taken as linear in the factor, so the knock-on effects of diversion (patients diverted into the unit from
/// elsewhere, and those its own refusals spare downstream) are held at today's values. The saturation factors of
/// units without a capacity are likewise linear in today's flows. Thread-safe.
/// </para>
/// </remarks>
public static class GrowthAnalysis
{
    /// <summary>Rows in the default table.</summary>
    public const int DefaultSteps = 20;

    /// <summary>
    /// The default table stops where the first unit to saturate reaches this utilisation: just below saturation, so
    /// that every wait in the table is finite and the steep end of the curve shows.
    /// </summary>
    public const double DefaultLastUtilisation = 0.98;

    /// <summary>
    /// When the first unit is already at or above <see cref="DefaultLastUtilisation"/> today, the default table stops
    /// this fraction of the way from today's demand to its saturation.
    /// </summary>
    public const double DefaultReach = 0.5;

    /// <summary>The default table's last factor when no unit ever saturates: double today's demand.</summary>
    public const double NoSaturationLastFactor = 2.0;

    /// <summary>The largest growth factor searched for a bed limit's 1% and 5% points; beyond it the point is reported as not reached.</summary>
    public const double BedLimitSearchLimit = 1000.0;

    /// <summary>The two shares of arrivals finding a unit full that <see cref="BedLimitPoint"/> reports.</summary>
    public const double FullLow = 0.01;

    /// <inheritdoc cref="FullLow"/>
    public const double FullHigh = 0.05;

    /// <summary>Bisection steps for a bed-limit factor: the bracket [0, 1000] halves to about 1e-15.</summary>
    private const int BisectionSteps = 60;

    /// <summary>Grows every external arrival stream of <paramref name="solution"/>'s network.</summary>
    /// <param name="solution">The network solved at today's demand.</param>
    /// <param name="factors">Factors to tabulate, each finite and not negative; null for <see cref="DefaultFactors"/>.</param>
    public static GrowthResult Run(NetworkSolution solution, IReadOnlyList<double>? factors = null)
    {
        ArgumentNullException.ThrowIfNull(solution);
        var flows = solution.Units.Select(unit => unit.ArrivalsPerHour).ToArray();
        return Build(solution, null, new double[flows.Length], flows, factors);
    }

    /// <summary>Grows only the external arrivals at unit <paramref name="streamUnitId"/>; the other streams stay as they are.</summary>
    /// <param name="solution">The network solved at today's demand.</param>
    /// <param name="streamUnitId">A unit with a positive external arrival rate.</param>
    /// <param name="factors">Factors to tabulate, each finite and not negative; null for <see cref="DefaultFactors"/>.</param>
    /// <exception cref="ArgumentException">The unit has no positive external arrival stream.</exception>
    public static GrowthResult RunStream(NetworkSolution solution, string streamUnitId, IReadOnlyList<double>? factors = null)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(streamUnitId);
        var network = solution.Network;
        if (!network.Arrivals.Any(arrival => IsStream(arrival, streamUnitId) && arrival.PerHour > 0.0))
        {
            throw new ArgumentException($"Unit '{streamUnitId}' has no positive external arrival stream.", nameof(streamUnitId));
        }

        // By linearity the stream's own flows are the solved total minus the flows of the other streams: one solve
        // (none when the stream is the only one) instead of two, and the right-hand side stays as spread as the file's.
        var rest = network with { Arrivals = [.. network.Arrivals.Where(arrival => !IsStream(arrival, streamUnitId))] };
        double[] restFlows = rest.Arrivals.Any(arrival => arrival.PerHour > 0.0)
            ? TrafficEquations.Solve(RoutingTable.Build(rest))
            : new double[network.Units.Length];
        var streamFlows = new double[restFlows.Length];
        for (int i = 0; i < streamFlows.Length; i++)
        {
            double total = solution.Units[i].ArrivalsPerHour;
            restFlows[i] = Math.Min(restFlows[i], total);
            streamFlows[i] = total - restFlows[i];
        }

        return Build(solution, streamUnitId, restFlows, streamFlows, factors);
    }

    /// <summary>
    /// <see cref="DefaultSteps"/> evenly spaced factors from 1 to <see cref="DefaultLastFactor"/>.
    /// </summary>
    public static ImmutableArray<double> DefaultFactors(SaturationPoint? firstUnstable) =>
        Range(1.0, DefaultLastFactor(firstUnstable), DefaultSteps);

    /// <summary>
    /// The default table's last factor: where the first unit to saturate reaches <see cref="DefaultLastUtilisation"/>
    /// (or <see cref="DefaultReach"/> of the way to saturation when it is already that busy); 1 when it is already
    /// unstable; <see cref="NoSaturationLastFactor"/> when nothing saturates.
    /// </summary>
    public static double DefaultLastFactor(SaturationPoint? firstUnstable) => firstUnstable switch
    {
        null => NoSaturationLastFactor,
        { SaturationFactor: <= 1.0 } => 1.0,
        { UtilisationToday: < DefaultLastUtilisation } point => point.FactorAt(DefaultLastUtilisation),
        var point => 1.0 + (DefaultReach * (point.SaturationFactor - 1.0)),
    };

    /// <summary><paramref name="count"/> evenly spaced factors from <paramref name="first"/> to <paramref name="last"/>; one when they are equal.</summary>
    public static ImmutableArray<double> Range(double first, double last, int count)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(count, 1);
        if (count == 1 || last <= first)
        {
            return [first];
        }

        var factors = ImmutableArray.CreateBuilder<double>(count);
        for (int k = 0; k < count; k++)
        {
            factors.Add(k == count - 1 ? last : first + ((last - first) * k / (count - 1)));
        }

        return factors.MoveToImmutable();
    }

    private static bool IsStream(Arrival arrival, string unitId) => string.Equals(arrival.UnitId, unitId, StringComparison.Ordinal);

    private static GrowthResult Build(NetworkSolution solution, string? stream, double[] fixedFlows, double[] grownFlows, IReadOnlyList<double>? factors)
    {
        var network = solution.Network;
        var saturation = SaturationOrder(network, fixedFlows, grownFlows, solution.StrainThreshold);
        bool hasCapacity = network.Units.Any(unit => unit.Capacity is not null);
        var chosen = factors?.ToImmutableArray() ?? DefaultFactors(saturation.IsEmpty ? null : saturation[0]);
        var steps = ImmutableArray.CreateBuilder<GrowthStep>(chosen.Length);
        var flows = new double[fixedFlows.Length];
        foreach (double factor in chosen)
        {
            if (!double.IsFinite(factor) || factor < 0.0)
            {
                throw new ArgumentOutOfRangeException(nameof(factors), factor, "A growth factor is finite and not negative.");
            }

            for (int i = 0; i < flows.Length; i++)
            {
                flows[i] = fixedFlows[i] + (factor * grownFlows[i]);
            }

            var grown = network with { Arrivals = [.. network.Arrivals.Select(arrival => Grow(arrival, stream, factor))] };
            steps.Add(new GrowthStep(factor, hasCapacity
                ? NetworkSolver.Solve(grown, solution.StrainThreshold)
                : NetworkSolver.FromFlows(grown, flows, solution.StrainThreshold)));
        }

        return new GrowthResult(network, stream, solution.StrainThreshold, saturation, steps.MoveToImmutable())
        {
            BedLimits = BedLimits(solution, fixedFlows),
        };
    }

    /// <summary>For every unit with a capacity, the factors at which 1% and 5% of its arrivals find it full.</summary>
    /// <param name="solution">Today's solution.</param>
    /// <param name="fixedFlows">Per unit, the flow that does not grow (all zero when every stream grows).</param>
    private static ImmutableArray<BedLimitPoint> BedLimits(NetworkSolution solution, double[] fixedFlows)
    {
        var points = ImmutableArray.CreateBuilder<BedLimitPoint>();
        for (int i = 0; i < solution.Units.Length; i++)
        {
            var result = solution.Units[i];
            if (result.Unit.Capacity is not int capacity)
            {
                continue;
            }

            // The solver reports the admitted rate; the offered rate adds those who found the unit full. The mean service
            // (the groups' mixture when there are groups) is the admitted load over the admitted rate.
            double admitted = result.ArrivalsPerHour;
            double offered = admitted + result.TurnedAwayPerHour + result.DivertedPerHour;
            double fixedOffered = Math.Min(fixedFlows[i], offered);
            double grownOffered = offered - fixedOffered;
            if (!(admitted > 0.0) || !(grownOffered > 0.0))
            {
                points.Add(new BedLimitPoint(result.Unit.Id, capacity, result.PFull, null, null));
                continue;
            }

            // The same one-unit formula as the solver: M/M/c/K for exponential service, Erlang loss when K = c (any
            // service), otherwise the two-moment M/G/c/K with the unit's service SCV (the groups' mixture) and family.
            int servers = result.Unit.Servers.IsUnlimited ? capacity : Math.Min(result.Unit.Servers.Count, capacity);
            double meanServiceHours = result.OfferedLoad / admitted;
            double serviceScv = result.ServiceScv;
            var serviceShape = result.Unit.EffectiveService;
            double Full(double factor) => FiniteCapacityFormulas.Solve(
                servers, capacity, fixedOffered + (factor * grownOffered), meanServiceHours, serviceScv, serviceShape).FullProbability;
            points.Add(new BedLimitPoint(result.Unit.Id, capacity, result.PFull, FactorWhereFull(Full, FullLow), FactorWhereFull(Full, FullHigh)));
        }

        return points.ToImmutable();
    }

    /// <summary>
    /// The smallest factor in [0, <see cref="BedLimitSearchLimit"/>] at which the increasing function
    /// <paramref name="full"/> reaches <paramref name="share"/>, by bisection; null when it does not within the range.
    /// </summary>
    private static double? FactorWhereFull(Func<double, double> full, double share)
    {
        if (full(0.0) >= share)
        {
            return 0.0;
        }

        if (full(BedLimitSearchLimit) < share)
        {
            return null;
        }

        double low = 0.0;
        double high = BedLimitSearchLimit;
        for (int k = 0; k < BisectionSteps; k++)
        {
            double middle = 0.5 * (low + high);
            if (full(middle) >= share)
            {
                high = middle;
            }
            else
            {
                low = middle;
            }
        }

        return 0.5 * (low + high);
    }

    private static Arrival Grow(Arrival arrival, string? stream, double factor) =>
        stream is null || IsStream(arrival, stream) ? arrival with { PerHour = arrival.PerHour * factor } : arrival;

    private static ImmutableArray<SaturationPoint> SaturationOrder(Network network, double[] fixedFlows, double[] grownFlows, double strainThreshold)
    {
        var points = new List<(SaturationPoint Point, int Index)>();
        for (int i = 0; i < network.Units.Length; i++)
        {
            var unit = network.Units[i];
            // A unit with a capacity never becomes unstable: it turns patients away instead (see BedLimits).
            if (unit.Servers.IsUnlimited || unit.Capacity is not null)
            {
                continue;
            }

            // Flow at which the unit's utilisation reaches 1: c servers each finishing 1/S patients per hour.
            double capacityPerHour = unit.Servers.Count / unit.MeanServiceHours;
            if (!(grownFlows[i] > 0.0))
            {
                // Not fed by the growing stream: unstable at every factor, or never.
                if (fixedFlows[i] >= capacityPerHour)
                {
                    points.Add((new SaturationPoint(unit.Id, fixedFlows[i] / capacityPerHour, 0.0, 0.0), i));
                }

                continue;
            }

            // Other streams alone may already strain or saturate the unit: then it does so from a factor of 0 (a
            // negative factor would mean removing more than the stream brings).
            double saturation = Math.Max(0.0, (capacityPerHour - fixedFlows[i]) / grownFlows[i]);
            double strain = Math.Max(0.0, ((strainThreshold * capacityPerHour) - fixedFlows[i]) / grownFlows[i]);
            points.Add((new SaturationPoint(unit.Id, (fixedFlows[i] + grownFlows[i]) / capacityPerHour, strain, saturation), i));
        }

        return [.. points.OrderBy(p => p.Point.SaturationFactor).ThenBy(p => p.Index).Select(p => p.Point)];
    }
}
