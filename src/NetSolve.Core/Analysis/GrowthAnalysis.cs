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
/// for the other streams and λ_s = λ − λ_rest from the solution: one solve in all, however many factors. Thread-safe.
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
            steps.Add(new GrowthStep(factor, NetworkSolver.FromFlows(grown, flows, solution.StrainThreshold)));
        }

        return new GrowthResult(network, stream, solution.StrainThreshold, saturation, steps.MoveToImmutable());
    }

    private static Arrival Grow(Arrival arrival, string? stream, double factor) =>
        stream is null || IsStream(arrival, stream) ? arrival with { PerHour = arrival.PerHour * factor } : arrival;

    private static ImmutableArray<SaturationPoint> SaturationOrder(Network network, double[] fixedFlows, double[] grownFlows, double strainThreshold)
    {
        var points = new List<(SaturationPoint Point, int Index)>();
        for (int i = 0; i < network.Units.Length; i++)
        {
            var unit = network.Units[i];
            if (unit.Servers.IsUnlimited)
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
