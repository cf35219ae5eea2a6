using NetSolve.Model;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Core.Solving.Groups;

public class GroupTrafficTests
{
    private const double Tolerance = 1e-12;

    /// <summary>
    /// Three units; the default group enters at the emergency department, a second group enters at imaging with its own
    /// routes (imaging to the ward, half of the ward back to imaging) and its own service times at imaging and the ward.
    /// </summary>
    internal const string TwoGroups = """
        units:
          emergency:
            servers: 6
            service: 1h
          imaging:
            servers: 3
            service: 30min
            service_cv: 0.6
          ward:
            servers: 200
            service: 48h
        arrivals:
          emergency: 4/h
        routes:
          emergency:
            imaging: 0.5
            ward: 0.25
          imaging:
            ward: 0.4
        groups:
          elective:
            label: Elective patients
            arrivals:
              imaging: 1/h
            routes:
              imaging:
                ward: 1
              ward:
                imaging: 0.5
            services:
              imaging:
                service: 15min
                service_distribution: deterministic
              ward:
                service: 24h
                service_distribution: lognormal
                service_cv: 0.5
        """;

    public static TheoryData<string> ExampleFiles() => TestNetworks.ExampleFiles();

    // Exact by hand: without groups the solver must take today's code path, so flows, visits, means and SCVs are
    // compared bit for bit with TrafficEquations, NetworkSolver's visits, Unit.MeanServiceHours and EffectiveService.Cv².
    [Theory]
    [MemberData(nameof(ExampleFiles))]
    public void Without_groups_every_unit_gets_exactly_todays_flow_and_its_own_service(string file)
    {
        var network = TestNetworks.Example(file) with { Groups = [] };
        var today = TrafficEquations.Solve(RoutingTable.Build(network));

        var traffic = GroupTraffic.Solve(network);

        var group = Assert.Single(traffic.Groups);
        Assert.True(group.IsDefault);
        Assert.Equal(GroupTraffic.DefaultGroupId, group.Id);
        Assert.Equal(network.ExternalArrivalsPerHour, group.ExternalArrivalsPerHour);
        for (int i = 0; i < network.Units.Length; i++)
        {
            var unit = network.Units[i];
            double cv = unit.EffectiveService.Cv;
            Assert.Equal(today[i], traffic.Units[i].ArrivalsPerHour);
            Assert.Equal(today[i], group.Units[i].ArrivalsPerHour);
            Assert.Equal(today[i] / network.ExternalArrivalsPerHour, group.Units[i].VisitsPerPatient);
            Assert.Equal(unit.MeanServiceHours, traffic.Units[i].MeanServiceHours);
            Assert.Equal(cv * cv, traffic.Units[i].ServiceScv);
        }
    }

    // Exact by hand: default group λ_E = 4, λ_I = 0.5·4 = 2, λ_W = 0.25·4 + 0.4·2 = 1.8 (Λ = 4: visits 1, 0.5, 0.45);
    // elective λ_I = 1 + 0.5 λ_W, λ_W = λ_I, so λ_I = λ_W = 2 and it never reaches emergency (Λ = 1: visits 0, 2, 2).
    [Fact]
    public void Each_group_follows_its_own_routes()
    {
        var traffic = GroupTraffic.Solve(TestNetworks.Parse(TwoGroups));

        Assert.Equal(2, traffic.Groups.Length);
        var standard = traffic.Groups[0];
        var elective = traffic.Groups[1];
        Assert.Equal("default", standard.Id);
        Assert.Equal("elective", elective.Id);
        Assert.Equal("Elective patients", elective.Label);
        Assert.False(elective.IsDefault);
        Assert.Equal(4.0, standard.ExternalArrivalsPerHour, Tolerance);
        Assert.Equal(1.0, elective.ExternalArrivalsPerHour, Tolerance);
        Assert.Equal(5.0, traffic.ExternalArrivalsPerHour, Tolerance);

        Assert.Equal([4.0, 2.0, 1.8], standard.Units.Select(unit => unit.ArrivalsPerHour), Close);
        Assert.Equal([1.0, 0.5, 0.45], standard.Units.Select(unit => unit.VisitsPerPatient), Close);
        Assert.Equal([0.0, 2.0, 2.0], elective.Units.Select(unit => unit.ArrivalsPerHour), Close);
        Assert.Equal([0.0, 2.0, 2.0], elective.Units.Select(unit => unit.VisitsPerPatient), Close);
        Assert.Equal([4.0, 4.0, 3.8], traffic.FlowsPerHour, Close);
    }

    // Exact by hand: each group keeps its own service. Imaging: default 0.5 h, cv 0.6 (SCV 0.36); elective 0.25 h
    // deterministic (SCV 0). Ward: default 48 h exponential (SCV 1); elective 24 h lognormal cv 0.5 (SCV 0.25).
    [Fact]
    public void Each_group_keeps_its_own_service_at_each_unit()
    {
        var traffic = GroupTraffic.Solve(TestNetworks.Parse(TwoGroups));

        Assert.Equal([1.0, 0.5, 48.0], traffic.Groups[0].Units.Select(unit => unit.MeanServiceHours), Close);
        Assert.Equal([1.0, 0.36, 1.0], traffic.Groups[0].Units.Select(unit => unit.ServiceScv), Close);
        Assert.Equal([1.0, 0.25, 24.0], traffic.Groups[1].Units.Select(unit => unit.MeanServiceHours), Close);
        Assert.Equal([1.0, 0.0, 0.25], traffic.Groups[1].Units.Select(unit => unit.ServiceScv), Close);
    }

    // Exact by hand, E[S] = Σ w m, E[S²] = Σ w m²(1 + cs²), cs² = E[S²]/E[S]² − 1:
    // imaging, w = 2/4 each: E[S] = 0.375 h, E[S²] = 0.5·0.25·1.36 + 0.5·0.0625 = 0.20125, cs² = 322/225 − 1 = 97/225;
    // ward, w = 9/19 and 10/19: E[S] = (9·48 + 10·24)/19 = 672/19 h, E[S²] = (9·2304·2 + 10·576·1.25)/19 = 48672/19,
    // cs² = 48672·19/672² − 1 = 3211/1568 − 1 = 1643/1568; emergency has only the default group: 1 h, SCV 1.
    [Fact]
    public void A_unit_shared_by_two_groups_sees_the_mixture_of_their_services()
    {
        var traffic = GroupTraffic.Solve(TestNetworks.Parse(TwoGroups));

        Assert.Equal(1.0, traffic.Units[0].MeanServiceHours, Tolerance);
        Assert.Equal(1.0, traffic.Units[0].ServiceScv, Tolerance);
        Assert.Equal(0.375, traffic.Units[1].MeanServiceHours, Tolerance);
        Assert.Equal(97.0 / 225.0, traffic.Units[1].ServiceScv, Tolerance);
        Assert.Equal(672.0 / 19.0, traffic.Units[2].MeanServiceHours, Tolerance);
        Assert.Equal(1643.0 / 1568.0, traffic.Units[2].ServiceScv, Tolerance);
    }

    // Exact by hand: a group with no routes of its own follows the network's, so 2/h at emergency gives half the
    // default group's flows (4/h): 2, 1 and 0.25·2 + 0.4·1 = 0.9.
    [Fact]
    public void A_group_without_routes_follows_the_networks_routes()
    {
        const string Yaml = """
            units:
              emergency:
                servers: 6
                service: 1h
              imaging:
                servers: 3
                service: 30min
              ward:
                servers: 200
                service: 48h
            arrivals:
              emergency: 4/h
            routes:
              emergency:
                imaging: 0.5
                ward: 0.25
              imaging:
                ward: 0.4
            groups:
              walk_in:
                arrivals:
                  emergency: 2/h
            """;

        var traffic = GroupTraffic.Solve(TestNetworks.Parse(Yaml));

        var walkIn = traffic.Groups[1];
        Assert.Equal("walk_in", walkIn.Label);
        Assert.Equal([2.0, 1.0, 0.9], walkIn.Units.Select(unit => unit.ArrivalsPerHour), Close);
        Assert.Equal([1.0, 0.5, 0.45], walkIn.Units.Select(unit => unit.VisitsPerPatient), Close);
        Assert.Equal([6.0, 3.0, 2.7], traffic.FlowsPerHour, Close);
    }

    // Exact by hand: the traffic equations are linear in the external arrivals, so a group that repeats the default
    // group (same arrivals, the network's routes, the units' services) gives the flows of the merged arrivals, and
    // each unit keeps its own mean and SCV unchanged (every group there has the same service).
    [Theory]
    [MemberData(nameof(ExampleFiles))]
    public void A_group_that_repeats_the_default_group_equals_the_merged_arrivals(string file)
    {
        var plain = TestNetworks.Example(file) with { Groups = [] };
        var twin = new PatientGroup("twin", "twin", plain.Arrivals);
        var merged = plain with { Arrivals = [.. plain.Arrivals.Select(arrival => arrival with { PerHour = 2.0 * arrival.PerHour })] };
        var expected = TrafficEquations.Solve(RoutingTable.Build(merged));

        var traffic = GroupTraffic.Solve(plain with { Groups = [twin] });

        double scale = Math.Max(1.0, expected.Max());
        for (int i = 0; i < plain.Units.Length; i++)
        {
            var unit = plain.Units[i];
            double cv = unit.EffectiveService.Cv;
            Assert.Equal(expected[i], traffic.Units[i].ArrivalsPerHour, 1e-12 * scale);
            Assert.Equal(unit.MeanServiceHours, traffic.Units[i].MeanServiceHours);
            Assert.Equal(cv * cv, traffic.Units[i].ServiceScv);
        }
    }

    // Exact by hand: a unit no group reaches has no flow and keeps its own service (30 min, cv 0.6: SCV 0.36).
    [Fact]
    public void A_unit_nobody_reaches_keeps_its_own_service()
    {
        var network = TestNetworks.Parse(TwoGroups);
        network = network with { Routes = [.. network.Routes.Where(route => route.To != "imaging")], Groups = [] };

        var traffic = GroupTraffic.Solve(network);

        Assert.Equal(0.0, traffic.Units[1].ArrivalsPerHour);
        Assert.Equal(0.5, traffic.Units[1].MeanServiceHours, Tolerance);
        Assert.Equal(0.36, traffic.Units[1].ServiceScv, Tolerance);
    }

    // Common practice: library misuse throws from the guard clause at the entry point (house style, errors section).
    [Fact]
    public void A_group_naming_a_unit_the_network_lacks_is_refused()
    {
        var network = TestNetworks.Parse(TwoGroups);
        var stray = new PatientGroup("stray", "stray", [new Arrival("theatre", 1.0)]);

        var error = Assert.Throws<ArgumentException>(() => GroupTraffic.Solve(network with { Groups = [stray] }));
        Assert.Contains("theatre", error.Message, StringComparison.Ordinal);
    }

    // Exact by hand: flow balance per group in steady state, Λ_g = Σ_i λ_g,i (1 − Σ_j p_g,ij), on every example file.
    [Theory]
    [MemberData(nameof(ExampleFiles))]
    public void Every_group_lets_out_what_it_takes_in(string file)
    {
        var network = TestNetworks.Example(file);
        var traffic = GroupTraffic.Solve(network);

        Assert.Equal(network.Groups.Length + 1, traffic.Groups.Length);
        foreach (var group in traffic.Groups)
        {
            var routing = RoutingTable.Build(network with { Routes = group.Group?.Routes ?? network.Routes });
            double leaving = group.Units.Select((unit, i) => unit.ArrivalsPerHour * routing.ExitProbability(i)).Sum();
            Assert.Equal(group.ExternalArrivalsPerHour, leaving, 1e-9 * Math.Max(1.0, group.ExternalArrivalsPerHour));
        }

        for (int i = 0; i < network.Units.Length; i++)
        {
            Assert.Equal(traffic.Groups.Sum(group => group.Units[i].ArrivalsPerHour), traffic.Units[i].ArrivalsPerHour, 1e-12);
            Assert.True(double.IsFinite(traffic.Units[i].MeanServiceHours) && traffic.Units[i].MeanServiceHours > 0.0);
            Assert.True(double.IsFinite(traffic.Units[i].ServiceScv) && traffic.Units[i].ServiceScv >= 0.0);
        }
    }

    // Exact by hand: deterministic services of 0.5 h and 1.5 h in equal shares (1/h each) mix to E[S] = 1 h and
    // Var[S] = ½·0.25 + ½·0.25 = 0.25 h², so cs² = 0.25 although each group alone has cs² = 0 (docs/methods.md).
    [Fact]
    public void Two_deterministic_services_with_different_means_mix_to_a_variable_one()
    {
        const string Yaml = """
            units:
              clinic:
                servers: 3
                service: 30min
                service_distribution: deterministic
            arrivals:
              clinic: 1/h
            groups:
              long_visits:
                arrivals:
                  clinic: 1/h
                services:
                  clinic:
                    service: 90min
                    service_distribution: deterministic
            """;

        var unit = Assert.Single(GroupTraffic.Solve(TestNetworks.Parse(Yaml)).Units);

        Assert.Equal(2.0, unit.ArrivalsPerHour, Tolerance);
        Assert.Equal(1.0, unit.MeanServiceHours, Tolerance);
        Assert.Equal(0.25, unit.ServiceScv, Tolerance);
    }

    private static bool Close(double expected, double actual) => Math.Abs(expected - actual) <= Tolerance * Math.Max(1.0, Math.Abs(expected));
}
