using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using NetSolve.Model;

namespace NetSolve.Benchmarks;

/// <summary>
/// Builds random valid networks from a seed: every unit routes to at most a given number of others, and every set
/// of units has an exit, so the traffic equations always have a solution.
/// </summary>
/// <remarks>
/// Probabilities are whole hundredths and times whole quarter hours, so the YAML text and the model value hold
/// exactly the same numbers. Same seed, same network. Not thread-safe (one generator per call).
/// </remarks>
public static class NetworkGenerator
{
    /// <summary>Largest total routing probability out of a unit that is not routed in full.</summary>
    private const int MaxLeakyTotalHundredths = 95;

    /// <summary>Generates a network of <paramref name="unitCount"/> units.</summary>
    /// <param name="unitCount">At least 1.</param>
    /// <param name="seed">Seed of the generator.</param>
    /// <param name="maxRoutesPerUnit">Most routes out of one unit.</param>
    /// <param name="arrivalShare">Share of units with external arrivals (at least one unit always has some).</param>
    public static GeneratedNetwork Generate(int unitCount, int seed, int maxRoutesPerUnit = 5, double arrivalShare = 0.1)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(unitCount, 1);
        var random = new Random(seed);
        var units = ImmutableArray.CreateBuilder<Unit>(unitCount);
        var arrivals = ImmutableArray.CreateBuilder<Arrival>();
        var routes = ImmutableArray.CreateBuilder<Route>();
        var ids = new string[unitCount];
        for (int i = 0; i < unitCount; i++)
        {
            ids[i] = "u" + i.ToString(CultureInfo.InvariantCulture);
        }

        // Decide first which units route in full (total 1): each of them must route to at least one leaky unit.
        var totals = new int[unitCount];
        for (int i = 0; i < unitCount; i++)
        {
            totals[i] = random.NextDouble() < 0.05 ? 100 : random.Next(0, MaxLeakyTotalHundredths + 1);
        }

        if (Array.TrueForAll(totals, total => total == 100))
        {
            totals[0] = MaxLeakyTotalHundredths;
        }

        var yamlUnits = new StringBuilder(unitCount * 48);
        var yamlArrivals = new StringBuilder();
        var yamlRoutes = new StringBuilder(unitCount * 64);
        for (int i = 0; i < unitCount; i++)
        {
            bool unlimited = random.NextDouble() < 0.1;
            int servers = random.Next(1, 41);
            int serviceQuarters = random.Next(1, 17);
            double serviceHours = serviceQuarters / 4.0;
            units.Add(new Unit(ids[i], ids[i], unlimited ? Servers.Unlimited : Servers.Of(servers), serviceHours));
            yamlUnits.Append(CultureInfo.InvariantCulture, $"  {ids[i]}:\n    servers: {(unlimited ? "unlimited" : servers.ToString(CultureInfo.InvariantCulture))}\n    service: {serviceHours.ToString("R", CultureInfo.InvariantCulture)}h\n");

            if (i == 0 || random.NextDouble() < arrivalShare)
            {
                int tenths = random.Next(1, 51);
                arrivals.Add(new Arrival(ids[i], tenths / 10.0));
                yamlArrivals.Append(CultureInfo.InvariantCulture, $"  {ids[i]}: {(tenths / 10.0).ToString("R", CultureInfo.InvariantCulture)}/h\n");
            }

            AddRoutes(i, ids, totals, maxRoutesPerUnit, random, routes, yamlRoutes);
        }

        var network = new Network(FormattableString.Invariant($"Generated network of {unitCount} units (seed {seed})"), TimeUnit.Hour,
            units.MoveToImmutable(), arrivals.ToImmutable(), routes.ToImmutable());
        string yaml = $"name: {network.Name}\ntime_unit: hour\nunits:\n{yamlUnits}arrivals:\n{yamlArrivals}routes:\n{yamlRoutes}";
        return new GeneratedNetwork(yaml, network);
    }

    private static void AddRoutes(int from, string[] ids, int[] totals, int maxRoutes, Random random,
        ImmutableArray<Route>.Builder routes, StringBuilder yaml)
    {
        int n = ids.Length;
        int total = totals[from];
        bool full = total == 100;
        int count = Math.Min(Math.Min(random.Next(1, maxRoutes + 1), total), full ? n - 1 : n);

        if (count == 0)
        {
            return;
        }

        var targets = new List<int>(count);
        if (full)
        {
            targets.Add(PickLeaky(from, totals, random));
        }

        while (targets.Count < count)
        {
            int target = random.Next(0, n);
            if (!targets.Contains(target) && !(target == from && full))
            {
                targets.Add(target);
            }
        }

        // Split the total into count parts of at least one hundredth each.
        var parts = new int[count];
        int left = total - count;
        for (int k = 0; k < count; k++)
        {
            parts[k] = 1;
        }

        for (int unit = 0; unit < left; unit++)
        {
            parts[random.Next(0, count)]++;
        }

        yaml.Append(CultureInfo.InvariantCulture, $"  {ids[from]}:\n");
        for (int k = 0; k < count; k++)
        {
            double probability = parts[k] / 100.0;
            routes.Add(new Route(ids[from], ids[targets[k]], probability));
            yaml.Append(CultureInfo.InvariantCulture, $"    {ids[targets[k]]}: {probability.ToString("R", CultureInfo.InvariantCulture)}\n");
        }
    }

    private static int PickLeaky(int from, int[] totals, Random random)
    {
        while (true)
        {
            int target = random.Next(0, totals.Length);
            if (target != from && totals[target] < 100)
            {
                return target;
            }
        }
    }
}
