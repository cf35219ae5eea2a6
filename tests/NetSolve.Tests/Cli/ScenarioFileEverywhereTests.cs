using static NetSolve.Tests.Support.CliRun;
using System.Text.Json;

namespace NetSolve.Tests.Cli;

/// <summary>Every command that works on one network takes a scenario file as FILE: its base network with its changes.</summary>
public sealed class ScenarioFileEverywhereTests
{
    private static readonly string Harbourside = Path.Combine(AppContext.BaseDirectory, "networks", "harbourside.yaml");

    private static readonly string WinterBeds = Path.Combine(AppContext.BaseDirectory, "networks", "scenarios", "harbourside-winter-beds.yaml");

    // Source: networks/scenarios/harbourside-winter-beds.yaml: "arrivals: emergency: x1.1" and "servers: ward: 320",
    // written the --set way (docs/what-if.md).
    private static readonly string[] SameChanges = ["--set", "arrivals.emergency*=1.1", "--set", "servers.ward=320"];

    public static TheoryData<string[]> Commands()
    {
        string output = Path.Combine(Path.GetTempPath(), "netsolve-scenario-" + Guid.NewGuid().ToString("N"));
        return new TheoryData<string[]>
        {
            new[] { "check", WinterBeds },
            new[] { "solve", WinterBeds },
            new[] { "growth", WinterBeds },
            new[] { "staff", WinterBeds, "--max-util", "0.9" },
            new[] { "pathway", WinterBeds, "--from", "emergency" },
            new[] { "simulate", WinterBeds, "-r", "2", "--duration", "2d", "--warmup", "0" },
            new[] { "map", WinterBeds, "-o", output + ".svg" },
            new[] { "report", WinterBeds, "-o", output + ".html" },
        };
    }

    [Fact]
    public void Solving_the_scenario_gives_the_numbers_of_the_base_with_the_same_changes_set()
    {
        var scenario = Run("solve", WinterBeds, "--format", "json");
        var changed = Run(["solve", Harbourside, "--format", "json", .. SameChanges]);

        Assert.Equal(0, scenario.ExitCode);
        Assert.Equal(0, changed.ExitCode);
        using var fromScenario = JsonDocument.Parse(scenario.Out);
        using var fromSet = JsonDocument.Parse(changed.Out);
        Assert.Equal(Numbers(fromSet), Numbers(fromScenario));
        Assert.Equal(
            "Harbourside Community Hospital, acute pathway (scenario: Winter escalation beds)",
            fromScenario.RootElement.GetProperty("network").GetString());
    }

    [Fact]
    public void The_scenarios_changed_unit_shows_its_changed_servers()
    {
        var (code, output, _) = Run("solve", WinterBeds, "--format", "csv");

        Assert.Equal(0, code);
        string ward = output.Split('\n').Single(line => line.StartsWith("ward,", StringComparison.Ordinal));
        Assert.StartsWith("ward,Medical ward,320,", ward, StringComparison.Ordinal);
    }

    [Theory]
    [MemberData(nameof(Commands))]
    public void Every_network_command_takes_a_scenario_file(string[] args)
    {
        var (code, output, error) = Run(args);
        string? target = args.SkipWhile(arg => arg != "-o").Skip(1).FirstOrDefault();
        try
        {
            Assert.True(code == 0, error);
            string shown = target is null ? output : File.ReadAllText(target);
            if (args[0] == "check")
            {
                Assert.Equal($"{WinterBeds}: valid: 5 units, 2 arrival streams, 7 routes\n", output);
            }
            else
            {
                // Common practice: a what-if result says it is one; the scenario travels in the network's name.
                Assert.Contains("scenario: Winter escalation beds", shown, StringComparison.Ordinal);
            }
        }
        finally
        {
            if (target is not null)
            {
                File.Delete(target);
            }
        }
    }

    [Fact]
    public void A_scenario_file_takes_set_changes_on_top_of_its_own()
    {
        var (code, output, _) = Run("solve", WinterBeds, "--set", "servers.ward=330", "--format", "csv");

        Assert.Equal(0, code);
        Assert.Contains("\nward,Medical ward,330,", output, StringComparison.Ordinal);
    }

    [Fact]
    public void A_broken_scenario_file_is_one_located_line_per_problem_and_exit_1()
    {
        string path = Path.Combine(Path.GetTempPath(), $"netsolve-scenario-{Guid.NewGuid():N}.yaml");
        File.WriteAllText(path, $"scenario: Broken\nbase: {Harbourside}\nservers:\n  wrd: 320\n");
        try
        {
            var (code, output, error) = Run("solve", path);

            Assert.Equal(1, code);
            Assert.Empty(output);
            Assert.StartsWith($"{path}:4:3: ", error.Split('\n', StringSplitOptions.RemoveEmptyEntries).Last(), StringComparison.Ordinal);
            Assert.Contains("'wrd'", error, StringComparison.Ordinal);
        }
        finally
        {
            File.Delete(path);
        }
    }

    private static List<string> Numbers(JsonDocument document) =>
        [.. document.RootElement.GetProperty("units").EnumerateArray().Select(unit => unit.ToString()), document.RootElement.GetProperty("totals").ToString()];

}
