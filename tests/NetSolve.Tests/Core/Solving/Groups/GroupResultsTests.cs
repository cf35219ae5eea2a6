using NetSolve.Model;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Core.Solving.Groups;

public class GroupResultsTests
{
    private const double Tolerance = 1e-9;

    /// <summary>
    /// Three units with exponential service and Poisson arrivals: the default group (1/h at a, half of a to b) and a
    /// day group (0.5/h at a, all of a to c) with its own 2 h service at c, which only it reaches: a Jackson network.
    /// </summary>
    internal const string TwoGroups = """
        units:
          a:
            servers: 1
            service: 30min
          b:
            servers: 1
            service: 1h
          c:
            servers: 2
            service: 1h
        arrivals:
          a: 1/h
        routes:
          a:
            b: 0.5
        groups:
          day:
            label: Day cases
            arrivals:
              a: 0.5/h
            routes:
              a:
                c: 1
            services:
              c:
                service: 2h
        """;

    // Exact by hand (Jackson waits): a is M/M/1 at λ 1.5, μ 2: Wq = ρ/(μ − λ) = 0.75/0.5 = 1.5 h; b is M/M/1 at
    // λ 0.5, μ 1: Wq = 0.5/0.5 = 1 h; c is M/M/2 at λ 0.5, m 2 h (load 1): C(2, 1) = 1/3, Wq = (1/3)/(2·0.5 − 0.5) = 2/3 h.
    // Default: T = 1·(1.5 + 0.5) + 0.5·(1 + 1) = 3 h, L = 1·3 = 3. Day: T = 1·(1.5 + 0.5) + 1·(2/3 + 2) = 14/3 h,
    // L = 0.5·14/3 = 7/3. Together 16/3 = Σ_i λ_i (W_i + E[S_i]) = 1.5·2 + 0.5·2 + 0.5·8/3, the network's total.
    [Fact]
    public void Each_groups_time_in_network_adds_its_visits_times_the_shared_wait_plus_its_own_service()
    {
        var solution = NetworkSolver.Solve(TestNetworks.Parse(TwoGroups));

        Assert.Equal(2, solution.Groups.Length);
        var standard = solution.Groups[0];
        var day = solution.Groups[1];
        Assert.Equal([GroupTraffic.DefaultGroupId, "day"], solution.Groups.Select(group => group.Id), StringComparer.Ordinal);
        Assert.Equal("Day cases", day.Label);
        Assert.Equal(1.5, solution.Units[0].MeanWaitHours!.Value, Tolerance);
        Assert.Equal(1.0, solution.Units[1].MeanWaitHours!.Value, Tolerance);
        Assert.Equal(2.0 / 3.0, solution.Units[2].MeanWaitHours!.Value, Tolerance);
        Assert.Equal(3.0, standard.MeanTimeInNetworkHours!.Value, Tolerance);
        Assert.Equal(3.0, standard.MeanInNetwork!.Value, Tolerance);
        Assert.Equal(14.0 / 3.0, day.MeanTimeInNetworkHours!.Value, Tolerance);
        Assert.Equal(7.0 / 3.0, day.MeanInNetwork!.Value, Tolerance);
        Assert.Equal(16.0 / 3.0, solution.Totals.MeanInSystem!.Value, Tolerance);
    }

    // Exact by hand: visits v_g,i = λ_g,i / Λ_g: default 1, 0.5, 0; day 1, 0, 1; throughput Λ_g = 1/h and 0.5/h.
    [Fact]
    public void Each_group_reports_its_arrivals_throughput_and_visits_to_every_unit()
    {
        var solution = NetworkSolver.Solve(TestNetworks.Parse(TwoGroups));

        Assert.Equal([1.0, 0.5, 0.0], solution.Groups[0].VisitsPerPatient);
        Assert.Equal([1.0, 0.0, 1.0], solution.Groups[1].VisitsPerPatient);
        Assert.Equal(1.0, solution.Groups[0].ExternalArrivalsPerHour, Tolerance);
        Assert.Equal(1.0, solution.Groups[0].ThroughputPerHour, Tolerance);
        Assert.Equal(0.5, solution.Groups[1].ExternalArrivalsPerHour, Tolerance);
        Assert.Equal(0.5, solution.Groups[1].ThroughputPerHour, Tolerance);
    }

    // Exact by hand: with one server at c the day group's load there is 1 erlang (unstable, no wait), so the day group
    // has no time in network; the default group never visits c and keeps T = 3 h, L = 3 (a and b are unchanged).
    [Fact]
    public void A_group_that_visits_an_unstable_unit_has_no_time_and_the_others_keep_theirs()
    {
        var network = TestNetworks.Parse(TwoGroups);
        network = network with { Units = network.Units.SetItem(2, network.Units[2] with { Servers = Servers.Of(1) }) };

        var solution = NetworkSolver.Solve(network);

        Assert.Equal(UnitStatus.Unstable, solution.Units[2].Status);
        Assert.Equal(3.0, solution.Groups[0].MeanTimeInNetworkHours!.Value, Tolerance);
        Assert.Equal(3.0, solution.Groups[0].MeanInNetwork!.Value, Tolerance);
        Assert.Null(solution.Groups[1].MeanTimeInNetworkHours);
        Assert.Null(solution.Groups[1].MeanInNetwork);
    }

    // Exact by hand: a network without groups has no group results (the solver does not build the groups' traffic).
    [Theory]
    [MemberData(nameof(ExampleFiles))]
    public void A_network_without_groups_has_no_group_results(string file)
    {
        var solution = NetworkSolver.Solve(TestNetworks.Example(file) with { Groups = [] });

        Assert.Empty(solution.Groups);
    }

    // Exact by hand: the default group with no arrivals of its own is left out. The one group takes 1/h at a and
    // follows the network's routes (a to b half): a is M/M/1 at ρ 0.5, time 1/(2 − 1) = 1 h, L = 1; b at ρ 0.5, time
    // 1/(1 − 0.5) = 2 h, L = 1; c unreached. T = 1·1 + 0.5·2 = 2 h, L = 2, the network's totals (Little's law).
    [Fact]
    public void A_default_group_without_arrivals_is_left_out()
    {
        var network = OnlyGroupArrivals(TestNetworks.Parse(TwoGroups) with { Groups = [] });

        var solution = NetworkSolver.Solve(network);

        var group = Assert.Single(solution.Groups);
        Assert.Equal("all", group.Id);
        Assert.Equal(2.0, group.MeanTimeInNetworkHours!.Value, Tolerance);
        Assert.Equal(2.0, group.MeanInNetwork!.Value, Tolerance);
        Assert.Equal(2.0, solution.Totals.MeanTimeInSystemHours!.Value, Tolerance);
    }

    public static TheoryData<string> ExampleFiles() => TestNetworks.ExampleFiles();

    /// <summary>
    /// The same network with its top-level arrivals moved into one group <c>all</c> that follows the network's routes
    /// (the parser wants top-level arrivals, so this is built on the model).
    /// </summary>
    internal static Network OnlyGroupArrivals(Network network) => network with
    {
        Arrivals = [],
        Groups = [new PatientGroup("all", "All patients", network.Arrivals)],
    };
}
