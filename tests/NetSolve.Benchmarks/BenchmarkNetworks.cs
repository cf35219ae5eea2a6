using NetSolve.Model;

namespace NetSolve.Benchmarks;

/// <summary>Invented networks for throughput benchmarks, generated from a fixed seed.</summary>
internal static class BenchmarkNetworks
{
    /// <summary>
    /// <paramref name="units"/> units with 1 to 8 servers each, arrivals at every tenth unit, and up to three routes out
    /// of each unit (forward, so patients always leave), loads between about 0.5 and 0.85.
    /// </summary>
    public static Network Build(int units, int seed)
    {
        var random = new Random(seed);
        var arrivals = new List<Arrival>();
        var routes = new List<Route>();
        for (int i = 0; i < units; i++)
        {
            if (i % 10 == 0)
            {
                arrivals.Add(new Arrival(Id(i), 10.0));
            }

            int outgoing = Math.Min(3, units - 1 - i);
            for (int k = 0; k < outgoing; k++)
            {
                int target = i + 1 + random.Next(Math.Min(10, units - 1 - i));
                routes.Add(new Route(Id(i), Id(target), 0.25));
            }
        }

        var draft = new Network("Benchmark network", TimeUnit.Hour, [], [.. arrivals], [.. MergeDuplicates(routes)]);
        var unitList = new List<Unit>();
        var flows = new double[units];
        foreach (var arrival in arrivals)
        {
            flows[int.Parse(arrival.UnitId.AsSpan(1), System.Globalization.CultureInfo.InvariantCulture)] += arrival.PerHour;
        }

        // Routes only go forward, so one pass in unit order solves the traffic equations.
        for (int i = 0; i < units; i++)
        {
            foreach (var route in draft.Routes.Where(r => r.From == Id(i)))
            {
                flows[Index(route.To)] += flows[i] * route.Probability;
            }

            int servers = 1 + random.Next(8);
            double load = 0.5 + (0.35 * random.NextDouble());
            double flow = Math.Max(flows[i], 0.1);
            unitList.Add(new Unit(Id(i), Id(i), Servers.Of(servers), load * servers / flow));
        }

        return draft with { Units = [.. unitList] };
    }

    private static string Id(int i) => "u" + i.ToString(System.Globalization.CultureInfo.InvariantCulture);

    private static int Index(string id) => int.Parse(id.AsSpan(1), System.Globalization.CultureInfo.InvariantCulture);

    private static IEnumerable<Route> MergeDuplicates(IEnumerable<Route> routes) =>
        routes.GroupBy(route => (route.From, route.To))
            .Select(group => new Route(group.Key.From, group.Key.To, group.Sum(route => route.Probability)));
}
