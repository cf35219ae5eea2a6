using NetSolve.Parsing;

namespace NetSolve.Tests.Journeys;

public sealed class JourneyParsingTests
{
    private const string Units = """
        units:
          emergency: { servers: 10, service: 90min }
          lab: { servers: 4, service: 40min }
          ward: { servers: 50, service: 2d }
        arrivals:
          emergency: 5
        routes:
          emergency: { lab: 0.4, ward: 0.2 }
          lab: { emergency: 0.9 }

        """;

    [Fact]
    public void A_journey_keeps_its_units_in_order_and_its_times_in_hours()
    {
        var result = NetworkReader.ReadText(Units + """
            journeys:
              emergency_stay:
                label: Emergency stay
                units: [emergency, lab]
                over: [4h, 720min]
            """, "net.yaml");

        Assert.False(result.HasErrors, string.Join("\n", result.Diagnostics));
        var journey = Assert.Single(result.Network!.Journeys);
        Assert.Equal("emergency_stay", journey.Id);
        Assert.Equal("Emergency stay", journey.Label);
        Assert.Equal(["emergency", "lab"], journey.UnitIds);
        Assert.Equal([4.0, 12.0], journey.OverHours);
    }

    [Fact]
    public void A_journey_without_a_label_or_times_is_named_by_its_id_and_has_no_times()
    {
        var result = NetworkReader.ReadText(Units + "journeys:\n  stay: { units: [ward] }\n", "net.yaml");

        var journey = Assert.Single(result.Network!.Journeys);
        Assert.Equal("stay", journey.Label);
        Assert.Empty(journey.OverHours);
    }

    [Fact]
    public void A_network_without_journeys_has_none()
    {
        Assert.Empty(NetworkReader.ReadText(Units, "net.yaml").Network!.Journeys);
    }

    [Theory]
    [InlineData("  stay: { units: [emergncy] }", "net.yaml:11:19: journeys.stay.units: unknown unit 'emergncy'; did you mean 'emergency'?")]
    [InlineData("  stay: { units: [] }", "net.yaml:11:18: journeys.stay.units is empty: a journey covers at least one unit")]
    [InlineData("  stay: { units: [lab, lab] }", "net.yaml:11:24: journeys.stay.units: unit 'lab' is listed twice")]
    [InlineData("  stay: { units: [lab], over: [4 hours] }", "net.yaml:11:32: journeys.stay.over: '4 hours' is not a duration")]
    [InlineData("  stay: { units: [lab], over: [0h] }", "net.yaml:11:32: journeys.stay.over: '0h' is not a positive duration")]
    [InlineData("  stay: { over: [4h] }", "net.yaml:11:9: journeys.stay: missing 'units'")]
    [InlineData("  stay: { units: lab }", "net.yaml:11:18: journeys.stay.units must be a list of unit ids")]
    [InlineData("  stay: { units: [lab], ovr: [4h] }", "net.yaml:11:25: unknown key 'ovr'; did you mean 'over'?")]
    [InlineData("  stay: { units: [lab] }\n  stay: { units: [ward] }", "net.yaml:12:3: duplicate key 'stay' (first at line 11)")]
    public void A_mistake_in_a_journey_is_reported_at_its_line_and_column(string journeys, string expected)
    {
        var result = NetworkReader.ReadText(Units + "journeys:\n" + journeys + "\n", "net.yaml");

        Assert.Null(result.Network);
        Assert.Contains(result.Diagnostics, d => d.IsError && d.ToString().StartsWith(expected, StringComparison.Ordinal));
    }
}
