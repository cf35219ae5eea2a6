using NetSolve.Benchmarks;
using NetSolve.Model;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Core.Solving;

public partial class NetworkSolverTests
{
    // Rounding of the contract's six printed decimals.
    private const double SixDecimals = 5e-7;

    // Source: the network file contract (v1), JSON output of the Harbourside example, first unit, rounded to 6 decimals.
    [Fact]
    public void The_contract_example_gives_the_contract_numbers_for_emergency()
    {
        var solution = NetworkSolver.Solve(TestNetworks.JacksonExample("harbourside.yaml"));
        var emergency = solution.Units[0];

        Assert.Equal("emergency", emergency.Unit.Id);
        Assert.Equal(32, emergency.Unit.Servers.Count);
        Assert.Equal(18.699187, emergency.ArrivalsPerHour, SixDecimals);
        Assert.Equal(1.526464, emergency.VisitsPerPatient, SixDecimals);
        Assert.Equal(21.815718, emergency.OfferedLoad, SixDecimals);
        Assert.Equal(0.681741, emergency.Utilisation, SixDecimals);
        Assert.Equal(0.027645, emergency.WaitProbability, SixDecimals);
        Assert.Equal(0.059219, emergency.MeanQueue!.Value, SixDecimals);
        Assert.Equal(0.003167, emergency.MeanWaitHours!.Value, SixDecimals);
        Assert.Equal(21.874937, emergency.MeanInUnit!.Value, SixDecimals);
        Assert.Equal(1.169834, emergency.MeanTimeInUnitHours!.Value, SixDecimals);
        Assert.Equal(1.466832, emergency.Headroom!.Value, SixDecimals);
        Assert.Equal(UnitStatus.Ok, emergency.Status);
    }

    // Source: the network file contract (v1): totals of the Harbourside example, and "the ward is the bottleneck,
    // utilisation 0.876, headroom 1.142".
    [Fact]
    public void The_contract_example_gives_the_contract_totals_and_the_ward_as_bottleneck()
    {
        var solution = NetworkSolver.Solve(TestNetworks.JacksonExample("harbourside.yaml"));
        var ward = solution.Units.Single(unit => unit.Unit.Id == "ward");

        Assert.True(solution.IsStable);
        Assert.Equal(12.25, solution.Totals.ExternalArrivalsPerHour, 1e-12);
        Assert.Equal(12.25, solution.Totals.ThroughputPerHour!.Value, 1e-12);
        Assert.Equal(296.753604, solution.Totals.MeanInSystem!.Value, SixDecimals);
        Assert.Equal(24.224784, solution.Totals.MeanTimeInSystemHours!.Value, SixDecimals);
        Assert.Equal(UnitStatus.Bottleneck, ward.Status);
        Assert.Equal(0.876, ward.Utilisation, 0.0005);
        Assert.Equal(1.142, ward.Headroom!.Value, 0.0005);
        Assert.Single(solution.Units, unit => unit.Status == UnitStatus.Bottleneck);
    }

    // Source: Burke's theorem (the departures of a stable M/M/c queue are Poisson at the arrival rate), so each
    // unit of a tandem of M/M/1 units behaves as a standalone M/M/1: L = rho/(1-rho), Lq = rho^2/(1-rho),
    // W = 1/(mu - lambda). Exact by hand for lambda = 3/h and mu = 4, 5, 10 per hour.
    [Theory]
    [InlineData(0, 4.0)]
    [InlineData(1, 5.0)]
    [InlineData(2, 10.0)]
    public void Each_unit_of_a_tandem_of_single_servers_behaves_as_a_standalone_M_M_1(int position, double servicePerHour)
    {
        const string Yaml = """
            name: Tandem of single servers
            units:
              triage:
                servers: 1
                service: 15min
              assessment:
                servers: 1
                service: 12min
              pharmacy:
                servers: 1
                service: 6min
            arrivals:
              triage: 3/h
            routes:
              triage:
                assessment: 1
              assessment:
                pharmacy: 100%
            """;
        const double ArrivalsPerHour = 3.0;
        var result = NetworkSolver.Solve(TestNetworks.Parse(Yaml)).Units[position];
        double rho = ArrivalsPerHour / servicePerHour;

        Assert.Equal(ArrivalsPerHour, result.ArrivalsPerHour, 1e-12);
        Assert.Equal(rho, result.WaitProbability, 1e-12);
        Assert.Equal(rho / (1.0 - rho), result.MeanInUnit!.Value, 1e-12);
        Assert.Equal(rho * rho / (1.0 - rho), result.MeanQueue!.Value, 1e-12);
        Assert.Equal(1.0 / (servicePerHour - ArrivalsPerHour), result.MeanTimeInUnitHours!.Value, 1e-12);
    }

    // Source: Little's law, L = lambda W, for each unit (waiting and in total) and for the whole network.
    [Theory]
    [MemberData(nameof(TestNetworks.ExampleFiles), MemberType = typeof(TestNetworks))]
    public void Littles_law_holds_for_every_unit_and_for_the_totals_of_every_example_network(string fileName)
    {
        var solution = NetworkSolver.Solve(TestNetworks.Example(fileName));
        foreach (var unit in solution.Units.Where(unit => unit.IsStable))
        {
            Assert.Equal(unit.MeanInUnit!.Value, unit.ArrivalsPerHour * unit.MeanTimeInUnitHours!.Value, 1e-9 * Math.Max(1.0, unit.MeanInUnit.Value));
            Assert.Equal(unit.MeanQueue!.Value, unit.ArrivalsPerHour * unit.MeanWaitHours!.Value, 1e-9 * Math.Max(1.0, unit.MeanQueue.Value));
            Assert.Equal(unit.MeanInUnit.Value, unit.MeanQueue.Value + unit.OfferedLoad, 1e-9 * Math.Max(1.0, unit.MeanInUnit.Value));
        }

        if (solution.IsStable)
        {
            double inSystem = solution.Units.Sum(unit => unit.MeanInUnit!.Value);
            Assert.Equal(inSystem, solution.Totals.MeanInSystem!.Value, 1e-9 * inSystem);
            Assert.Equal(inSystem, solution.Totals.ExternalArrivalsPerHour * solution.Totals.MeanTimeInSystemHours!.Value, 1e-9 * inSystem);
        }
        else
        {
            Assert.Null(solution.Totals.MeanInSystem);
            Assert.Null(solution.Totals.MeanTimeInSystemHours);
        }
    }

    // Common practice: every number of every example is finite, and probabilities lie in [0, 1].
    [Theory]
    [MemberData(nameof(TestNetworks.ExampleFiles), MemberType = typeof(TestNetworks))]
    public void Every_example_network_solves_to_finite_numbers(string fileName)
    {
        var solution = NetworkSolver.Solve(TestNetworks.Example(fileName));
        foreach (var unit in solution.Units)
        {
            double?[] values = [unit.ArrivalsPerHour, unit.VisitsPerPatient, unit.OfferedLoad, unit.Utilisation, unit.WaitProbability,
                unit.MeanQueue, unit.MeanWaitHours, unit.MeanInUnit, unit.MeanTimeInUnitHours, unit.Headroom];
            Assert.All(values, value => Assert.True(value is null || double.IsFinite(value.Value), FormattableString.Invariant($"{unit.Unit.Id}: {value}")));
            Assert.InRange(unit.WaitProbability, 0.0, 1.0);
        }
    }

    // Exact by hand (flow balance): in steady state every patient who enters leaves, so the external arrivals
    // equal the total exit flow, the sum over units of lambda_i times (1 - routes out of i). Checked on 300 random
    // networks below the dense limit, solved densely, sparsely and automatically, and on 12 above it.
    [Fact]
    public void Flow_is_conserved_on_hundreds_of_random_networks_by_both_solvers()
    {
        var random = new Random(20261201);
        for (int trial = 0; trial < 300; trial++)
        {
            int units = random.Next(1, 80);
            var network = NetworkGenerator.Generate(units, seed: random.Next(), maxRoutesPerUnit: 5, arrivalShare: random.NextDouble()).Network;
            var routing = RoutingTable.Build(network);
            var dense = TrafficEquations.Solve(routing, TrafficSolveMethod.Dense);
            var sparse = TrafficEquations.Solve(routing, TrafficSolveMethod.Sparse);
            AssertFlowConserved(network, dense, FormattableString.Invariant($"trial {trial}, dense"));
            AssertFlowConserved(network, sparse, FormattableString.Invariant($"trial {trial}, sparse"));
            AssertFlowConserved(network, TrafficEquations.Solve(routing), FormattableString.Invariant($"trial {trial}, automatic"));
            for (int i = 0; i < units; i++)
            {
                Assert.Equal(dense[i], sparse[i], 1e-7 * Math.Max(1.0, dense[i]));
            }
        }

        for (int trial = 0; trial < 12; trial++)
        {
            int units = random.Next(TrafficEquations.DenseLimit + 1, TrafficEquations.DenseLimit + 3_000);
            var network = NetworkGenerator.Generate(units, seed: random.Next(), maxRoutesPerUnit: 5, arrivalShare: 0.5).Network;
            AssertFlowConserved(network, TrafficEquations.Solve(RoutingTable.Build(network)), FormattableString.Invariant($"large trial {trial}"));
        }
    }

    private static void AssertFlowConserved(Network network, double[] flows, string what)
    {
        var index = network.BuildIndex();
        var routedOut = new double[network.Units.Length];
        foreach (var route in network.Routes)
        {
            routedOut[index[route.From]] += route.Probability;
        }

        double exits = 0.0;
        for (int i = 0; i < flows.Length; i++)
        {
            Assert.True(double.IsFinite(flows[i]) && flows[i] >= 0.0, FormattableString.Invariant($"{what}: flow {flows[i]} at unit {i}"));
            exits += flows[i] * Math.Max(0.0, 1.0 - routedOut[i]);
        }

        double external = network.Arrivals.Sum(arrival => arrival.PerHour);
        Assert.True(Math.Abs(external - exits) <= 1e-8 * external, FormattableString.Invariant($"{what}: external {external}, exits {exits}"));
    }

    // Source: the network file contract, status rule: utilisation >= 1 is unstable, its waits are absent, and the
    // totals are null; the bottleneck is still named among the stable units.
    [Fact]
    public void An_overloaded_unit_is_unstable_and_the_totals_are_absent()
    {
        const string Yaml = """
            units:
              clinic:
                servers: 2
                service: 1h
              scan:
                servers: 4
                service: 1h
            arrivals:
              clinic: 3/h
            routes:
              clinic:
                scan: 0.5
            """;
        var solution = NetworkSolver.Solve(TestNetworks.Parse(Yaml));

        Assert.False(solution.IsStable);
        Assert.Equal(UnitStatus.Unstable, solution.Units[0].Status);
        Assert.Equal(1.0, solution.Units[0].WaitProbability);
        Assert.Null(solution.Units[0].MeanWaitHours);
        Assert.Equal(2.0 / 3.0, solution.Units[0].Headroom!.Value, 1e-12);
        Assert.Equal(UnitStatus.Bottleneck, solution.Units[1].Status);
        Assert.Null(solution.Totals.ThroughputPerHour);
        Assert.Null(solution.Totals.MeanInSystem);
    }
}
