using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Scenarios;
using NetSolve.Solving;
using NetSolve.Tests.Analysis;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Scenarios;

public sealed class OverrideTests
{
    public static TheoryData<string, string, string> Edits => new()
    {
        { "servers.ward=320", "servers: 300", "servers: 320" },
        { "servers.imaging+=2", "servers: 3\n", "servers: 5\n" },
        { "service.imaging=25min", "service: 20min", "service: 25min" },
        { "service.lab*=0.75", "service: 40min", "service: 30min" },
        { "arrivals.emergency*=1.2", "emergency: 11.5/h", "emergency: 13.8/h" },
        { "arrivals.ward=1/h", "ward: 18/d", "ward: 1/h" },
        { "route.emergency.imaging=0.2", "imaging: 35%", "imaging: 20%" },
        { "route.lab.ward=0.1", "    emergency: 0.7", "    emergency: 0.7\n    ward: 0.1" },
        { "servers.discharge_lounge=4", "servers: unlimited", "servers: 4" },
    };

    [Theory]
    [MemberData(nameof(Edits))]
    public void An_override_equals_editing_the_file(string text, string original, string edited)
    {
        // Source: the same network written two ways; both are solved from scratch.
        string path = TestFiles.Network("harbourside");
        string yaml = File.ReadAllText(path);
        Assert.Contains(original, yaml, StringComparison.Ordinal);
        var expected = NetworkReader.ReadText(yaml.Replace(original, edited, StringComparison.Ordinal), path).Network!;
        var changed = Apply(SmallNetworks.Example("harbourside.yaml"), text);
        GrowthAnalysisTests.AssertSameMetrics(NetworkSolver.Solve(expected), NetworkSolver.Solve(changed));
    }

    [Fact]
    public void Scaling_every_stream_equals_editing_every_rate()
    {
        string path = TestFiles.Network("harbourside");
        string yaml = File.ReadAllText(path).Replace("11.5/h", "12.65/h", StringComparison.Ordinal).Replace("18/d", "19.8/d", StringComparison.Ordinal);
        var changed = Apply(SmallNetworks.Example("harbourside.yaml"), "arrivals*=1.1");
        GrowthAnalysisTests.AssertSameMetrics(NetworkSolver.Solve(NetworkReader.ReadText(yaml, path).Network!), NetworkSolver.Solve(changed));
    }

    [Theory]
    [InlineData("servers.wrad=3", "--set servers.wrad=3: unknown unit 'wrad'; did you mean 'ward'?")]
    [InlineData("serverz.ward=3", "--set serverz.ward=3: unknown field 'serverz'; did you mean 'servers'?")]
    [InlineData("ward.servers=3", "--set ward.servers=3: unknown field 'ward' (fields: servers, service, arrivals, route)")]
    [InlineData("servers.ward=0", "--set servers.ward=0: servers: '0' is not a number of servers (write a whole number from 1 to 1000000, or unlimited)")]
    [InlineData("servers.ward*=2", "--set servers.ward*=2: servers takes '=' (a number or unlimited) or '+=' (servers to add), not '*='")]
    [InlineData("service.lab=fast", "--set service.lab=fast: service: 'fast' is not a duration (write e.g. 45min, 2.5h, 3d, 30s, or a number in hours)")]
    [InlineData("route.emergency=0.2", "--set route.emergency=0.2: a route is written route.FROM.TO=P, e.g. route.emergency.imaging=0.2")]
    [InlineData("route.emergency.imaging=0.7", "--set route.emergency.imaging=0.7: unit 'emergency': routes add up to 1.12, more than 1 (a changed route takes its difference from the patients leaving the network; lower another route of this unit too)")]
    [InlineData("route.emergency.imagin=0.1", "--set route.emergency.imagin=0.1: unknown unit 'imagin'; did you mean 'imaging'?")]
    [InlineData("arrivals.lab*=2", "--set arrivals.lab*=2: unit 'lab': has no external arrivals to scale; set a rate instead")]
    [InlineData("arrivals*=0", "--set arrivals*=0: no positive arrival rate is left: at least one unit needs patients arriving from outside")]
    [InlineData("servers.discharge_lounge+=1", "--set servers.discharge_lounge+=1: unit 'discharge_lounge': has unlimited servers; set a number instead of adding to it")]
    [InlineData("servers.ward", "--set servers.ward: expected FIELD.UNIT=VALUE, e.g. servers.ward=320, service.imaging=25min, arrivals*=1.1, arrivals.emergency*=1.2, route.emergency.imaging=0.2")]
    public void A_bad_override_gives_one_exact_line(string text, string expected)
    {
        var network = SmallNetworks.Example("harbourside.yaml");
        var problems = Problems(network, text);
        Assert.Equal([expected], problems);
    }

    [Fact]
    public void An_override_that_traps_patients_names_the_units()
    {
        // Source: contract rule — a set of reached units patients can never leave is an error naming them.
        var problems = Problems(SmallNetworks.Example("millbrook-clinic.yaml"), "route.clinician.xray=1");
        Assert.Equal(["--set route.clinician.xray=1: units 'clinician', 'xray': patients who reach these units can never leave the network; let the routes of at least one of them add up to less than 1"], problems);
    }

    [Fact]
    public void Closing_a_unit_sends_its_routes_and_arrivals_to_the_named_unit()
    {
        var network = SmallNetworks.Build(
            [("emergency", 10, 1.0), ("imaging", 2, 0.25), ("ward", 50, 48.0)],
            [("emergency", 5.0), ("imaging", 0.5)],
            [("emergency", "imaging", 0.3), ("emergency", "ward", 0.1), ("imaging", "ward", 0.2)]);
        var edit = NetworkEditor.Apply(network, [new CloseUnit(default, "imaging", "ward")], default);
        var changed = edit.Network!;
        Assert.Equal(["emergency", "ward"], changed.Units.Select(u => u.Id), StringComparer.Ordinal);
        // The 0.3 that went to imaging now goes to the ward, added to the 0.1 already there.
        Assert.Equal(0.4, changed.Routes.Single(r => r.From == "emergency" && r.To == "ward").Probability, 1e-15);
        Assert.Single(changed.Routes);
        Assert.Equal(0.5, changed.Arrivals.Single(a => a.UnitId == "ward").PerHour);
    }

    [Fact]
    public void Closing_a_unit_whose_patients_leave_drops_its_routes()
    {
        var network = SmallNetworks.Example("harbourside.yaml");
        var changed = NetworkEditor.Apply(network, [new CloseUnit(default, "discharge_lounge", null)], default).Network!;
        Assert.DoesNotContain(changed.Routes, r => r.To == "discharge_lounge");
        Assert.Equal(4, changed.Units.Length);
    }

    internal static Network Apply(Network network, params string[] texts)
    {
        var changes = new List<NetworkChange>();
        foreach (string text in texts)
        {
            Assert.Null(OverrideParser.Parse(text, network.TimeUnit, out var change));
            changes.Add(change!);
        }

        var edit = NetworkEditor.Apply(network, changes, new SourceLocation("harbourside.yaml", 0, 0));
        Assert.False(edit.HasErrors, string.Join("\n", edit.Diagnostics));
        return edit.Network!;
    }

    private static List<string> Problems(Network network, string text)
    {
        if (OverrideParser.Parse(text, network.TimeUnit, out var change) is Diagnostic problem)
        {
            return [problem.ToString()];
        }

        var edit = NetworkEditor.Apply(network, [change!], new SourceLocation("harbourside.yaml", 0, 0));
        return [.. edit.Diagnostics.Where(d => d.IsError).Select(d => d.ToString())];
    }
}
