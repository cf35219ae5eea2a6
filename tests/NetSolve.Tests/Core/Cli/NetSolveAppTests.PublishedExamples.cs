using System.Text.Json;
using NetSolve.Model;
using NetSolve.Tests.Support;
using static NetSolve.Tests.Support.CliRun;

namespace NetSolve.Tests.Core.Cli;

/// <summary>
/// Published worked examples run end to end: a network file written to a temporary folder, then <c>solve</c> or
/// <c>staff</c> with JSON output. docs/reference-values.md lists the sources.
/// </summary>
public partial class NetSolveAppTests
{
    // Source: "Erlang C" calculator help page, worked example; personal.telefonica.terra.es/web/vr/erlang/eng/mcerlc.htm
    // (the page names no author). Published: 600 calls an hour of 120 s, "a traffic of 20 erlangs"; for a delay
    // probability of at most 15% "the number of circuits needed are 26"; average delay "3 seconds per call"; with 30
    // circuits "delay is reduced to 2.5%". Times in the JSON are in the file's time unit, here minutes.
    private const string ErlangCExample = """
        name: Published Erlang C example
        time_unit: minute
        units:
          agents:
            servers: 26
            service: 120s
        arrivals:
          agents: 600/h
        """;


    [Fact]
    public void Solve_gives_the_published_Erlang_C_example_for_26_25_and_30_servers()
    {
        using var folder = new TemporaryFolder();
        string path = folder.Write("erlang-c-example.yaml", ErlangCExample);

        var agents = SolveUnit(path);
        var fewer = SolveUnit(path, "--set", "servers.agents=25");
        var more = SolveUnit(path, "--set", "servers.agents=30");

        Assert.Equal(20.0, agents.GetProperty("offered_load").GetDouble(), 1e-9);
        Assert.True(agents.GetProperty("p_wait").GetDouble() <= 0.15, agents.ToString());
        Assert.True(fewer.GetProperty("p_wait").GetDouble() > 0.15, fewer.ToString());
        Assert.InRange(agents.GetProperty("mean_wait").GetDouble() * TimeConstants.SecondsPerHour / TimeConstants.MinutesPerHour, 2.5, 3.5);
        Assert.Equal(0.025, more.GetProperty("p_wait").GetDouble(), 0.0005);
    }

    [Fact]
    public void Staff_finds_the_26_servers_of_the_published_Erlang_C_example()
    {
        using var folder = new TemporaryFolder();
        string path = folder.Write("erlang-c-example.yaml", ErlangCExample);

        var (exitCode, output, error) = Run("staff", path, "--set", "servers.agents=21", "--wait-over", "0", "--at-most", "15%", "--format", "json");

        Assert.True(exitCode == 0, error);
        using var json = JsonDocument.Parse(output);
        var agents = json.RootElement.GetProperty("units")[0];
        Assert.Equal(26, agents.GetProperty("required").GetInt32());
    }

    [Fact]
    public void Solve_gives_the_published_cycle_time_of_a_rework_loop()
    {
        using var folder = new TemporaryFolder();
        string path = folder.Write("rework-example.yaml", PublishedNetworks.ReworkLoop);

        var (exitCode, output, error) = Run("solve", path, "--format", "json");

        Assert.True(exitCode == 0, error);
        using var json = JsonDocument.Parse(output);
        Assert.Equal(2.81, json.RootElement.GetProperty("totals").GetProperty("mean_time_in_system").GetDouble(), 0.005);
        double[] flows = [.. json.RootElement.GetProperty("units").EnumerateArray().Select(unit => unit.GetProperty("arrival_rate").GetDouble())];
        Assert.Equal([1.25, 0.25, 1.0], flows, (expected, actual) => Math.Abs(expected - actual) <= 1e-9);
    }

    private static JsonElement SolveUnit(string path, params string[] options)
    {
        var (exitCode, output, error) = Run(["solve", path, "--format", "json", .. options]);
        Assert.True(exitCode == 0, error);
        using var json = JsonDocument.Parse(output);
        return json.RootElement.GetProperty("units")[0].Clone();
    }

    /// <summary>A folder under the system temporary folder, removed with everything in it when disposed.</summary>
    private sealed class TemporaryFolder : IDisposable
    {
        private readonly DirectoryInfo _directory = Directory.CreateTempSubdirectory("netsolve-published-");

        public string Write(string fileName, string text)
        {
            string path = Path.Combine(_directory.FullName, fileName);
            File.WriteAllText(path, text);
            return path;
        }

        public void Dispose() => _directory.Delete(recursive: true);
    }
}
