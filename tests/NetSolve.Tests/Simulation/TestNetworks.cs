using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Tests.Simulation;

/// <summary>Small invented networks for simulation tests; times in hours.</summary>
internal static class TestNetworks
{
    public static Unit Unit(string id, int servers, double meanServiceHours) =>
        new(id, id, Servers.Of(servers), meanServiceHours);

    public static Network Build(IEnumerable<Unit> units, IEnumerable<Arrival> arrivals, IEnumerable<Route>? routes = null) =>
        new("Test network", TimeUnit.Hour, [.. units], [.. arrivals], routes is null ? [] : [.. routes]);

    /// <summary>One unit, Poisson arrivals at <paramref name="arrivalsPerHour"/>.</summary>
    public static Network Single(Unit unit, double arrivalsPerHour) =>
        Build([unit], [new Arrival(unit.Id, arrivalsPerHour)]);

    /// <summary>
    /// Three units with feedback (a small Jackson network): triage (2 servers) sends 40% to imaging (1 server) and
    /// 30% to a ward (unlimited); imaging sends 50% back to triage.
    /// </summary>
    public static Network SmallJackson() => Build(
        [
            Unit("triage", 2, 0.25),
            Unit("imaging", 1, 0.3),
            new Unit("ward", "ward", Servers.Unlimited, 2.0),
        ],
        [new Arrival("triage", 5.0)],
        [
            new Route("triage", "imaging", 0.4),
            new Route("triage", "ward", 0.3),
            new Route("imaging", "triage", 0.5),
        ]);

    public static ImmutableArray<double> Flatten(NetSolve.Simulation.SimulationResult result) =>
        [.. result.Units.SelectMany(unit => new[]
            {
                unit.ArrivalsPerHour, unit.Utilisation, unit.WaitProbability, unit.MeanQueue, unit.MeanWaitHours,
                unit.MeanInUnit, unit.MeanTimeInUnitHours, unit.FullProbability,
            }.SelectMany(estimate => new[] { estimate.Mean, estimate.HalfWidth ?? -1.0 })
            .Concat(unit.TimeInUnitPercentiles.Select(p => p.Hours?.Mean ?? -1.0))
            .Concat(unit.MeanQueueByHour.Select(h => h?.Mean ?? -1.0))),
         result.Totals!.ThroughputPerHour.Mean, result.Totals.MeanInSystem.Mean, result.Totals.MeanTimeInSystemHours?.Mean ?? -1.0, result.Events];
}
