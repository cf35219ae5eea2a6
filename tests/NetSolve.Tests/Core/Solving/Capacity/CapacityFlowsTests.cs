using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Capacity;

public sealed class CapacityFlowsTests
{
    private const double Exact = 1e-10;

    private static Unit Unit(string id, int servers, double meanServiceHours, int? capacity = null, string? divertTo = null) =>
        new(id, id, Servers.Of(servers), meanServiceHours)
        {
            Capacity = capacity,
            WhenFull = divertTo is null ? WhenFull.TurnAway : WhenFull.DivertTo(divertTo),
        };

    private static Network Network(Unit[] units, Arrival[] arrivals, Route[]? routes = null) =>
        new("Capacity test", TimeUnit.Hour, [.. units], [.. arrivals], routes is null ? [] : [.. routes]);

    // Exact by hand: one unit fed by Poisson arrivals is exactly M/M/c/K; the fixed point has nothing to iterate.
    [Theory]
    [InlineData(1, 1, 0.5)]
    [InlineData(2, 5, 3.0)]
    [InlineData(3, 3, 7.0)]
    public void A_single_unit_that_turns_patients_away_admits_the_MMcK_rate(int servers, int capacity, double arrivalsPerHour)
    {
        var network = Network([Unit("resus", servers, 1.0, capacity)], [new Arrival("resus", arrivalsPerHour)]);
        var expected = FiniteCapacityFormulas.Solve(servers, capacity, arrivalsPerHour, 1.0);

        var row = CapacityFlows.Solve(network).Units[0];

        Assert.Equal(arrivalsPerHour, row.OfferedPerHour, Exact);
        Assert.Equal(expected.AdmittedPerHour, row.AdmittedPerHour, Exact);
        Assert.Equal(expected.BlockedPerHour, row.TurnedAwayPerHour, Exact);
        Assert.Equal(0.0, row.DivertedPerHour);
        Assert.Equal(expected, row.Metrics);
    }

    // Exact by hand with the Erlang loss formula B(1, a) = a/(1 + a): the cubicle (1 place, mean 1 h) is offered
    // 1 patient per hour, so B = 1/2 and 1/2 per hour is diverted to the side room (1 place, mean 1 h), offered 1/2:
    // B = (1/2)/(3/2) = 1/3, turning away 1/6 per hour and admitting 1/3. Both send everyone on to the ward
    // (no capacity), which receives 1/2 + 1/3 = 5/6 per hour. No feedback, so the fixed point is these values.
    [Fact]
    public void A_two_unit_diversion_matches_the_hand_worked_Erlang_loss_values()
    {
        var network = Network(
            [Unit("cubicle", 1, 1.0, 1, "side"), Unit("side", 1, 1.0, 1), Unit("ward", 4, 2.0)],
            [new Arrival("cubicle", 1.0)],
            [new Route("cubicle", "ward", 1.0), new Route("side", "ward", 1.0)]);

        var solution = CapacityFlows.Solve(network);

        var (cubicle, side, ward) = (solution.Units[0], solution.Units[1], solution.Units[2]);
        Assert.Equal(0.5, cubicle.FullProbability, Exact);
        Assert.Equal(0.5, cubicle.DivertedPerHour, Exact);
        Assert.Equal(0.0, cubicle.TurnedAwayPerHour);
        Assert.Equal(0.5, side.OfferedPerHour, Exact);
        Assert.Equal(0.5, side.DivertedInPerHour, Exact);
        Assert.Equal(1.0 / 3.0, side.FullProbability, Exact);
        Assert.Equal(1.0 / 6.0, side.TurnedAwayPerHour, Exact);
        Assert.Equal(1.0 / 3.0, side.AdmittedPerHour, Exact);
        Assert.Equal(5.0 / 6.0, ward.OfferedPerHour, Exact);
        Assert.Equal(5.0 / 6.0, ward.AdmittedPerHour, Exact);
        Assert.Null(ward.Metrics);
        Assert.Equal(1.0 / 6.0, solution.TurnedAwayPerHour, Exact);
        Assert.Equal(0.5, solution.DivertedPerHour, Exact);
    }

    // Exact by hand from the fixed-point equation: a one-place unit (mean 1 h, so B = λ/(1 + λ)) gets 0.5 per hour and
    // half its admitted patients come back through the ward: λ = 0.5 + 0.5·λ/(1 + λ), so λ² = 1/2 and λ = 1/√2.
    // The ward receives 0.5·λ/(1 + λ) = λ − 0.5. Flow balance: external = turned away + admitted leaving (Common practice).
    [Fact]
    public void Feedback_through_a_full_unit_settles_at_the_hand_solved_fixed_point()
    {
        var network = Network(
            [Unit("theatre", 1, 1.0, 1), Unit("ward", 2, 3.0)],
            [new Arrival("theatre", 0.5)],
            [new Route("theatre", "ward", 0.5), new Route("ward", "theatre", 1.0)]);

        var solution = CapacityFlows.Solve(network);

        double rate = 1.0 / Math.Sqrt(2.0);
        Assert.Equal(rate, solution.Units[0].OfferedPerHour, Exact);
        Assert.Equal(rate - 0.5, solution.Units[1].OfferedPerHour, Exact);
        Assert.Equal(0.5, solution.TurnedAwayPerHour + (0.5 * solution.Units[0].AdmittedPerHour), Exact);
        Assert.True(solution.Iterations > 1);
    }

    // Exact by hand: two groups of 0.25 per hour into a one-place unit share its blocking B(1, 0.5) = 1/3, exactly as
    // one stream of 0.5 would; each group keeps its own offered rate.
    [Fact]
    public void Patient_groups_share_the_blocking_of_a_unit()
    {
        var network = Network([Unit("cubicle", 1, 1.0, 1)], [new Arrival("cubicle", 0.25)]) with
        {
            Groups = [new PatientGroup("elective", "elective", [new Arrival("cubicle", 0.25)])],
        };

        var solution = CapacityFlows.Solve(network);

        Assert.Equal(1.0 / 3.0, solution.Units[0].FullProbability, Exact);
        Assert.Equal(0.5 / 3.0, solution.Units[0].TurnedAwayPerHour, Exact);
        Assert.Equal([0.25, 0.25], solution.OfferedByGroup.Select(group => group[0]));
    }

    // Exact by hand: without a capacity nothing is blocked, even when the load exceeds the servers.
    [Fact]
    public void A_unit_without_capacity_keeps_its_offered_rate_even_when_overloaded()
    {
        var row = CapacityFlows.Solve(Network([Unit("clinic", 1, 1.0)], [new Arrival("clinic", 5.0)])).Units[0];

        Assert.Equal(5.0, row.AdmittedPerHour);
        Assert.Equal(0.0, row.FullProbability);
        Assert.Null(row.Metrics);
    }

    [Fact]
    public void A_loop_of_diversions_is_refused()
    {
        var network = Network(
            [Unit("east", 1, 1.0, 2, "west"), Unit("west", 1, 1.0, 2, "east")],
            [new Arrival("east", 1.0)]);

        var error = Assert.Throws<ArgumentException>(() => CapacityFlows.Solve(network));
        Assert.Contains("no way out", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Too_few_iterations_report_non_convergence_with_the_change_reached()
    {
        var network = Network(
            [Unit("theatre", 1, 1.0, 1), Unit("ward", 2, 3.0)],
            [new Arrival("theatre", 0.5)],
            [new Route("theatre", "ward", 0.5), new Route("ward", "theatre", 1.0)]);

        var error = Assert.Throws<CapacityFlowsException>(() => CapacityFlows.Solve(network, new CapacityFlowOptions { MaxIterations = 3 }));
        Assert.Equal(3, error.Iterations);
        Assert.True(error.RelativeChange > 0.0);
    }

    [Theory]
    [InlineData(0.0, 10, 1.0)]
    [InlineData(1e-9, 0, 1.0)]
    [InlineData(1e-9, 10, 0.0)]
    [InlineData(1e-9, 10, 1.5)]
    public void Options_outside_their_ranges_are_refused(double tolerance, int maxIterations, double damping)
    {
        var network = Network([Unit("clinic", 1, 1.0)], [new Arrival("clinic", 0.5)]);
        var options = new CapacityFlowOptions { Tolerance = tolerance, MaxIterations = maxIterations, Damping = damping };

        Assert.Throws<ArgumentOutOfRangeException>(() => CapacityFlows.Solve(network, options));
    }

    // Exact by hand (the same fixed point as above): damping changes the path, not the answer.
    [Fact]
    public void Damping_reaches_the_same_fixed_point()
    {
        var network = Network(
            [Unit("theatre", 1, 1.0, 1), Unit("ward", 2, 3.0)],
            [new Arrival("theatre", 0.5)],
            [new Route("theatre", "ward", 0.5), new Route("ward", "theatre", 1.0)]);

        var solution = CapacityFlows.Solve(network, new CapacityFlowOptions { Damping = 0.3 });

        Assert.Equal(1.0 / Math.Sqrt(2.0), solution.Units[0].OfferedPerHour, Exact);
    }
}
