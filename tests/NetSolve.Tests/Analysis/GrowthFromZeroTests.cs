using System.Text.Json;
using static NetSolve.Tests.Support.CliRun;
using static NetSolve.Tests.Support.TestFiles;

namespace NetSolve.Tests.Analysis;

/// <summary>Growth from a factor of 0: nobody arrives, so the mean time in the network does not exist.</summary>
public sealed class GrowthFromZeroTests
{
    // Source: docs/network-file.md, totals.mean_time_in_system: null when no patient arrives. Exact by hand: with no
    // arrivals every unit is empty, so every utilisation is 0.
    [Theory]
    [InlineData("harbourside")]
    [InlineData("kestrel-general")]
    public void The_first_step_at_zero_demand_has_no_mean_time_in_network_and_the_json_is_written(string network)
    {
        var (code, output, _) = Run("growth", Network(network), "--from", "0", "--format", "json");

        Assert.Equal(0, code);
        var first = JsonDocument.Parse(output).RootElement.GetProperty("steps")[0];
        Assert.Equal(0.0, first.GetProperty("factor").GetDouble());
        Assert.Equal(JsonValueKind.Null, first.GetProperty("mean_time_in_system").ValueKind);
        Assert.Equal(0.0, first.GetProperty("external_arrival_rate").GetDouble());
        Assert.All(first.GetProperty("units").EnumerateArray(), unit => Assert.Equal(0.0, unit.GetProperty("utilisation").GetDouble()));
    }

    // Exact by hand (networks/fenwick-winter-surge.yaml): the medical ward is unstable from the other streams alone,
    // so growing the assessment stream saturates it from a factor of 0, never from a negative one
    // (SaturationPoint: "0 for a unit unstable at every factor").
    [Fact]
    public void A_unit_saturated_by_the_other_streams_saturates_from_a_factor_of_0_not_below()
    {
        var (code, output, _) = Run("growth", Network("fenwick-winter-surge"), "--stream", "assessment", "--format", "json");

        Assert.Equal(0, code);
        var points = JsonDocument.Parse(output).RootElement.GetProperty("saturation_order").EnumerateArray().ToList();
        Assert.NotEmpty(points);
        Assert.All(points, point => Assert.True(point.GetProperty("saturation_factor").GetDouble() >= 0.0));
        Assert.All(points, point => Assert.True(point.GetProperty("strain_factor").GetDouble() >= 0.0));
        Assert.Equal(0.0, points.Single(point => point.GetProperty("unit").GetString() == "medical_ward").GetProperty("saturation_factor").GetDouble());
    }
}
