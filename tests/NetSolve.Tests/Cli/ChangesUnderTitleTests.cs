using System.Text.Json;
using static NetSolve.Tests.Support.CliRun;

namespace NetSolve.Tests.Cli;

/// <summary>
/// Every output of a changed network lists what changed: a <c>changes:</c> line under a table's title, a
/// <c>changes</c> array in JSON and a line under the map's title, in the order the changes applied.
/// </summary>
public sealed class ChangesUnderTitleTests
{
    private static readonly string Harbourside = Path.Combine(AppContext.BaseDirectory, "networks", "harbourside.yaml");

    private static readonly string FourthScanner = Path.Combine(AppContext.BaseDirectory, "networks", "scenarios", "harbourside-fourth-scanner.yaml");

    // Exact by hand: networks/scenarios/harbourside-fourth-scanner.yaml says "servers: imaging: +1" and
    // "service: lab: x0.8", worded as ChangeWords words every change.
    private static readonly string[] ScannerChanges = ["imaging: +1 server", "lab: service \u00D70.8"];

    private const string ScannerLine = "changes: imaging: +1 server; lab: service \u00D70.8";

    /// <summary>Each command with its own options, written as typed after FILE.</summary>
    public static TheoryData<string> TableCommands() =>
    [
        "solve",
        "growth",
        "staff --max-util 0.9",
        "staff --budget 2",
        "pathway --from emergency",
        "simulate -r 2 --duration 2d --warmup 0",
    ];

    [Fact]
    public void Solving_a_scenario_file_as_json_lists_its_changes_after_the_network_name()
    {
        var (code, output, error) = Run("solve", FourthScanner, "--format", "json");

        Assert.True(code == 0, error);
        using var json = JsonDocument.Parse(output);
        var names = json.RootElement.EnumerateObject().Select(property => property.Name).Take(2).ToArray();
        Assert.Equal(["network", "changes"], names);
        Assert.Equal(ScannerChanges, Changes(json));
    }

    [Theory]
    [MemberData(nameof(TableCommands))]
    public void Every_table_of_a_scenario_has_its_changes_on_the_line_under_the_title(string commandLine)
    {
        string[] command = commandLine.Split(' ');
        var (code, output, error) = Run([command[0], FourthScanner, .. command.Skip(1)]);

        Assert.True(code == 0, error);
        string[] lines = output.Split('\n');
        Assert.Contains("(scenario: Fourth scanner, faster lab)", lines[0], StringComparison.Ordinal);
        Assert.Equal(ScannerLine, lines[1]);
    }

    [Theory]
    [MemberData(nameof(TableCommands))]
    public void Every_json_document_of_a_scenario_carries_its_changes(string commandLine)
    {
        string[] command = commandLine.Split(' ');
        var (code, output, error) = Run([command[0], FourthScanner, "--format", "json", .. command.Skip(1)]);

        Assert.True(code == 0, error);
        using var json = JsonDocument.Parse(output);
        Assert.Equal(ScannerChanges, Changes(json));
    }

    [Fact]
    public void Set_changes_follow_the_scenario_files_changes_in_the_order_given()
    {
        var (code, output, error) = Run("solve", FourthScanner, "--set", "servers.lab+=2", "--set", "arrivals*=1.1");

        Assert.True(code == 0, error);

        // Exact by hand: the scenario's two changes, then "+2" servers in lab and every stream ×1.1 from --set.
        Assert.Equal(ScannerLine + "; lab: +2 servers; every arrival stream \u00D71.1", output.Split('\n')[1]);
    }

    [Fact]
    public void Set_changes_on_a_network_file_appear_in_json_and_under_the_title()
    {
        var table = Run("solve", Harbourside, "--set", "servers.imaging=5");
        var json = Run("solve", Harbourside, "--set", "servers.imaging=5", "--format", "json");

        Assert.Equal(0, table.ExitCode);
        Assert.Equal("changes: imaging: 5 servers", table.Out.Split('\n')[1]);
        using var document = JsonDocument.Parse(json.Out);
        Assert.Equal(["imaging: 5 servers"], Changes(document));
    }

    [Fact]
    public void A_network_as_written_has_no_changes_line_and_no_changes_in_json()
    {
        var table = Run("solve", Harbourside);
        var json = Run("solve", Harbourside, "--format", "json");

        Assert.Equal(0, table.ExitCode);
        Assert.Equal(string.Empty, table.Out.Split('\n')[1]);
        Assert.DoesNotContain("changes", table.Out, StringComparison.Ordinal);
        using var document = JsonDocument.Parse(json.Out);
        Assert.False(document.RootElement.TryGetProperty("changes", out _));
    }

    [Fact]
    public void Csv_rows_stay_plain_data_for_a_scenario()
    {
        var scenario = Run("solve", FourthScanner, "--format", "csv");
        var plain = Run("solve", Harbourside, "--format", "csv");

        Assert.Equal(0, scenario.ExitCode);
        Assert.Equal(plain.Out.Split('\n')[0], scenario.Out.Split('\n')[0]);
        Assert.DoesNotContain("changes", scenario.Out, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(".svg")]
    [InlineData(".dot")]
    public void The_map_of_a_scenario_has_its_changes_under_the_title(string extension)
    {
        string target = Path.Combine(Path.GetTempPath(), "netsolve-changes-" + Guid.NewGuid().ToString("N") + extension);
        try
        {
            var (code, _, error) = Run("map", FourthScanner, "-o", target);

            Assert.True(code == 0, error);
            string map = File.ReadAllText(target);
            Assert.Contains(extension == ".dot" ? "(rates per hour)\\n" + ScannerLine + "\"" : ">" + ScannerLine + "</text>", map, StringComparison.Ordinal);
        }
        finally
        {
            File.Delete(target);
        }
    }

    [Fact]
    public void The_map_of_a_network_as_written_has_no_changes_line()
    {
        string target = Path.Combine(Path.GetTempPath(), "netsolve-changes-" + Guid.NewGuid().ToString("N") + ".svg");
        try
        {
            Assert.Equal(0, Run("map", Harbourside, "-o", target).ExitCode);
            Assert.DoesNotContain("changes:", File.ReadAllText(target), StringComparison.Ordinal);
        }
        finally
        {
            File.Delete(target);
        }
    }

    private static string?[] Changes(JsonDocument json) =>
        [.. json.RootElement.GetProperty("changes").EnumerateArray().Select(change => change.GetString())];
}
