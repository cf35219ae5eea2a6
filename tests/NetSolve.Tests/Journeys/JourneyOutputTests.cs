using System.Text.Json;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Journeys;

public sealed class JourneyOutputTests
{
    private static readonly string Kestrel = TestFiles.Network("kestrel-general");

    [Fact]
    public void Solve_json_gives_each_journey_its_units_figures_and_shares_over_each_time()
    {
        var (code, output, _) = CliRun.Run("solve", Kestrel, "--format", "json");

        Assert.Equal(0, code);
        var journey = JsonDocument.Parse(output).RootElement.GetProperty("journeys")[0];
        Assert.Equal("emergency_stay", journey.GetProperty("journey").GetString());
        Assert.Equal(JsonValueKind.Null, journey.GetProperty("group").ValueKind);
        Assert.Equal("emergency,imaging,lab", string.Join(',', journey.GetProperty("units").EnumerateArray().Select(e => e.GetString())));
        var over = journey.GetProperty("over");
        Assert.Equal(4.0, over[0].GetProperty("time").GetDouble());
        double share = over[0].GetProperty("probability").GetDouble();
        Assert.InRange(share, 0.0, 1.0);
        Assert.True(journey.GetProperty("p50").GetDouble() < journey.GetProperty("p90").GetDouble());
    }

    [Fact]
    public void Solve_without_journeys_writes_no_journeys_section()
    {
        var (code, output, _) = CliRun.Run("solve", TestFiles.Network("harbourside"), "--format", "json");

        Assert.Equal(0, code);
        Assert.False(JsonDocument.Parse(output).RootElement.TryGetProperty("journeys", out _));
    }

    [Fact]
    public void A_journey_naming_an_unknown_unit_is_one_located_line_and_exit_code_1()
    {
        string file = Path.Combine(Path.GetTempPath(), "netsolve-journey-" + Guid.NewGuid().ToString("N") + ".yaml");
        File.WriteAllText(file, "units:\n  emergency: { servers: 4, service: 1h }\narrivals:\n  emergency: 2\njourneys:\n  stay: { units: [emergncy] }\n");
        try
        {
            var (code, _, error) = CliRun.Run("solve", file);

            Assert.Equal(1, code);
            Assert.Contains(":6:19: journeys.stay.units: unknown unit 'emergncy'; did you mean 'emergency'?", error, StringComparison.Ordinal);
            Assert.DoesNotContain("   at ", error, StringComparison.Ordinal);
        }
        finally
        {
            File.Delete(file);
        }
    }
}
