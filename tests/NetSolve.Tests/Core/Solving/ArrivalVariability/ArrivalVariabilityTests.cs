using NetSolve.Model;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Core.Solving.Variability;

public sealed partial class ArrivalVariabilityTests
{
    private const double Tolerance = 1e-12;

    private static ArrivalVariabilityUnit Single(double arrivalsPerHour, double utilisation, double serviceScv, int servers = 1) =>
        new(arrivalsPerHour, Servers.Of(servers), utilisation, serviceScv);

    private static ArrivalVariabilitySolution Solve(ArrivalVariabilityUnit[] units, ArrivalVariabilityRoute[] routes, string method) =>
        ArrivalVariability.Solve(units, routes, Enum.Parse<TrafficSolveMethod>(method));

    // Exact by hand: with Poisson external arrivals and exponential service every deviation ca² − 1 is 0, so every
    // ca² is 1 (the Jackson case), to the last bit. Harbourside with its imaging service_cv put back to 1.
    [Theory]
    [InlineData("Dense")]
    [InlineData("Sparse")]
    public void A_network_of_Poisson_arrivals_and_exponential_service_has_arrival_scv_exactly_1(string method)
    {
        var example = TestNetworks.Example("harbourside.yaml");
        var network = example with { Units = [.. example.Units.Select(unit => unit with { Service = null, ServiceCv = 1.0 })] };
        var flows = TrafficEquations.Solve(RoutingTable.Build(network));
        var units = network.Units.Select((unit, i) => new ArrivalVariabilityUnit(
            flows[i], unit.Servers, unit.Servers.IsUnlimited ? 0.0 : flows[i] * unit.MeanServiceHours / unit.Servers.Count, 1.0)
        {
            ExternalPerHour = RoutingTable.Build(network).ExternalPerHour[i],
        }).ToArray();
        var index = network.BuildIndex();
        var routes = network.Routes.Select(route => new ArrivalVariabilityRoute(index[route.From], index[route.To], route.Probability)).ToArray();

        var solution = Solve(units, routes, method);

        Assert.All(solution.ArrivalScv, scv => Assert.Equal(1.0, scv));
        Assert.All(solution.DepartureScv, scv => Assert.Equal(1.0, scv));
    }

    // Exact by hand: A gets evenly spaced arrivals (c0² = 0) at 1/h, ρ_A = 0.5, cs²_A = 0.5; all go on to B, ρ_B = 0.8,
    // cs²_B = 2. One stream each, so w = 1. ca²_A = 0; cd²_A = 1 + 0.75(0 − 1) + 0.25(0.5 − 1) = 0.125 = ca²_B;
    // cd²_B = 1 + 0.36(0.125 − 1) + 0.64(2 − 1) = 1.325.
    [Theory]
    [InlineData("Dense")]
    [InlineData("Sparse")]
    public void A_tandem_fed_evenly_spaced_matches_the_hand_worked_equations(string method)
    {
        ArrivalVariabilityUnit[] units =
        [
            Single(1.0, 0.5, 0.5) with { ExternalPerHour = 1.0, ExternalScv = 0.0 },
            Single(1.0, 0.8, 2.0),
        ];

        var solution = Solve(units, [new(0, 1, 1.0)], method);

        Assert.Equal(0.0, solution.ArrivalScv[0], Tolerance);
        Assert.Equal(0.125, solution.DepartureScv[0], Tolerance);
        Assert.Equal(0.125, solution.ArrivalScv[1], Tolerance);
        Assert.Equal(1.325, solution.DepartureScv[1], Tolerance);
    }

    // Exact by hand: A gets 2/h with c0² = 4, two servers at ρ = 0.6, cs² = 1: cd²_A = 1 + 0.64·3 = 2.92. Splitting 0.3 to B
    // and 0.7 to C: 0.3·2.92 + 0.7 = 1.576 and 0.7·2.92 + 0.3 = 2.344; each is the only stream into its unit (w = 1).
    [Theory]
    [InlineData("Dense")]
    [InlineData("Sparse")]
    public void Splitting_moves_each_branch_towards_Poisson_by_its_probability(string method)
    {
        ArrivalVariabilityUnit[] units =
        [
            Single(2.0, 0.6, 1.0, servers: 2) with { ExternalPerHour = 2.0, ExternalScv = 4.0 },
            Single(0.6, 0.5, 1.0),
            Single(1.4, 0.5, 1.0),
        ];

        var solution = Solve(units, [new(0, 1, 0.3), new(0, 2, 0.7)], method);

        Assert.Equal(4.0, solution.ArrivalScv[0], Tolerance);
        Assert.Equal(2.92, solution.DepartureScv[0], Tolerance);
        Assert.Equal(1.576, solution.ArrivalScv[1], Tolerance);
        Assert.Equal(2.344, solution.ArrivalScv[2], Tolerance);
    }

    // Exact by hand: A (1/h, c0² = 0, ρ = 0.5, cs² = 1) departs with cd² = 1 − 0.75 = 0.25; B (3/h Poisson) with 1.
    // Both go to C (ρ_C = 0.5): shares 1/4 and 3/4, v = 1/(1/16 + 9/16) = 1.6, w = 1/(1 + 4·0.25·0.6) = 0.625;
    // ca²_C = 0.625·(0.25·0.25 + 0.75·1) + 0.375 = 0.8828125 (the basic average alone would give 0.8125).
    [Theory]
    [InlineData("Dense")]
    [InlineData("Sparse")]
    public void Merging_uses_the_refined_superposition_weight(string method)
    {
        ArrivalVariabilityUnit[] units =
        [
            Single(1.0, 0.5, 1.0) with { ExternalPerHour = 1.0, ExternalScv = 0.0 },
            Single(3.0, 0.5, 1.0) with { ExternalPerHour = 3.0 },
            Single(4.0, 0.5, 1.0),
        ];

        var solution = Solve(units, [new(0, 2, 1.0), new(1, 2, 1.0)], method);

        Assert.Equal(0.25, solution.DepartureScv[0], Tolerance);
        Assert.Equal(1.0, solution.DepartureScv[1], Tolerance);
        Assert.Equal(0.8828125, solution.ArrivalScv[2], Tolerance);
    }

    // Exact by hand: external 1/h with c0² = 0, half the patients return (λ = 2, ρ = 0.5, cs² = 1). Shares 1/2 and 1/2,
    // v = 2, w = 1/(1 + 4·0.25·1) = 1/2; cd² = 0.25 + 0.75 ca²; ca² = ½(½·0 + ½(½cd² + ½)) + ½ solves to 21/29.
    [Theory]
    [InlineData("Dense")]
    [InlineData("Sparse")]
    public void A_repeat_visit_feeds_the_unit_its_own_departures(string method)
    {
        ArrivalVariabilityUnit[] units = [Single(2.0, 0.5, 1.0) with { ExternalPerHour = 1.0, ExternalScv = 0.0 }];

        var solution = Solve(units, [new(0, 0, 0.5)], method);

        Assert.Equal(21.0 / 29.0, solution.ArrivalScv[0], Tolerance);
        Assert.Equal(0.25 + (0.75 * 21.0 / 29.0), solution.DepartureScv[0], Tolerance);
    }

    // From memory: Whitt (1983) floors cs² at 0.2 in the departure formula. Poisson in, deterministic service, ρ = 0.5:
    // cd² = 1 + 0.25(0.2 − 1) = 0.8, not 0.75.
    [Fact]
    public void Departures_are_never_taken_smoother_than_a_service_scv_of_one_fifth()
    {
        ArrivalVariabilityUnit[] units = [Single(1.0, 0.5, 0.0) with { ExternalPerHour = 1.0 }];

        var solution = ArrivalVariability.Solve(units, []);

        Assert.Equal(0.8, solution.DepartureScv[0], Tolerance);
    }

    // Exact by hand: unlimited servers take ρ = 0, so cd² = ca² = 0.25 and the next unit sees 0.25; a saturated unit
    // (load 1.5 taken as 1) departs with x = 1 + (0.5 − 1)/√4 = 0.75 whatever its arrivals; an unreached unit has 1.
    [Fact]
    public void Unlimited_servers_pass_variability_on_a_saturated_unit_sends_its_service_and_an_unreached_unit_has_1()
    {
        ArrivalVariabilityUnit[] units =
        [
            new ArrivalVariabilityUnit(1.0, Servers.Unlimited, 0.9, 3.0) { ExternalPerHour = 1.0, ExternalScv = 0.25 },
            Single(1.0, 1.5, 0.5, servers: 4),
            Single(0.0, 0.0, 3.0),
        ];

        var solution = ArrivalVariability.Solve(units, [new(0, 1, 1.0)]);

        Assert.Equal(0.25, solution.DepartureScv[0], Tolerance);
        Assert.Equal(0.25, solution.ArrivalScv[1], Tolerance);
        Assert.Equal(0.75, solution.DepartureScv[1], Tolerance);
        Assert.Equal(1.0, solution.ArrivalScv[2]);
        Assert.Equal(1.0, solution.DepartureScv[2]);
    }

    // Common practice: guard clauses reject misuse before any arithmetic.
    [Fact]
    public void Negative_scv_duplicate_routes_and_routes_over_one_are_refused()
    {
        ArrivalVariabilityUnit[] two = [Single(1.0, 0.5, 1.0) with { ExternalPerHour = 1.0 }, Single(1.0, 0.5, 1.0)];

        Assert.Throws<ArgumentOutOfRangeException>(() => ArrivalVariability.Solve([Single(1.0, 0.5, -0.1)], []));
        Assert.Throws<ArgumentOutOfRangeException>(() => ArrivalVariability.Solve([Single(double.NaN, 0.5, 1.0)], []));
        Assert.Throws<ArgumentException>(() => ArrivalVariability.Solve(two, [new(0, 1, 0.5), new(0, 1, 0.5)]));
        Assert.Throws<ArgumentException>(() => ArrivalVariability.Solve(two, [new(0, 1, 0.7), new(0, 0, 0.7)]));
        Assert.Throws<ArgumentOutOfRangeException>(() => ArrivalVariability.Solve(two, [new(0, 2, 0.5)]));
    }
}
