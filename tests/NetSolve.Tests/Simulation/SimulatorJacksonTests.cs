using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Simulation;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Simulation;

public sealed class SimulatorJacksonTests
{
    // Source: Jackson's theorem (J. R. Jackson, "Jobshop-like queueing systems", Management Science 10(1), 1963):
    // with Poisson arrivals, exponential service and Markov routing each unit behaves as an independent M/M/c
    // queue at its traffic-equation flow, so NetworkSolver's results are the exact steady state the simulation
    // must reproduce within its confidence intervals.
    [Fact]
    public void Simulated_means_of_a_small_feedback_network_agree_with_the_Jackson_solution()
    {
        var options = new SimulationOptions { Seed = 20261201, Replications = 10, WarmupHours = 200, DurationHours = 20_000 };

        AssertAgreesWithJackson(TestNetworks.SmallJackson(), options);
    }

    // Source: as above; the example files are v1 networks, so Jackson's theorem applies to them exactly.
    [Theory]
    [InlineData("millbrook-clinic.yaml", 2_000.0, 20.0)]
    [InlineData("harbourside.yaml", 24.0 * 364, 24.0 * 28)]
    public void Simulated_means_of_the_example_networks_agree_with_the_Jackson_solution(string file, double durationHours, double warmupHours)
    {
        var network = NetworkReader.ReadFile(Path.Combine(TestFiles.NetworksFolder, file)).Network!;
        var options = new SimulationOptions { Seed = 7, Replications = 10, WarmupHours = warmupHours, DurationHours = durationHours };

        // The formulas ignore service_cv (harbourside's imaging has 0.6, with a warning); the simulation uses it.
        // Jackson's theorem needs exponential service, so the comparison sets every cv to 1.
        var exponential = network with { Units = [.. network.Units.Select(unit => unit with { ServiceCv = 1.0 })] };
        AssertAgreesWithJackson(exponential, options);
    }

    private static void AssertAgreesWithJackson(Network network, SimulationOptions options)
    {
        var simulated = Simulator.Run(network, options, cancellation: TestContext.Current.CancellationToken);
        var formula = NetworkSolver.Solve(network);

        var checks = new List<(string, Estimate, double)>();
        for (int i = 0; i < network.Units.Length; i++)
        {
            var s = simulated.Units[i];
            var f = formula.Units[i];
            string id = f.Unit.Id;
            checks.Add(($"{id} arrival rate", s.ArrivalsPerHour, f.ArrivalsPerHour));
            checks.Add(($"{id} mean in unit", s.MeanInUnit, f.MeanInUnit!.Value));
            checks.Add(($"{id} mean time in unit", s.MeanTimeInUnitHours, f.MeanTimeInUnitHours!.Value));
            if (!f.Unit.Servers.IsUnlimited)
            {
                checks.Add(($"{id} utilisation", s.Utilisation, f.Utilisation));
                checks.Add(($"{id} p_wait", s.WaitProbability, f.WaitProbability));
                checks.Add(($"{id} mean queue", s.MeanQueue, f.MeanQueue!.Value));
                checks.Add(($"{id} mean wait", s.MeanWaitHours, f.MeanWaitHours!.Value));
            }
        }

        checks.Add(("throughput", simulated.Totals!.ThroughputPerHour, formula.Totals.ThroughputPerHour!.Value));
        checks.Add(("mean in system", simulated.Totals.MeanInSystem, formula.Totals.MeanInSystem!.Value));
        checks.Add(("mean time in system", simulated.Totals.MeanTimeInSystemHours!.Value, formula.Totals.MeanTimeInSystemHours!.Value));
        Bonferroni.AssertAllInside(checks);
    }

    [Fact]
    public void Intervals_are_narrow_enough_to_tell_two_from_three_triage_servers()
    {
        // Source: Erlang C via NetworkSolver (exact for M/M/c). The same network with a third triage server has a
        // much shorter mean wait; the simulation of two servers must exclude it, or the comparison tells nothing.
        var network = TestNetworks.SmallJackson();
        var options = new SimulationOptions { Seed = 20261201, Replications = 10, WarmupHours = 200, DurationHours = 20_000 };
        var threeServers = network with { Units = network.Units.SetItem(0, network.Units[0] with { Servers = Servers.Of(3) }) };

        var triage = Simulator.Run(network, options, cancellation: TestContext.Current.CancellationToken).Units[0];

        double two = NetworkSolver.Solve(network).Units[0].MeanWaitHours!.Value;
        double three = NetworkSolver.Solve(threeServers).Units[0].MeanWaitHours!.Value;
        double half = triage.MeanWaitHours.HalfWidth!.Value * Bonferroni.Widening(2, triage.MeanWaitHours.Replications);
        Assert.InRange(two, triage.MeanWaitHours.Mean - half, triage.MeanWaitHours.Mean + half);
        Assert.NotInRange(three, triage.MeanWaitHours.Mean - half, triage.MeanWaitHours.Mean + half);
    }
}
