using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Tests.Analysis;

public sealed class GrowthBedLimitTests
{
    private static Network LossUnit(double arrivalsPerHour) => new(
        "Loss test",
        TimeUnit.Hour,
        [new Unit("beds", "beds", Servers.Of(10), 1.0) { Capacity = 10 }],
        [new Arrival("beds", arrivalsPerHour)],
        []);

    [Fact]
    public void A_ten_bed_loss_unit_at_five_erlangs_passes_one_percent_full_at_a_factor_of_0_892()
    {
        // Source: Erlang B table, 10 servers at 1% blocking carry 4.461 erlangs (recurrence B(k) = aB(k-1)/(k + aB(k-1))
        // solved for B(10, a) = 0.01 gives a = 4.46118); today's 5 erlangs, so f = 4.46118 / 5 = 0.89224.
        var growth = GrowthAnalysis.Run(NetworkSolver.Solve(LossUnit(5.0)));
        var point = Assert.Single(growth.BedLimits);
        Assert.Equal("beds", point.UnitId);
        Assert.Equal(10, point.Capacity);
        Assert.Equal(0.89224, point.Full1PercentFactor!.Value, 1e-5);
        // Exact by hand: the factor found solves B(10, 5f) = 0.01.
        Assert.Equal(0.01, FiniteCapacityFormulas.Solve(10, 10, 5.0 * point.Full1PercentFactor.Value, 1.0).FullProbability, 1e-10);
    }

    [Fact]
    public void A_ten_bed_loss_unit_at_five_erlangs_passes_five_percent_full_at_a_factor_of_1_243()
    {
        // Source: Erlang B table, 10 servers at 5% blocking carry 6.216 erlangs (same recurrence: a = 6.21571);
        // f = 6.21571 / 5 = 1.24314.
        var point = Assert.Single(GrowthAnalysis.Run(NetworkSolver.Solve(LossUnit(5.0))).BedLimits);
        Assert.Equal(1.24314, point.Full5PercentFactor!.Value, 1e-5);
        // Source: Erlang B recurrence, B(10, 5) = 0.018385 (computed by hand with the recurrence above).
        Assert.Equal(0.018385, point.FullToday, 1e-6);
    }

    [Fact]
    public void A_unit_with_a_capacity_is_never_in_the_saturation_order_nor_unstable_at_any_step()
    {
        // Exact by hand: at factor 3 the unit is offered 15 erlangs on 10 beds, past c/a; it blocks instead of failing.
        var growth = GrowthAnalysis.Run(NetworkSolver.Solve(LossUnit(5.0)), [1.0, 2.0, 3.0]);
        Assert.Empty(growth.Saturation);
        Assert.Null(growth.FirstUnstable);
        Assert.All(growth.Steps, step => Assert.True(step.Solution.IsStable));
        Assert.All(growth.Steps, step => Assert.NotEqual(UnitStatus.Unstable, step.Solution.Units[0].Status));
    }

    [Fact]
    public void Steps_of_a_network_with_bed_limits_are_solved_afresh_with_the_diversion_fixed_point()
    {
        // Source: the step is by definition NetworkSolver.Solve of the grown network; checked on the example file.
        var network = SmallNetworks.Example("larkspur-simulation.yaml");
        var growth = GrowthAnalysis.Run(NetworkSolver.Solve(network), [1.0, 1.4]);
        var grown = network with { Arrivals = [.. network.Arrivals.Select(a => a with { PerHour = a.PerHour * 1.4 })] };
        var expected = NetworkSolver.Solve(grown);
        for (int i = 0; i < expected.Units.Length; i++)
        {
            Assert.Equal(expected.Units[i].PFull, growth.Steps[1].Solution.Units[i].PFull);
            Assert.Equal(expected.Units[i].DivertedPerHour, growth.Steps[1].Solution.Units[i].DivertedPerHour);
            Assert.Equal(expected.Units[i].ArrivalsPerHour, growth.Steps[1].Solution.Units[i].ArrivalsPerHour);
        }

        Assert.Equal(["emergency", "ward"], growth.BedLimits.Select(point => point.UnitId), StringComparer.Ordinal);
        Assert.DoesNotContain(growth.Saturation, point => point.UnitId is "emergency" or "ward");
    }

    [Fact]
    public void A_bed_limit_not_reached_within_the_search_range_is_null()
    {
        // Exact by hand: with 1000 beds offered at most 1000 × 0.001 = 1 erlang, P(full) = 1/1000! is far below 1%.
        var network = new Network(
            "Roomy",
            TimeUnit.Hour,
            [new Unit("beds", "beds", Servers.Of(1000), 1.0) { Capacity = 1000 }],
            [new Arrival("beds", 0.001)],
            []);
        var point = Assert.Single(GrowthAnalysis.Run(NetworkSolver.Solve(network)).BedLimits);
        Assert.Null(point.Full1PercentFactor);
        Assert.Null(point.Full5PercentFactor);
    }
    private static Network WaitingRoomUnit(ServiceDistribution service) => new(
        "Waiting room test",
        TimeUnit.Hour,
        [new Unit("bays", "bays", Servers.Of(4), service.MeanHours) { Capacity = 6, Service = service }],
        [new Arrival("bays", 2.5)],
        []);

    [Theory]
    [InlineData(0.0)]
    [InlineData(0.5)]
    [InlineData(1.5)]
    public void The_bed_limit_points_use_the_solvers_two_moment_formula_for_the_units_service(double cv)
    {
        // Exact by hand: a single unit with Poisson arrivals, so growing the network by the reported factor and solving
        // it afresh must give exactly the share of full arrivals the point names (the solver's M/G/c/K with this cv).
        var service = cv == 0.0 ? ServiceDistribution.Deterministic(1.0) : ServiceDistribution.Gamma(1.0, cv);
        var network = WaitingRoomUnit(service);
        var point = Assert.Single(GrowthAnalysis.Run(NetworkSolver.Solve(network)).BedLimits);
        foreach (var (share, factor) in new[] { (0.01, point.Full1PercentFactor!.Value), (0.05, point.Full5PercentFactor!.Value) })
        {
            var grown = network with { Arrivals = [new Arrival("bays", 2.5 * factor)] };
            Assert.Equal(share, NetworkSolver.Solve(grown).Units[0].PFull, 1e-9);
        }
    }

    [Fact]
    public void Regular_service_reaches_the_bed_limit_points_later_than_exponential_and_variable_service_sooner()
    {
        // From memory: at a fixed load a waiting room fills less often the less variable the service (P(full) of M/D/c/K
        // below M/M/c/K below M/G/c/K with cs² > 1; Gross & Harris, Fundamentals of Queueing Theory, M/G/1/K), so the
        // 5% point moves to a higher growth factor for regular service and to a lower one for variable service.
        double Factor(ServiceDistribution service) =>
            Assert.Single(GrowthAnalysis.Run(NetworkSolver.Solve(WaitingRoomUnit(service))).BedLimits).Full5PercentFactor!.Value;
        double regular = Factor(ServiceDistribution.Deterministic(1.0));
        double exponential = Factor(ServiceDistribution.Exponential(1.0));
        double variable = Factor(ServiceDistribution.Gamma(1.0, 1.5));
        Assert.True(regular > exponential * 1.02);
        Assert.True(variable < exponential * 0.98);
    }
}
