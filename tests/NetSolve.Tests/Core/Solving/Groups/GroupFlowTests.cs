using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Core.Solving.Groups;

public class GroupFlowTests
{
    private const double Tolerance = 1e-12;

    private static readonly double[] Waits = [0.1, 0.2, 3.0];

    // Exact by hand, T_g = Σ_i v_g,i (W_i + m_g,i) with waits 0.1, 0.2, 3 h on the two-group network:
    // default 1·(0.1 + 1) + 0.5·(0.2 + 0.5) + 0.45·(3 + 48) = 1.1 + 0.35 + 22.95 = 24.4 h;
    // elective 0 + 2·(0.2 + 0.25) + 2·(3 + 24) = 0.9 + 54 = 54.9 h.
    [Fact]
    public void A_groups_time_in_network_adds_its_visits_times_wait_plus_its_own_service()
    {
        var traffic = GroupTraffic.Solve(TestNetworks.Parse(GroupTrafficTests.TwoGroups));

        Assert.Equal(24.4, traffic.Groups[0].MeanTimeInNetworkHours(Waits), Tolerance);
        Assert.Equal(54.9, traffic.Groups[1].MeanTimeInNetworkHours(Waits), Tolerance);
    }

    // Exact by hand: Little's law L_g = Λ_g T_g: default 4/h · 24.4 h = 97.6, elective 1/h · 54.9 h = 54.9;
    // throughput equals external arrivals (4/h and 1/h) in steady state.
    [Fact]
    public void A_groups_patients_in_network_follow_littles_law()
    {
        var traffic = GroupTraffic.Solve(TestNetworks.Parse(GroupTrafficTests.TwoGroups));
        double?[] waits = [.. Waits.Select(wait => (double?)wait)];

        Assert.Equal(97.6, traffic.Groups[0].MeanInNetwork(waits)!.Value, Tolerance);
        Assert.Equal(54.9, traffic.Groups[1].MeanInNetwork(waits)!.Value, Tolerance);
        Assert.Equal(4.0, traffic.Groups[0].ThroughputPerHour, Tolerance);
        Assert.Equal(1.0, traffic.Groups[1].ThroughputPerHour, Tolerance);
    }

    // Exact by hand: the elective group never visits emergency, so a missing wait there (an unstable unit) leaves its
    // time 0.9 + 54 = 54.9 h; the default group visits it and has no time.
    [Fact]
    public void A_missing_wait_hides_only_the_groups_that_visit_that_unit()
    {
        var traffic = GroupTraffic.Solve(TestNetworks.Parse(GroupTrafficTests.TwoGroups));
        double?[] waits = [null, 0.2, 3.0];

        Assert.Null(traffic.Groups[0].MeanTimeInNetworkHours(waits));
        Assert.Equal(54.9, traffic.Groups[1].MeanTimeInNetworkHours(waits)!.Value, Tolerance);
    }

    // Exact by hand: Σ_g Λ_g T_g = Σ_i λ_i (W_i + E[S_i]) because E[S_i] weights each group's mean by its flow;
    // here 97.6 + 54.9 = 4·1.1 + 4·(0.2 + 0.375) + 3.8·(3 + 672/19) = 4.4 + 2.3 + 145.8 = 152.5.
    [Fact]
    public void The_groups_together_hold_the_networks_total()
    {
        var traffic = GroupTraffic.Solve(TestNetworks.Parse(GroupTrafficTests.TwoGroups));
        double?[] waits = [.. Waits.Select(wait => (double?)wait)];

        double byGroup = traffic.Groups.Sum(group => group.MeanInNetwork(waits)!.Value);
        double byUnit = traffic.Units.Select((unit, i) => unit.ArrivalsPerHour * (Waits[i] + unit.MeanServiceHours)).Sum();

        Assert.Equal(152.5, byGroup, 1e-11);
        Assert.Equal(152.5, byUnit, 1e-11);
    }

    // Common practice: library misuse throws from the guard clause (house style): one wait per unit, finite, not negative.
    [Fact]
    public void Waits_of_the_wrong_length_or_not_finite_are_refused()
    {
        var group = GroupTraffic.Solve(TestNetworks.Parse(GroupTrafficTests.TwoGroups)).Groups[0];

        Assert.Throws<ArgumentException>(() => group.MeanTimeInNetworkHours([0.1, 0.2]));
        Assert.Throws<ArgumentOutOfRangeException>(() => group.MeanTimeInNetworkHours([0.1, double.NaN, 3.0]));
        Assert.Throws<ArgumentOutOfRangeException>(() => group.MeanTimeInNetworkHours([0.1, -1.0, 3.0]));
    }
}
