using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>
/// Places N extra servers where they cut the mean time in the network most, by marginal analysis: one server at a
/// time to the unit whose mean number present L falls most.
/// </summary>
/// <remarks>
/// <para>
/// Mean time in the network is Σ L_i / γ (Little's law) and flows do not depend on servers, so the task is to
/// minimise Σ L_i(c_i) subject to Σ added = N. Each L_i = λ_i·Wq_i(c_i) + a_i is decreasing and convex in c_i on the
/// stable range (Dyer &amp; Proll 1977, "On the validity of marginal analysis for allocating servers in M/M/c queues",
/// Management Science 23, 1019–1022; also Lee &amp; Cohen 1983, J. Appl. Prob. 20, 920–923). For a separable sum of
/// convex functions under a total-count budget, greedy marginal allocation is optimal (Fox 1966, "Discrete
/// optimization via marginal analysis", Management Science 13, 210–216).
/// </para>
/// <para>
/// Unstable units have no finite L: the servers that make them stable (c = ⌊a⌋ + 1) are placed first, as any finite
/// answer needs them; the rest of the budget then goes by marginal analysis. Ties go to the unit listed first.
/// Cost O(N·c) for N servers. Thread-safe.
/// </para>
/// </remarks>
public static class BudgetAllocation
{
    /// <summary>Places <paramref name="extraServers"/> servers among the finite units of <paramref name="solution"/>'s network.</summary>
    public static BudgetPlan Allocate(NetworkSolution solution, int extraServers)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentOutOfRangeException.ThrowIfNegative(extraServers);
        var network = solution.Network;
        var candidates = new List<(int Index, double Load, int Current)>();
        var results = new List<UnitResult>();
        for (int i = 0; i < network.Units.Length; i++)
        {
            var result = solution.Units[i];
            if (!result.Unit.Servers.IsUnlimited && result.ArrivalsPerHour > 0.0)
            {
                candidates.Add((i, result.OfferedLoad, result.Unit.Servers.Count));
                results.Add(result);
            }
        }

        var servers = candidates.Select(c => c.Current).ToArray();
        var forced = candidates.Select(c => Math.Max(0, StableMinimum(c.Load) - c.Current)).ToArray();
        int needed = forced.Sum();
        if (needed > extraServers)
        {
            var shortBy = candidates.Select((c, k) => (network.Units[c.Index].Id, forced[k])).Where(p => p.Item2 > 0)
                .Select(p => string.Create(CultureInfo.InvariantCulture, $"{p.Id} +{p.Item2}"));
            string reason = string.Create(CultureInfo.InvariantCulture,
                $"{extraServers} servers cannot make every unit stable: it takes at least {needed} ({string.Join(", ", shortBy)})");
            return new BudgetPlan(extraServers, Allocations(network, candidates, servers, forced), solution, null, reason);
        }

        for (int k = 0; k < servers.Length; k++)
        {
            servers[k] += forced[k];
        }

        var queue = new PriorityQueue<int, (double NegativeGain, int Order)>();
        for (int k = 0; k < candidates.Count; k++)
        {
            queue.Enqueue(k, (-Gain(results[k], servers[k]), k));
        }

        for (int placed = needed; placed < extraServers && queue.Count > 0; placed++)
        {
            int k = queue.Dequeue();
            servers[k]++;
            queue.Enqueue(k, (-Gain(results[k], servers[k]), k));
        }

        var units = network.Units.ToBuilder();
        for (int k = 0; k < candidates.Count; k++)
        {
            units[candidates[k].Index] = units[candidates[k].Index] with { Servers = Servers.Of(servers[k]) };
        }

        var flows = solution.Units.Select(unit => unit.ArrivalsPerHour).ToArray();
        var after = NetworkSolver.FromFlows(network with { Units = units.ToImmutable() }, flows, solution.StrainThreshold);
        return new BudgetPlan(extraServers, Allocations(network, candidates, servers, forced), solution, after, null);
    }

    /// <summary>Mean number waiting, Lq = C·ρ/(1 − ρ), for a stable M/M/c unit (<paramref name="servers"/> above <paramref name="load"/>).</summary>
    public static double MeanQueue(int servers, double load)
    {
        double utilisation = load / servers;
        return ErlangFormulas.WaitProbability(servers, load) * utilisation / (1.0 - utilisation);
    }

    private static int StableMinimum(double load) => (int)Math.Floor(load) + 1;

    /// <summary>
    /// The fall in the mean number waiting from one more server, by the unit's own method: Lq = f·Lq(M/M/c) with the
    /// variability factor f of <see cref="GgcFormulas"/> from the result's arrival and service SCVs (f = 1, Erlang C,
    /// when both are 1). Above one server f does not depend on c, so Lq stays convex in c and marginal analysis stays
    /// optimal; the one-server Kraemer–Langenbach-Belz correction (non-Poisson arrivals) makes the first step approximate.
    /// </summary>
    private static double Gain(UnitResult result, int servers) =>
        servers + 1 > Servers.MaxCount ? 0.0 : MeanQueue(result, servers) - MeanQueue(result, servers + 1);

    internal static double MeanQueue(UnitResult result, int servers)
    {
        if (result.ArrivalScv == 1.0 && result.ServiceScv == 1.0)
        {
            return MeanQueue(servers, result.OfferedLoad);
        }

        double meanServiceHours = result.OfferedLoad / result.ArrivalsPerHour;
        return GgcFormulas.Estimate(servers, result.ArrivalsPerHour, meanServiceHours, result.ArrivalScv, result.ServiceScv, result.Unit.EffectiveService).MeanQueue ?? double.PositiveInfinity;
    }

    private static ImmutableArray<UnitAllocation> Allocations(Network network, List<(int Index, double Load, int Current)> candidates, int[] servers, int[] forced) =>
    [
        .. candidates.Select((c, k) => new UnitAllocation(network.Units[c.Index].Id, c.Current, servers[k] - c.Current, forced[k])),
    ];
}
