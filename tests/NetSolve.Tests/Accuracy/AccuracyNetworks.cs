using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Tests.Accuracy;

/// <summary>
/// The networks of the accuracy study: random small networks with variable service, and the "exponential twin" of any
/// network (every service exponential with the same mean, every external arrival cv 1), whose formula is Jackson's.
/// </summary>
internal static class AccuracyNetworks
{
    /// <summary>Service cvs drawn for generated units: from 0.3 to 2, never 1.</summary>
    private static readonly double[] Cvs = [0.3, 0.5, 0.7, 0.85, 1.25, 1.5, 2.0];

    /// <summary>
    /// A network of 3 to 8 units from <paramref name="seed"/>: external arrivals at the first unit and at some others,
    /// forward routes to later units, now and then a route back to an earlier one (feedback), each unit's service a
    /// gamma or lognormal with a cv from 0.3 to 2, servers 1 to 5 and a mean service chosen for a utilisation from
    /// 0.3 to 0.9.
    /// </summary>
    public static Network Generate(int seed)
    {
        var random = new Random(seed);
        int count = random.Next(3, 9);
        var ids = Enumerable.Range(0, count).Select(i => "u" + i.ToString(CultureInfo.InvariantCulture)).ToArray();
        var arrivals = new List<Arrival> { new(ids[0], Round(1.0 + (4.0 * random.NextDouble()))) };
        for (int i = 1; i < count; i++)
        {
            if (random.NextDouble() < 0.3)
            {
                arrivals.Add(new Arrival(ids[i], Round(0.5 + (2.0 * random.NextDouble()))));
            }
        }

        var routes = new List<Route>();
        for (int i = 0; i < count; i++)
        {
            double left = 0.85;
            // The next unit always, so every unit is reached; later ones by chance.
            var targets = Enumerable.Range(i + 1, count - i - 1).Where(j => j == i + 1 || random.NextDouble() < 0.5).ToList();
            if (i > 0 && random.NextDouble() < 0.3)
            {
                targets.Add(random.Next(0, i));
            }

            foreach (int target in targets)
            {
                double share = Round(Math.Min(left, 0.1 + (0.3 * random.NextDouble())));
                if (share >= 0.05)
                {
                    routes.Add(new Route(ids[i], ids[target], share));
                    left -= share;
                }
            }
        }

        // First the flows (they do not depend on service), then each unit's service for its target load.
        var draft = new Network("draft", TimeUnit.Hour, [.. ids.Select(id => new Unit(id, id, Servers.Of(1), 1.0))], [.. arrivals], [.. routes]);
        var flows = NetworkSolver.Solve(draft).Units.Select(unit => unit.ArrivalsPerHour).ToArray();
        var units = ImmutableArray.CreateBuilder<Unit>(count);
        for (int i = 0; i < count; i++)
        {
            int servers = random.Next(1, 6);
            double load = 0.3 + (0.6 * random.NextDouble());
            double cv = Cvs[random.Next(Cvs.Length)];
            double mean = load * servers / flows[i];
            var service = random.NextDouble() < 0.5 ? ServiceDistribution.Gamma(mean, cv) : ServiceDistribution.Lognormal(mean, cv);
            units.Add(new Unit(ids[i], ids[i], Servers.Of(servers), mean, cv) { Service = service });
        }

        return new Network("generated " + seed.ToString(CultureInfo.InvariantCulture), TimeUnit.Hour, units.ToImmutable(), [.. arrivals], [.. routes]);
    }

    /// <summary>
    /// The same network with every service exponential with its mean (the unit's and each group's) and every external
    /// arrival stream Poisson: what the formulas computed before they followed variability.
    /// </summary>
    public static Network Exponential(Network network) => network with
    {
        Units = [.. network.Units.Select(unit => unit with { ServiceCv = 1.0, Service = ServiceDistribution.Exponential(unit.MeanServiceHours) })],
        Arrivals = [.. network.Arrivals.Select(arrival => arrival with { Cv = 1.0 })],
        Groups = [.. network.Groups.Select(group => group with
        {
            Arrivals = [.. group.Arrivals.Select(arrival => arrival with { Cv = 1.0 })],
            Services = [.. group.Services.Select(service => service with { Service = ServiceDistribution.Exponential(service.Service.MeanHours) })],
        })],
    };

    /// <summary>The network at its mean arrival rates: no hour-of-day or weekday profile, which the formulas cannot follow.</summary>
    public static Network Steady(Network network) => network with
    {
        ArrivalProfile = null,
        Groups = [.. network.Groups.Select(group => group with { ArrivalProfile = null })],
    };

    private static double Round(double value) => Math.Round(value, 2);
}
