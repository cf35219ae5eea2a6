using NetSolve.Analysis;
using NetSolve.Solving;

namespace NetSolve.Tests.Analysis;

public sealed class StaffingSearchTests
{
    [Fact]
    public void One_server_at_half_load_needs_a_second_for_a_half_hour_mean_wait()
    {
        // Exact by hand: M/M/1 with λ = 0.5/h, S = 1 h waits Wq = ρ/(μ − λ) = 0.5/0.5 = 1 h, over the target.
        // M/M/2 with a = 0.5: B = (0.25/2)/(1 + 0.5 + 0.125) = 1/13, ρ = 0.25, C = B/(1 − ρ(1 − B)) = 0.1,
        // Wq = C/(cμ − λ) = 0.1/1.5 = 0.0667 h, within it.
        var targets = new StaffingTargets(MaxMeanWaitHours: 0.5);
        Assert.Equal(2, StaffingSearch.MinimumServers(0.5, 1.0, 1, targets, out string? impossible));
        Assert.Null(impossible);
    }

    [Fact]
    public void The_utilisation_target_alone_gives_the_ceiling_of_load_over_target()
    {
        // Exact by hand: a = 8.5 erlangs, ρ ≤ 0.85 needs c ≥ 10 exactly (8.5/10 = 0.85 meets "at most").
        Assert.Equal(10, StaffingSearch.MinimumServers(8.5, 1.0, 1, new StaffingTargets(MaxUtilisation: 0.85), out _));
        // and never fewer servers than today.
        Assert.Equal(14, StaffingSearch.MinimumServers(8.5, 1.0, 14, new StaffingTargets(MaxUtilisation: 0.85), out _));
    }

    [Fact]
    public void Minimum_servers_equal_a_brute_force_scan_on_random_small_units()
    {
        // Source: brute force over c = current..200 with the solver's own UnitMetrics and ErlangFormulas.WaitLongerThan.
        var random = new Random(20260101);
        for (int trial = 0; trial < 300; trial++)
        {
            double arrivals = 0.1 + (random.NextDouble() * 20.0);
            double service = 0.05 + (random.NextDouble() * 3.0);
            int current = 1 + random.Next(5);
            var targets = new StaffingTargets(
                MaxUtilisation: random.Next(3) == 0 ? null : 0.5 + (random.NextDouble() * 0.5),
                MaxMeanWaitHours: random.Next(3) == 0 ? null : random.NextDouble() * 0.5 + 0.001,
                MaxMeanTimeInUnitHours: random.Next(4) == 0 ? service + (random.NextDouble() * 0.3) + 0.001 : null,
                WaitTail: random.Next(2) == 0 ? null : new WaitTailTarget(random.NextDouble() * 2.0, 0.01 + (random.NextDouble() * 0.2)));
            int? fast = StaffingSearch.MinimumServers(arrivals, service, current, targets, out _);
            Assert.Equal(BruteForce(arrivals, service, current, targets), fast);
        }
    }

    [Fact]
    public void A_plan_adds_each_units_minimum_and_weights_the_cost()
    {
        var network = SmallNetworks.Build(
            [("emergency", 2, 0.5), ("ward", 10, 24.0)],
            [("emergency", 3.0)],
            [("emergency", "ward", 0.1)]);
        var solution = NetworkSolver.Solve(network);
        var targets = new StaffingTargets(MaxUtilisation: 0.8);
        var plan = StaffingSearch.MeetTargets(solution, targets, new Dictionary<string, double>(StringComparer.Ordinal) { ["ward"] = 2.5 });
        // Exact by hand: emergency a = 1.5 → c = ⌈1.5/0.8⌉ = 2 (no change); ward λ = 0.3/h, a = 7.2 → ⌈7.2/0.8⌉ = 9 < 10 today.
        Assert.Equal([0, 0], plan.Units.Select(u => u.Added));
        var tighter = StaffingSearch.MeetTargets(solution, new StaffingTargets(MaxUtilisation: 0.6), new Dictionary<string, double>(StringComparer.Ordinal) { ["ward"] = 2.5 });
        // ⌈1.5/0.6⌉ = 3 (+1 at cost 1) and ⌈7.2/0.6⌉ = 12 (+2 at cost 2.5): 3 servers, cost 6.
        Assert.Equal(3, tighter.TotalAdded);
        Assert.Equal(6.0, tighter.TotalCost, 1e-12);
        Assert.All(tighter.After!.Units, unit => Assert.True(StaffingSearch.Within(unit.Utilisation, 0.6)));
    }

    [Fact]
    public void A_time_in_unit_below_the_service_time_is_impossible_and_says_why()
    {
        StaffingSearch.MinimumServers(1.0, 2.0, 3, new StaffingTargets(MaxMeanTimeInUnitHours: 1.5), out string? impossible);
        Assert.Equal("the mean service time alone is 2 h, so a mean time in unit of 1.5 h cannot be met by adding servers; shorten the service instead", impossible);
    }

    [Fact]
    public void A_zero_wait_target_is_impossible_with_finite_servers()
    {
        Assert.Null(StaffingSearch.MinimumServers(1.0, 2.0, 3, new StaffingTargets(MaxMeanWaitHours: 0.0), out string? impossible));
        Assert.Equal("a mean wait of 0 cannot be met: with finite servers some arriving patients always wait (Erlang C is above 0)", impossible);
    }

    [Fact]
    public void Unlimited_and_unvisited_units_need_nothing()
    {
        var targets = new StaffingTargets(MaxMeanWaitHours: 0.1, MaxUtilisation: 0.5);
        Assert.Null(StaffingSearch.MinimumServers(5.0, 1.0, null, targets, out string? unlimited));
        Assert.Null(unlimited);
        Assert.Equal(4, StaffingSearch.MinimumServers(0.0, 1.0, 4, targets, out string? unvisited));
        Assert.Null(unvisited);
    }

    private static int? BruteForce(double arrivals, double service, int current, StaffingTargets targets)
    {
        var unit = new NetSolve.Model.Unit("u", "u", NetSolve.Model.Servers.Of(1), service);
        for (int c = current; c <= 200; c++)
        {
            var result = UnitMetrics.Compute(unit with { Servers = NetSolve.Model.Servers.Of(c) }, arrivals, arrivals);
            if (!result.IsStable)
            {
                continue;
            }

            bool ok = (targets.MaxUtilisation is not double u || StaffingSearch.Within(result.Utilisation, u))
                && (targets.MaxMeanWaitHours is not double w || StaffingSearch.Within(result.MeanWaitHours!.Value, w))
                && (targets.MaxMeanTimeInUnitHours is not double t || StaffingSearch.Within(result.MeanTimeInUnitHours!.Value, t))
                && (targets.WaitTail is not WaitTailTarget tail
                    || StaffingSearch.Within(ErlangFormulas.WaitLongerThan(c, result.OfferedLoad, service, tail.WaitHours), tail.MaxProbability));
            if (ok)
            {
                return c;
            }
        }

        return null;
    }
}
