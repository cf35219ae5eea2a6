using System.Text.Json;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Presentation;

/// <summary><c>solve</c> for a network whose arrivals vary by hour: the by-hour table section, JSON block and CSV rows.</summary>
public sealed class ByHourOutputTests
{
    private static readonly string ClinicByHour = TestFiles.TestData("ByHour", "clinic-by-hour.yaml");
    private static readonly string ClinicFlatProfile = TestFiles.TestData("ByHour", "clinic-flat-profile.yaml");

    [Fact]
    public void Json_gives_every_unit_24_hours_equal_to_the_time_varying_solver()
    {
        var result = CliRun.Run("solve", ClinicByHour, "--format", "json");
        Assert.Equal(0, result.ExitCode);
        using var json = JsonDocument.Parse(result.Out);
        var network = TestNetworks.Parse(File.ReadAllText(ClinicByHour));
        var expected = TimeVaryingSolver.Solve(network);
        var units = json.RootElement.GetProperty("units").EnumerateArray().ToList();
        Assert.Equal(network.Units.Length, units.Count);
        for (int j = 0; j < units.Count; j++)
        {
            var block = units[j].GetProperty("by_hour");
            Assert.Equal(24, block.GetProperty("hours").GetInt32());
            foreach (string name in new[] { "arrival_rate_by_hour", "servers_by_hour", "utilisation_by_hour", "mean_queue_by_hour", "mean_wait_by_hour", "method_by_hour" })
            {
                Assert.Equal(24, block.GetProperty(name).GetArrayLength());
            }

            // The network's time unit is the hour, so the JSON carries Core's numbers unconverted.
            Assert.Equal(expected.Units[j].MeanQueueByHour, Numbers(block, "mean_queue_by_hour"));
            Assert.Equal(expected.Units[j].MeanWaitHoursByHour, Numbers(block, "mean_wait_by_hour"));
            Assert.Equal(expected.Traffic.Units[j].ArrivalsPerHourByHour, Numbers(block, "arrival_rate_by_hour"));
            Assert.All(block.GetProperty("method_by_hour").EnumerateArray(), method => Assert.Equal(expected.Units[j].Method, method.GetString()));
        }
    }

    [Fact]
    public void Without_an_arrival_profile_the_json_has_no_by_hour_block()
    {
        var result = CliRun.Run("solve", TestFiles.Network("kestrel-general"), "--format", "json");
        Assert.Equal(0, result.ExitCode);
        using var json = JsonDocument.Parse(result.Out);
        Assert.All(json.RootElement.GetProperty("units").EnumerateArray(), unit => Assert.False(unit.TryGetProperty("by_hour", out _)));
        Assert.DoesNotContain("hour by hour", CliRun.Run("solve", TestFiles.Network("kestrel-general")).Out, StringComparison.Ordinal);
    }

    [Fact]
    public void By_hour_on_a_network_without_a_profile_adds_hours_to_json_but_no_empty_section_to_the_table()
    {
        var table = CliRun.Run("solve", TestFiles.Network("millbrook-clinic"), "--by-hour");
        Assert.Equal(0, table.ExitCode);
        Assert.DoesNotContain("by hour below", table.Out, StringComparison.Ordinal);
        Assert.DoesNotContain("hour by hour", table.Out, StringComparison.Ordinal);

        using var json = JsonDocument.Parse(CliRun.Run("solve", TestFiles.Network("millbrook-clinic"), "--by-hour", "--format", "json").Out);
        Assert.All(json.RootElement.GetProperty("units").EnumerateArray(), unit => Assert.Equal(24, unit.GetProperty("by_hour").GetProperty("hours").GetInt32()));
    }

    [Fact]
    public void A_constant_profile_gives_the_steady_state_in_every_hour()
    {
        var result = CliRun.Run("solve", ClinicFlatProfile, "--format", "json");
        Assert.Equal(0, result.ExitCode);
        using var json = JsonDocument.Parse(result.Out);
        foreach (var unit in json.RootElement.GetProperty("units").EnumerateArray())
        {
            var block = unit.GetProperty("by_hour");

            // Exact by hand: with constant arrivals the time-varying traffic equations have the constant solution
            // m = λ/μ, and Erlang C at a constant load and servers is the steady-state M/M/c (docs/time-of-day.md).
            AssertAllClose(unit.GetProperty("arrival_rate").GetDouble(), Numbers(block, "arrival_rate_by_hour"));
            AssertAllClose(unit.GetProperty("utilisation").GetDouble(), Numbers(block, "utilisation_by_hour"));
            AssertAllClose(unit.GetProperty("mean_queue").GetDouble(), Numbers(block, "mean_queue_by_hour"));
            AssertAllClose(unit.GetProperty("mean_wait").GetDouble(), Numbers(block, "mean_wait_by_hour"));
        }
    }

    [Fact]
    public void Larkspur_table_shows_the_daily_average_then_the_hours_of_its_worst_units()
    {
        var result = CliRun.Run("solve", TestFiles.Network("larkspur-simulation"));
        Assert.Equal(0, result.ExitCode);
        Assert.Contains("steady state at the daily average arrivals, by hour below", result.Out, StringComparison.Ordinal);
        Assert.Contains("\nhour by hour (arrival_profile;", result.Out, StringComparison.Ordinal);
        Assert.Contains("\nemergency by hour, the day of its worst hour", result.Out, StringComparison.Ordinal);
        Assert.DoesNotContain("arrival_profile is ignored", result.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Csv_with_by_hour_writes_one_row_per_unit_and_hour_and_without_it_one_per_unit()
    {
        var byHour = CliRun.Run("solve", ClinicByHour, "--format", "csv", "--by-hour");
        Assert.Equal(0, byHour.ExitCode);
        var lines = byHour.Out.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal("id,hour,arrival_rate,servers,utilisation,mean_queue,mean_wait,method", lines[0]);
        Assert.Equal(1 + (3 * 24), lines.Length);
        Assert.StartsWith("reception,00-01,", lines[1], StringComparison.Ordinal);

        var perUnit = CliRun.Run("solve", ClinicByHour, "--format", "csv");
        Assert.Equal(1 + 3, perUnit.Out.Split('\n', StringSplitOptions.RemoveEmptyEntries).Length);
    }

    private static double[] Numbers(JsonElement block, string name) =>
        [.. block.GetProperty(name).EnumerateArray().Select(value => value.GetDouble())];

    private static void AssertAllClose(double expected, IEnumerable<double> actual) =>
        Assert.All(actual, value => Assert.Equal(expected, value, 1e-9 * Math.Max(1.0, Math.Abs(expected))));
}
