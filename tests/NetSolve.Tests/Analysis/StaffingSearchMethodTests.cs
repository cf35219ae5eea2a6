using NetSolve.Analysis;
using NetSolve.Solving;

namespace NetSolve.Tests.Analysis;

/// <summary>The staffing search by each unit's own method: variable service, bed limits and the P(full) target.</summary>
public sealed class StaffingSearchMethodTests
{
    [Fact]
    public void Five_erlangs_at_one_percent_blocking_need_eleven_servers()
    {
        // Exact by hand: the Erlang B recurrence B(k) = aB(k−1)/(k + aB(k−1)) at a = 5 gives B(10, 5) = 0.018385 and
        // B(11, 5) = 0.008287, so 11 servers is the fewest with B ≤ 1%. From memory: the Erlang B table (5 erlangs, 1%
        // grade of service, 11 circuits) agrees.
        var targets = new StaffingTargets(MaxTurnedAway: 0.01);
        Assert.Equal(11, StaffingSearch.MinimumServersWithCapacity(5.0, 1.0, 1, 0, targets, out string? impossible));
        Assert.Null(impossible);
        Assert.Equal(10, StaffingSearch.MinimumServersWithCapacity(5.0, 1.0, 1, 0, new StaffingTargets(MaxTurnedAway: 0.02), out _));
    }

    [Fact]
    public void A_pure_loss_unit_in_a_network_gets_its_beds_and_reports_its_blocking_after()
    {
        var network = SmallNetworks.Build([("ward", 4, 1.0)], [("ward", 5.0)]);
        network = network with { Units = [network.Units[0] with { Capacity = 4 }] };
        var plan = StaffingSearch.MeetTargets(NetworkSolver.Solve(network), new StaffingTargets(MaxTurnedAway: 0.01));
        // Exact by hand: as above, 11 beds; capacity rises with the beds (a loss unit stays one); P(full) = B(11, 5).
        Assert.Equal(11, plan.Units[0].RequiredServers);
        Assert.Equal(11, plan.After!.Units[0].Unit.Capacity);
        Assert.Equal(0.008287368467342978, plan.After.Units[0].PFull, 1e-12);
    }

    [Fact]
    public void A_unit_with_waiting_places_keeps_them_as_servers_are_added()
    {
        // Exact by hand, M/M/c/K with a = 1 and one waiting place (K = c + 1): p_n ∝ aⁿ/n! up to c, then p_c·(a/c).
        // c = 1, K = 2: weights 1, 1, 1 → P(full) = 1/3. c = 2, K = 3: 1, 1, 1/2, 1/4 → 1/11 = 0.091.
        // c = 3, K = 4: 1, 1, 1/2, 1/6, 1/18 → (1/18)/(49/18) = 1/49 = 0.0204 ≤ 5%.
        var network = SmallNetworks.Build([("assessment", 1, 1.0)], [("assessment", 1.0)]);
        network = network with { Units = [network.Units[0] with { Capacity = 2 }] };
        var plan = StaffingSearch.MeetTargets(NetworkSolver.Solve(network), new StaffingTargets(MaxTurnedAway: 0.05));
        Assert.Equal(3, plan.Units[0].RequiredServers);
        Assert.Equal(4, plan.After!.Units[0].Unit.Capacity);
        Assert.Equal(1.0 / 49.0, plan.After.Units[0].PFull, 1e-12);
    }

    [Fact]
    public void A_unit_without_a_capacity_ignores_the_turned_away_target()
    {
        // Exact by hand: a = 0.9 on 1 server is stable, the only requirement left when P(full) does not apply.
        var network = SmallNetworks.Build([("clinic", 1, 0.9)], [("clinic", 1.0)]);
        var plan = StaffingSearch.MeetTargets(NetworkSolver.Solve(network), new StaffingTargets(MaxTurnedAway: 0.0001));
        Assert.True(plan.IsFeasible);
        Assert.Equal(0, plan.TotalAdded);
        Assert.Equal(0.0, plan.After!.Units[0].PFull);
    }

    [Fact]
    public void A_zero_turned_away_target_is_impossible_for_a_unit_with_a_capacity()
    {
        StaffingSearch.MinimumServersWithCapacity(1.0, 1.0, 1, 0, new StaffingTargets(MaxTurnedAway: 0.0), out string? impossible);
        Assert.Equal("a 0% chance of finding the unit full cannot be met while patients arrive: with a limited capacity the unit is sometimes full", impossible);
    }

    [Fact]
    public void Fixed_service_needs_fewer_servers_than_exponential_for_the_same_mean_wait()
    {
        // Exact by hand: λ = 0.5/h, S = 1 h, one server. Exponential (M/M/1): Wq = ρS/(1 − ρ) = 1 h > 0.5 h, so 2 servers.
        // Fixed service (M/D/1, Pollaczek–Khinchine): Wq = ρS(1 + cs²)/(2(1 − ρ)) = 0.5·1·1/(2·0.5) = 0.5 h: 1 server meets it.
        var targets = new StaffingTargets(MaxMeanWaitHours: 0.5);
        Assert.Equal(2, StaffingSearch.MinimumServers(0.5, 1.0, 1, 1.0, 1.0, targets, out _));
        Assert.Equal(1, StaffingSearch.MinimumServers(0.5, 1.0, 1, 1.0, 0.0, targets, out _));

        var network = SmallNetworks.Build([("scanner", 1, 1.0)], [("scanner", 0.5)]);
        var exponential = StaffingSearch.MeetTargets(NetworkSolver.Solve(network), targets);
        var fixedService = StaffingSearch.MeetTargets(NetworkSolver.Solve(network with { Units = [network.Units[0] with { ServiceCv = 0.0 }] }), targets);
        Assert.Equal(1, exponential.TotalAdded);
        Assert.Equal(0, fixedService.TotalAdded);
        Assert.Equal(0.5, fixedService.After!.Units[0].MeanWaitHours!.Value, 1e-12);
    }

    [Fact]
    public void Minimum_servers_with_variability_equal_a_brute_force_scan_with_the_solvers_formulas()
    {
        // Source: brute force over c = current..200 with GgcFormulas.Estimate and GgcFormulas.WaitLongerThan.
        var random = new Random(20260311);
        for (int trial = 0; trial < 300; trial++)
        {
            double arrivals = 0.1 + (random.NextDouble() * 20.0);
            double service = 0.05 + (random.NextDouble() * 3.0);
            double arrivalScv = random.Next(3) == 0 ? 1.0 : random.NextDouble() * 3.0;
            double serviceScv = random.Next(3) == 0 ? 1.0 : random.NextDouble() * 3.0;
            int current = 1 + random.Next(3);
            var targets = new StaffingTargets(
                MaxUtilisation: random.Next(3) == 0 ? null : 0.5 + (random.NextDouble() * 0.5),
                MaxMeanWaitHours: random.Next(3) == 0 ? null : (random.NextDouble() * 0.5) + 0.001,
                WaitTail: random.Next(2) == 0 ? null : new WaitTailTarget(random.NextDouble() * 2.0, 0.01 + (random.NextDouble() * 0.2)));
            int? fast = StaffingSearch.MinimumServers(arrivals, service, current, arrivalScv, serviceScv, targets, out _);
            Assert.Equal(BruteForce(arrivals, service, current, arrivalScv, serviceScv, targets), fast);
        }
    }

    [Fact]
    public void The_wait_tail_share_uses_the_units_variability()
    {
        // Exact by hand: M/D/1 at ρ = 0.5 (S = 1 h) has C = 0.5 and Wq = 0.5 h, so the tail C·exp(−t·C/Wq) at t = 1 h
        // is 0.5·e^(−1); with exponential service it is the exact M/M/1 tail ρ·e^(−(μ − λ)t) = 0.5·e^(−0.5).
        var network = SmallNetworks.Build([("scanner", 1, 1.0)], [("scanner", 0.5)]);
        var tail = new WaitTailTarget(1.0, 0.1);
        var exponential = NetworkSolver.Solve(network).Units[0];
        var fixedService = NetworkSolver.Solve(network with { Units = [network.Units[0] with { ServiceCv = 0.0 }] }).Units[0];
        Assert.Equal(ErlangFormulas.WaitLongerThan(1, 0.5, 1.0, 1.0), tail.ShareWaitingLonger(exponential));
        Assert.Equal(0.5 * Math.Exp(-0.5), tail.ShareWaitingLonger(exponential)!.Value, 1e-12);
        Assert.Equal(0.5 * Math.Exp(-1.0), tail.ShareWaitingLonger(fixedService)!.Value, 1e-12);
    }

    private static int? BruteForce(double arrivals, double service, int current, double arrivalScv, double serviceScv, StaffingTargets targets)
    {
        for (int c = current; c <= 200; c++)
        {
            var estimate = GgcFormulas.Estimate(c, arrivals, service, arrivalScv, serviceScv);
            if (!estimate.IsStable)
            {
                continue;
            }

            bool ok = (targets.MaxUtilisation is not double u || StaffingSearch.Within(estimate.Utilisation, u))
                && (targets.MaxMeanWaitHours is not double w || StaffingSearch.Within(estimate.MeanWaitHours!.Value, w))
                && (targets.WaitTail is not WaitTailTarget tail
                    || StaffingSearch.Within(GgcFormulas.WaitLongerThan(c, arrivals, service, arrivalScv, serviceScv, tail.WaitHours), tail.MaxProbability));
            if (ok)
            {
                return c;
            }
        }

        return null;
    }
}
