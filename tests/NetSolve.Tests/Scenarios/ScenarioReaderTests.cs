using NetSolve.Scenarios;
using NetSolve.Solving;
using NetSolve.Tests.Analysis;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Scenarios;

public sealed class ScenarioReaderTests
{
    private static string ScenariosFolder => Path.Combine(TestFiles.NetworksFolder, "scenarios");

    [Fact]
    public void Every_example_scenario_reads_and_solves()
    {
        var files = Directory.GetFiles(ScenariosFolder, "*.yaml");
        Assert.NotEmpty(files);
        foreach (string file in files)
        {
            var result = ScenarioReader.ReadFile(file);
            Assert.False(result.HasErrors, string.Join("\n", result.Diagnostics));
            Assert.True(NetworkSolver.Solve(result.Scenario!.Network).IsStable, file);
        }
    }

    [Fact]
    public void A_scenario_file_equals_the_same_changes_given_as_overrides()
    {
        // Source: networks/scenarios/harbourside-fourth-scanner.yaml lists servers imaging +1 and service lab x0.8.
        var scenario = ScenarioReader.ReadFile(Path.Combine(ScenariosFolder, "harbourside-fourth-scanner.yaml")).Scenario!;
        var expected = OverrideTests.Apply(SmallNetworks.Example("harbourside.yaml"), "servers.imaging+=1", "service.lab*=0.8");
        Assert.Equal("Fourth scanner, faster lab", scenario.Name);
        GrowthAnalysisTests.AssertSameMetrics(NetworkSolver.Solve(expected), NetworkSolver.Solve(scenario.Network));
    }

    [Fact]
    public void Adding_a_unit_with_arrivals_and_routes_and_closing_another_follows_the_file()
    {
        var scenario = ScenarioReader.ReadFile(Path.Combine(ScenariosFolder, "harbourside-ambulatory-care.yaml")).Scenario!;
        var network = scenario.Network;
        Assert.Equal(["emergency", "imaging", "lab", "ward", "ambulatory"], network.Units.Select(u => u.Id), StringComparer.Ordinal);
        // Exact by hand: every stream x1.05, then ambulatory set to 1.5/h.
        Assert.Equal(11.5 * 1.05, network.Arrivals.Single(a => a.UnitId == "emergency").PerHour, 1e-12);
        Assert.Equal(1.5, network.Arrivals.Single(a => a.UnitId == "ambulatory").PerHour, 1e-12);
        Assert.Equal(0.15, network.Routes.Single(r => r.From == "emergency" && r.To == "imaging").Probability, 1e-12);
        Assert.DoesNotContain(network.Routes, r => r.From == "ward");
    }

    [Theory]
    [InlineData("base: harbourside.yaml\nserver:\n  ward: 320\n", "scenario.yaml:2:1: unknown key 'server'; did you mean 'servers'?")]
    [InlineData("base: harbourside.yaml\nservers:\n  wrd: 320\n", "scenario.yaml:3:3: unknown unit 'wrd'; did you mean 'ward'?")]
    [InlineData("base: harbourside.yaml\nservers:\n  ward: many\n", "scenario.yaml:3:9: unit 'ward': servers: 'many' is not a number of servers (write a whole number from 1 to 1000000, or unlimited)")]
    [InlineData("base: nowhere.yaml\n", "scenario.yaml:1:7: base network 'nowhere.yaml': no such file")]
    [InlineData("base: harbourside.yaml\nclose_units:\n  lab:\n", "scenario.yaml:3:7: unit 'lab': say where its patients go instead: a unit id or 'leave network'")]
    [InlineData("base: harbourside.yaml\nclose_units:\n  lab: lab\n", "scenario.yaml:3:8: unit 'lab': cannot send its patients to itself; name another unit or 'leave network'")]
    [InlineData("base: harbourside.yaml\nroutes:\n  emergency:\n    ward: 0.5\n", "scenario.yaml:4:5: unit 'emergency': routes add up to 1.15, more than 1 (a changed route takes its difference from the patients leaving the network; lower another route of this unit too)")]
    [InlineData("base: harbourside.yaml\nadd_units:\n  ward:\n    servers: 3\n    service: 1h\n", "scenario.yaml:3:3: unit 'ward': already exists; change it instead of adding it")]
    [InlineData("base: harbourside.yaml\nservice:\n  lab: x0\n", "scenario.yaml:3:8: unit 'lab': service: the factor must be more than 0, not '0'")]
    public void A_bad_scenario_file_gives_located_one_line_errors(string yaml, string expected)
    {
        string folder = SmallNetworks.TemporaryFolder();
        File.Copy(TestFiles.Network("harbourside"), Path.Combine(folder, "harbourside.yaml"));
        File.WriteAllText(Path.Combine(folder, "scenario.yaml"), yaml);
        var result = ScenarioReader.ReadText(yaml, "scenario.yaml", basePath => NetSolve.Parsing.NetworkReader.ReadFile(Path.Combine(folder, basePath)));
        Assert.Equal([expected], result.Diagnostics.Where(d => d.IsError).Select(d => d.ToString()), StringComparer.Ordinal);
        Directory.Delete(folder, recursive: true);
    }

    [Fact]
    public void Every_problem_in_a_scenario_file_is_reported_in_file_order()
    {
        const string Yaml = "base: harbourside.yaml\nadd_units:\n  ambulatory:\n    servers: 3\n    servce: 1h\n";
        var result = ScenarioReader.ReadText(Yaml, "scenario.yaml", basePath => NetSolve.Parsing.NetworkReader.ReadFile(Path.Combine(TestFiles.NetworksFolder, basePath)));
        Assert.Equal(
            [
                "scenario.yaml:4:5: unit 'ambulatory': missing 'service' (the mean time a patient holds a server, e.g. 45min)",
                "scenario.yaml:5:5: unit 'ambulatory': unknown key 'servce'; did you mean 'service'?",
            ],
            result.Diagnostics.Where(d => d.IsError).Select(d => d.ToString()),
            StringComparer.Ordinal);
    }

    [Fact]
    public void Bare_numbers_in_a_scenario_use_the_base_networks_time_unit()
    {
        // networks/millbrook-clinic.yaml is in minutes: service 15 is 15 min = 0.25 h, arrivals 12 are 12/min = 720/h.
        const string Yaml = "base: millbrook-clinic.yaml\nservice:\n  clinician: 15\narrivals:\n  reception: 12\n";
        var result = ScenarioReader.ReadText(Yaml, "scenario.yaml", basePath => NetSolve.Parsing.NetworkReader.ReadFile(Path.Combine(TestFiles.NetworksFolder, basePath)));
        var network = result.Scenario!.Network;
        Assert.Equal(0.25, network.Units.Single(u => u.Id == "clinician").MeanServiceHours, 1e-15);
        Assert.Equal(720.0, network.Arrivals.Single(a => a.UnitId == "reception").PerHour, 1e-12);
    }

    [Fact]
    public void A_network_file_reads_as_a_scenario_with_no_changes()
    {
        var result = ScenarioReader.ReadFile(TestFiles.Network("millbrook-clinic"));
        Assert.Empty(result.Scenario!.Changes);
        Assert.Same(result.Scenario.Base, result.Scenario.Network);
        Assert.Equal("millbrook-clinic", result.Scenario.Name);
    }
}
