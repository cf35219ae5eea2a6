using NetSolve.Model;
using NetSolve.Simulation;
using NetSolve.Solving;
using NetSolve.Tests.Simulation;

namespace NetSolve.Tests.Core.Solving.Capacity;

[Trait("Category", "Long")]
public sealed class CapacityFlowsSimulationTests
{
    private static readonly SimulationOptions LongRun = new() { Seed = 17, Replications = 10, WarmupHours = 100, DurationHours = 20_000 };

    /// <summary>
    /// Relative: how far the fixed point may sit from the simulated rate at a unit fed mostly by overflow. The overflow
    /// of a full unit is burstier than Poisson, so a small target blocks more than the approximation says: measured
    /// here (seed 17), 0.504 turned away per hour simulated against 0.422 from the fixed point, 16% low.
    /// </summary>
    private const double OverflowTolerance = 0.20;

    // Source: the simulator of this project (fixed seed) against the formulas. The assessment unit is fed by Poisson
    // arrivals only, so its blocking is exact M/M/2/3 and must lie inside the simulated interval; the short-stay unit
    // takes its overflow and is checked within OverflowTolerance.
    [Fact(Explicit = true)]
    public void Diverted_and_turned_away_rates_match_the_simulator()
    {
        var assessment = new Unit("assessment", "assessment", Servers.Of(2), 1.0) { Capacity = 3, WhenFull = WhenFull.DivertTo("shortstay") };
        var shortStay = new Unit("shortstay", "shortstay", Servers.Of(2), 1.0) { Capacity = 2 };
        var ward = new Unit("ward", "ward", Servers.Unlimited, 4.0);
        var network = new Network("Diversion check", TimeUnit.Hour, [assessment, shortStay, ward],
            [new Arrival("assessment", 2.5), new Arrival("shortstay", 0.5)],
            [new Route("assessment", "ward", 0.5), new Route("shortstay", "ward", 0.5)]);

        var formulas = CapacityFlows.Solve(network);
        var simulated = Simulator.Run(network, LongRun, cancellation: TestContext.Current.CancellationToken);

        Bonferroni.AssertAllInside(
        [
            ("assessment P(full)", simulated.Units[0].FullProbability, formulas.Units[0].FullProbability),
            ("assessment diverted per hour", simulated.Units[0].DivertedPerHour, formulas.Units[0].DivertedPerHour),
        ]);
        AssertWithin("short-stay admitted", simulated.Units[1].ArrivalsPerHour.Mean, formulas.Units[1].AdmittedPerHour);
        AssertWithin("short-stay turned away", simulated.Units[1].TurnedAwayPerHour.Mean, formulas.Units[1].TurnedAwayPerHour);
        AssertWithin("ward arrivals", simulated.Units[2].ArrivalsPerHour.Mean, formulas.Units[2].OfferedPerHour);
        AssertWithin("network turned away", simulated.Totals!.TurnedAwayPerHour.Mean, formulas.TurnedAwayPerHour);
        Assert.True(formulas.Units[1].TurnedAwayPerHour < simulated.Units[1].TurnedAwayPerHour.Mean, "peaked overflow blocks more than Poisson");
    }

    private static void AssertWithin(string name, double simulated, double formula) =>
        Assert.True(Math.Abs(simulated - formula) <= OverflowTolerance * simulated,
            FormattableString.Invariant($"{name}: simulated {simulated:G6}, fixed point {formula:G6}"));
}
