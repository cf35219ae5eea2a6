using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Benchmarks;

/// <summary>Large invented networks for benchmarks, the same for a given size and seed.</summary>
public static class GeneratedNetworks
{
    /// <summary>
    /// <paramref name="unitCount"/> units; one in ten takes external arrivals; each routes to up to three later-or-earlier
    /// units with fractions adding up to at most 0.8 (so every patient eventually leaves); servers sized so utilisation
    /// is about 0.7 at today's demand.
    /// </summary>
    public static Network Build(int unitCount, int seed)
    {
        var random = new Random(seed);
        var ids = Enumerable.Range(0, unitCount).Select(i => FormattableString.Invariant($"unit{i:D5}")).ToArray();
        var routes = ImmutableArray.CreateBuilder<Route>();
        for (int i = 0; i < unitCount; i++)
        {
            int fanOut = random.Next(4);
            double left = 0.8;
            var seen = new HashSet<int>();
            for (int k = 0; k < fanOut; k++)
            {
                int to = random.Next(unitCount);
                if (to == i || !seen.Add(to))
                {
                    continue;
                }

                double probability = left * random.NextDouble() * 0.5;
                left -= probability;
                routes.Add(new Route(ids[i], ids[to], probability));
            }
        }

        var arrivals = ImmutableArray.CreateBuilder<Arrival>();
        for (int i = 0; i < unitCount; i += 10)
        {
            arrivals.Add(new Arrival(ids[i], 1.0 + (random.NextDouble() * 9.0)));
        }

        var services = ids.Select(_ => 0.1 + (random.NextDouble() * 4.0)).ToArray();
        var draft = new Network("generated", TimeUnit.Hour,
            [.. ids.Select((id, i) => new Unit(id, id, Servers.Of(1), services[i]))], arrivals.ToImmutable(), routes.ToImmutable());
        double[] flows = TrafficEquations.Solve(RoutingTable.Build(draft));
        var units = ids.Select((id, i) => new Unit(id, id, Servers.Of(Math.Max(1, (int)Math.Ceiling(flows[i] * services[i] / 0.7))), services[i]));
        return draft with { Units = [.. units] };
    }
}
