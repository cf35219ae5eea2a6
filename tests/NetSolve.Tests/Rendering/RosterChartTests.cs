using System.Xml.Linq;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Rendering.Staffing;

namespace NetSolve.Tests.Rendering;

public sealed class RosterChartTests
{
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    private static readonly StaffingTargets TenMinutes = new(MaxMeanWaitHours: 10.0 / 60.0);

    private static (HourlyStaffingPlan Plan, Network Network) Wrenfield()
    {
        var network = RenderingFixtures.Example("wrenfield-emergency-roster");
        var plan = HourlyStaffingSearch.Find(network, TenMinutes, HourlyStaffingOptions.Default with { Simulate = false, ExactChain = false }, out var impossible);
        Assert.Null(impossible);
        return (plan!, network);
    }

    [Fact]
    public void Every_unit_gets_three_lines_demand_roster_and_flat_staffing_in_its_own_colour()
    {
        var (plan, network) = Wrenfield();

        var series = RosterChart.Series(plan, network);

        Assert.Equal(3 * plan.Units.Length, series.Count);
        for (int i = 0; i < plan.Units.Length; i++)
        {
            Assert.Equal(
                [RosterChartQuantity.Demand, RosterChartQuantity.Roster, RosterChartQuantity.Flat],
                series.Where(line => line.UnitIndex == i).Select(line => line.Quantity));
        }
    }

    // Exact by hand: 24 hours of demand at the middles 0.5 to 23.5; the roster's steps start at 0, 1, ..., 23 and the
    // last is held to 24; the flat staffing is one level from 0 to 24.
    [Fact]
    public void The_lines_run_over_hours_0_to_23_with_the_roster_as_steps_on_the_hour()
    {
        var (plan, network) = Wrenfield();
        var clinicians = plan.Units.Single(unit => unit.UnitId == "clinicians");

        var series = RosterChart.Series(plan, network).Where(line => line.UnitIndex == plan.Units.IndexOf(clinicians)).ToList();

        var demand = series.Single(line => line.Quantity == RosterChartQuantity.Demand);
        Assert.Equal(Enumerable.Range(0, 24).Select(hour => hour + 0.5), demand.Hours);
        Assert.Equal(clinicians.OfferedLoadByHour, demand.Values);
        var roster = series.Single(line => line.Quantity == RosterChartQuantity.Roster);
        Assert.Equal(Enumerable.Range(0, 25).Select(hour => (double)hour), roster.Hours);
        Assert.Equal([.. clinicians.ServersByHour.Select(servers => (double)servers), clinicians.ServersByHour[23]], roster.Values);
        var flat = series.Single(line => line.Quantity == RosterChartQuantity.Flat);
        Assert.Equal([0.0, 24.0], flat.Hours);
        Assert.Equal([clinicians.FlatServers, clinicians.FlatServers], flat.Values);
        Assert.Contains("Emergency clinicians", flat.Legend, StringComparison.Ordinal);
    }

    [Fact]
    public void The_svg_is_xml_with_a_legend_entry_per_line_hour_labels_and_a_title_naming_network_and_target()
    {
        var (plan, network) = Wrenfield();

        var chart = XDocument.Parse(RosterChart.Svg(plan, network)!);

        var texts = chart.Descendants(Svg + "text").Select(text => text.Value.Trim()).ToList();
        Assert.All(RosterChart.Series(plan, network), line => Assert.Single(texts, text => text == line.Legend));
        Assert.Equal(
            ["00:00", "03:00", "06:00", "09:00", "12:00", "15:00", "18:00", "21:00"],
            texts.Where(text => text.EndsWith(":00", StringComparison.Ordinal)).Order(StringComparer.Ordinal),
            StringComparer.Ordinal);
        string title = string.Join(" ", texts);
        Assert.Contains("Wrenfield emergency department", title, StringComparison.Ordinal);
        Assert.Contains("mean wait <= 10.00 min", title, StringComparison.Ordinal);
        Assert.Equal("0 0 720 520", (string?)chart.Root!.Attribute("viewBox"));
    }

    [Fact]
    public void The_chart_leaves_out_units_with_unlimited_servers_and_is_absent_when_none_is_left()
    {
        var network = NetworkReader(
            """
            units:
              waiting_room:
                servers: unlimited
                service: 20min
            arrivals:
              waiting_room: 3/h
            """);
        var plan = HourlyStaffingSearch.Find(network, TenMinutes, HourlyStaffingOptions.Default with { Simulate = false, ExactChain = false }, out _);

        Assert.Empty(RosterChart.Series(plan!, network));
        Assert.Null(RosterChart.Svg(plan!, network));
        Assert.Null(RosterChart.Png(plan!, network));
    }

    // Source: PNG specification (ISO/IEC 15948), section 5.2, the eight-byte signature.
    [Fact]
    public void The_png_has_the_png_signature()
    {
        var (plan, network) = Wrenfield();

        byte[] png = RosterChart.Png(plan, network)!;

        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A }, png[..8]);
    }

    private static Network NetworkReader(string text) => NetSolve.Parsing.NetworkReader.ReadText(text, "unlimited.yaml").Network!;
}
