using NetSolve.Analysis;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Tests.Simulation;

public sealed class RunLengthPlannerTests
{
    [Fact]
    public void One_server_at_utilisation_0_9_with_one_day_service_relaxes_in_about_380_days()
    {
        var solution = NetworkSolver.Solve(TestNetworks.Single(TestNetworks.Unit("ward", 1, 24.0), 0.9 / 24.0));

        // Source: Abate and Whitt, Transient behavior of the M/M/1 queue, Queueing Systems 2, 1987: relaxation time
        // 1 / (μ (1 − √ρ)²); exact by hand: 24 h / (1 − √0.9)² = 24 / 0.0026334 = 9,113.7 h (379.7 d).
        Assert.Equal(9113.7, RelaxationTime.Hours(solution.Units[0]), 0.1);
    }

    [Fact]
    public void A_slow_ward_gets_five_relaxation_times_of_warm_up_in_whole_weeks_and_is_warned_about_at_the_ten_year_bound()
    {
        var solution = NetworkSolver.Solve(TestNetworks.Single(TestNetworks.Unit("ward", 1, 24.0), 0.9 / 24.0));

        var plan = RunLengthPlanner.Plan(solution);

        // Exact by hand: 5 × 9,113.7 h = 45,568 h, rounded up to whole weeks: 272 weeks = 45,696 h; 20 relaxation
        // times exceed the bound of 3,640 days, so the run is the bound and shorter than 10 relaxation times.
        Assert.Equal(45_696.0, plan.WarmupHours);
        Assert.Equal(RunLengthPlanner.MostHours, plan.DurationHours);
        Assert.True(plan.IsWarmupFromModel && plan.IsDurationFromModel);
        Assert.Equal("ward", Assert.Single(plan.SlowUnits).Unit.Id);
    }

    [Fact]
    public void A_network_of_fast_units_keeps_a_year_of_run_and_a_week_of_warm_up()
    {
        var solution = NetworkSolver.Solve(TestNetworks.SmallJackson());

        var plan = RunLengthPlanner.Plan(solution);

        Assert.Equal(7 * 24.0, plan.WarmupHours);
        Assert.Equal(364 * 24.0, plan.DurationHours);
        Assert.Empty(plan.SlowUnits);
    }

    [Fact]
    public void A_given_warm_up_and_run_length_are_kept_exactly()
    {
        var solution = NetworkSolver.Solve(TestNetworks.Single(TestNetworks.Unit("ward", 1, 24.0), 0.9 / 24.0));

        var plan = RunLengthPlanner.Plan(solution, 13.5, 100.25);

        Assert.Equal(13.5, plan.WarmupHours);
        Assert.Equal(100.25, plan.DurationHours);
        Assert.False(plan.IsWarmupFromModel || plan.IsDurationFromModel);
    }

    [Fact]
    public void A_slow_ward_whose_run_meets_the_bound_gets_replications_growing_as_the_square_of_the_relaxation_times_missing()
    {
        var solution = NetworkSolver.Solve(TestNetworks.Single(TestNetworks.Unit("ward", 1, 24.0), 0.9 / 24.0));

        var plan = RunLengthPlanner.Plan(solution);

        // Exact by hand: 20 relaxation times are 182,274 h against a run bounded at 87,360 h, a shortfall of 2.0865,
        // so 10 replications become ⌈10 × 2.0865²⌉ = ⌈43.53⌉ = 44.
        Assert.Equal(44, plan.Replications);
    }

    [Fact]
    public void A_network_of_fast_units_and_a_given_run_length_keep_the_default_replications()
    {
        var slow = NetworkSolver.Solve(TestNetworks.Single(TestNetworks.Unit("ward", 1, 24.0), 0.9 / 24.0));

        Assert.Equal(SimulationOptions.DefaultReplications, RunLengthPlanner.Plan(NetworkSolver.Solve(TestNetworks.SmallJackson())).Replications);
        Assert.Equal(SimulationOptions.DefaultReplications, RunLengthPlanner.Plan(slow, null, 100.0).Replications);
    }

    [Fact]
    public void An_unstable_unit_adds_no_replications()
    {
        var solution = NetworkSolver.Solve(TestNetworks.Single(TestNetworks.Unit("ward", 1, 24.0), 1.1 / 24.0));

        var plan = RunLengthPlanner.Plan(solution);

        Assert.Equal(RunLengthPlanner.MostHours, plan.DurationHours);
        Assert.Equal(SimulationOptions.DefaultReplications, plan.Replications);
    }
}
