using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// Effective flows of a network whose units have bed limits: full units turn patients away or divert them to another
/// unit, so each unit sees fewer (or, for a diversion target, more) patients than the traffic equations say.
/// </summary>
/// <remarks>
/// <para>
/// Finds the offered rates λ that satisfy, for every unit i,
/// λ_i = γ_i + Σ_j λ_j(1 − B_j(λ_j))·p_ji + Σ_{j diverting to i} λ_j·B_j(λ_j), where γ is the external arrivals, p the
/// routing fractions and B_j the chance that unit j is full when a patient arrives. B_j is the blocking probability of
/// <see cref="FiniteCapacityFormulas"/> at λ_j (Erlang B when capacity equals servers, M/M/c/K or its two-moment
/// M/G/c/K form otherwise) for the service of the patients offered to j: the classes' mixture weighted by their
/// offered rates (<see cref="ClassServices"/>); 0 for a unit without capacity. A unit with unlimited servers and a capacity K is an Erlang loss system with K servers.
/// Each patient group (and the default group of the network's own arrivals and routes) flows through its own routes;
/// the groups share each unit's blocking, because Poisson arrivals see the unit's time averages.
/// </para>
/// <para>
/// Solved by damped successive substitution from the external arrivals. The admitted rate λ(1 − B(λ)) and the blocked
/// rate λB(λ) both rise with λ, so the map is monotone: the steps rise to the least fixed point. They stop when no
/// flow changes by more than <see cref="CapacityFlowOptions.Tolerance"/> of the largest flow, and throw
/// <see cref="CapacityFlowsException"/> after <see cref="CapacityFlowOptions.MaxIterations"/>. Each step costs the
/// routes plus the blocking of each limited unit (O(K) at worst).
/// </para>
/// <para>
/// An approximation (Erlang's fixed point, as in reduced-load approximations of loss networks): every unit is
/// treated as if fed by an independent Poisson stream. Exact for one unit that turns patients away with Poisson
/// arrivals. The overflow of a full unit comes in bursts (it is "peakier" than Poisson, variance above its mean), so
/// a small unit that takes diversions blocks more than this predicts; the error grows as the diversion target gets
/// smaller and the diverted share of its arrivals larger. Units without capacity keep their offered rate and may be
/// unstable: that is left to the caller. Thread-safe (pure function).
/// </para>
/// </remarks>
public static class CapacityFlows
{
    /// <summary>Solves the flows with <see cref="CapacityFlowOptions.Default"/>.</summary>
    /// <inheritdoc cref="Solve(Network, CapacityFlowOptions)"/>
    public static CapacityFlowSolution Solve(Network network) => Solve(network, CapacityFlowOptions.Default);

    /// <summary>Offered, admitted, turned-away and diverted rates of every unit in a validated network.</summary>
    /// <param name="network">A validated network; diversions form no loop (the parser rejects one).</param>
    /// <param name="options">Tolerance in (0, 0.1], at least one iteration, damping in (0, 1].</param>
    /// <exception cref="ArgumentException">A diversion loops back, or names an unknown unit.</exception>
    /// <exception cref="ArgumentOutOfRangeException">An option is outside its range.</exception>
    /// <exception cref="CapacityFlowsException">The flows do not settle within the iteration limit.</exception>
    public static CapacityFlowSolution Solve(Network network, CapacityFlowOptions options)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(options);
        CheckOptions(options);
        var index = network.BuildIndex();
        int n = network.Units.Length;
        var divertTo = new int[n];
        for (int i = 0; i < n; i++)
        {
            string? target = network.Units[i].Capacity is null ? null : network.Units[i].WhenFull.DivertToUnitId;
            divertTo[i] = target is null ? -1
                : index.TryGetValue(target, out int position) ? position
                : throw new ArgumentException($"unit '{network.Units[i].Id}' diverts to unknown unit '{target}'", nameof(network));
        }

        CheckNoDiversionLoop(network, divertTo);
        var classes = new List<RoutingTable> { RoutingTable.Build(network) };
        classes.AddRange(network.Groups.Select(group => RoutingTable.Build(network with { Arrivals = group.Arrivals, Routes = group.Routes ?? network.Routes })));

        var services = ClassServices.Of(network);
        var offered = classes.Select(routing => routing.ExternalPerHour.ToArray()).ToArray();
        var blocking = new double[n];
        int iteration = 0;
        while (true)
        {
            var total = Totals(offered, n);
            for (int i = 0; i < n; i++)
            {
                blocking[i] = network.Units[i].Capacity is null ? 0.0 : Metrics(network.Units[i], total[i], services.Mix(offered, i)).FullProbability;
            }

            double largestChange = 0.0;
            for (int g = 0; g < classes.Count; g++)
            {
                double[] substituted = Substitute(classes[g], offered[g], blocking, divertTo);
                for (int i = 0; i < n; i++)
                {
                    double updated = offered[g][i] + (options.Damping * (substituted[i] - offered[g][i]));
                    largestChange = Math.Max(largestChange, Math.Abs(updated - offered[g][i]));
                    offered[g][i] = updated;
                }
            }

            iteration++;
            double largestFlow = Totals(offered, n).DefaultIfEmpty(0.0).Max();
            if (largestChange <= options.Tolerance * largestFlow)
            {
                break;
            }

            if (iteration >= options.MaxIterations || !double.IsFinite(largestFlow))
            {
                throw new CapacityFlowsException(largestFlow > 0.0 ? largestChange / largestFlow : double.PositiveInfinity, iteration);
            }
        }

        return Assemble(network, offered, services, divertTo, iteration);
    }

    private static double[] Substitute(RoutingTable routing, double[] offered, double[] blocking, int[] divertTo)
    {
        var next = routing.ExternalPerHour.ToArray();
        for (int from = 0; from < next.Length; from++)
        {
            double admitted = offered[from] * (1.0 - blocking[from]);
            for (int e = routing.Offsets[from]; e < routing.Offsets[from + 1]; e++)
            {
                next[routing.Targets[e]] += admitted * routing.Probabilities[e];
            }

            if (divertTo[from] >= 0)
            {
                next[divertTo[from]] += offered[from] * blocking[from];
            }
        }

        return next;
    }

    private static CapacityFlowSolution Assemble(Network network, double[][] offered, ClassServices services, int[] divertTo, int iterations)
    {
        int n = network.Units.Length;
        var total = Totals(offered, n);
        var divertedIn = new double[n];
        var rows = new UnitCapacityFlow[n];
        for (int i = 0; i < n; i++)
        {
            var unit = network.Units[i];
            var service = services.Mix(offered, i);
            var metrics = unit.Capacity is null ? null : Metrics(unit, total[i], service);
            double blocked = metrics?.BlockedPerHour ?? 0.0;
            double admitted = metrics is null ? total[i] : total[i] - blocked;
            bool diverts = divertTo[i] >= 0;
            if (diverts)
            {
                divertedIn[divertTo[i]] += blocked;
            }

            rows[i] = new UnitCapacityFlow(unit.Id, total[i], admitted, metrics?.FullProbability ?? 0.0,
                diverts ? 0.0 : blocked, diverts ? blocked : 0.0, 0.0, metrics)
            {
                MeanServiceHours = service.MeanHours,
                ServiceScv = service.Scv,
            };
        }

        return new CapacityFlowSolution(
            [.. rows.Select((row, i) => row with { DivertedInPerHour = divertedIn[i] })],
            [.. offered.Select(flows => flows.ToImmutableArray())],
            iterations);
    }

    /// <summary>The one-unit metrics of a unit with a capacity, for the service of the patients offered to it.</summary>
    private static FiniteCapacityResult Metrics(Unit unit, double offeredPerHour, (double MeanHours, double Scv) service)
    {
        int capacity = unit.Capacity ?? throw new ArgumentException("The unit has no capacity.", nameof(unit));
        return FiniteCapacityFormulas.Solve(LimitedServers(unit, capacity), capacity, offeredPerHour, service.MeanHours, service.Scv, unit.EffectiveService);
    }

    /// <summary>With unlimited servers every patient present is in service, so the unit is a loss system of K servers.</summary>
    private static int LimitedServers(Unit unit, int capacity) => unit.Servers.IsUnlimited ? capacity : Math.Min(unit.Servers.Count, capacity);

    private static double[] Totals(double[][] offered, int n)
    {
        var total = new double[n];
        foreach (double[] flows in offered)
        {
            for (int i = 0; i < n; i++)
            {
                total[i] += flows[i];
            }
        }

        return total;
    }

    private static void CheckNoDiversionLoop(Network network, int[] divertTo)
    {
        for (int start = 0; start < divertTo.Length; start++)
        {
            int unit = divertTo[start];
            for (int hops = 0; unit >= 0; hops++)
            {
                if (unit == start || hops > divertTo.Length)
                {
                    throw new ArgumentException(
                        $"the diversions from unit '{network.Units[start].Id}' go round a loop of units that can all be full: a diversion chain with no way out", nameof(network));
                }

                unit = divertTo[unit];
            }
        }
    }

    private static void CheckOptions(CapacityFlowOptions options)
    {
        if (!(options.Tolerance > 0.0 && options.Tolerance <= 0.1))
        {
            throw new ArgumentOutOfRangeException(nameof(options), options.Tolerance, "The tolerance is in (0, 0.1].");
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(options.MaxIterations, 1, nameof(options));
        if (!(options.Damping > 0.0 && options.Damping <= 1.0))
        {
            throw new ArgumentOutOfRangeException(nameof(options), options.Damping, "The damping is in (0, 1].");
        }
    }
}
