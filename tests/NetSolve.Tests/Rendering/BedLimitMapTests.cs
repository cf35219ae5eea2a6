using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Presentation.Solution;
using NetSolve.Rendering.Map;
using NetSolve.Solving;

namespace NetSolve.Tests.Rendering;

public sealed class BedLimitMapTests
{
    // larkspur-simulation.yaml: emergency (capacity 30) diverts to urgent_care when full; ward (capacity 240) turns away.
    private static NetworkSolution Larkspur() => RenderingFixtures.Solved("larkspur-simulation");

    private static string Suffix(NetworkSolution solution) => "/" + TimeConstants.Suffix(solution.Network.TimeUnit);

    private static string Table(UnitResult result, Column<UnitResult> column, TimeUnit timeUnit) =>
        PeopleFormat.Cell(column.Read(result), timeUnit);

    [Theory]
    [InlineData(MapDirection.TopToBottom)]
    [InlineData(MapDirection.LeftToRight)]
    public void The_ward_has_a_turned_away_stub_labelled_with_the_tables_rate(MapDirection direction)
    {
        var solution = Larkspur();
        var ward = solution.Units.Single(unit => unit.Unit.Id == "ward");
        // Exact by hand: the ward turns away (when_full: turn_away), so its turned-away rate is P(full) × offered > 0.
        Assert.True(ward.TurnedAwayPerHour > 0.0);
        string expected = "turned away " + Table(ward, UnitColumns.TurnedAwayRate, solution.Network.TimeUnit) + Suffix(solution);

        var map = SvgMap.Parse(SvgMapWriter.WriteString(MapLayoutBuilder.Build(solution, direction)));
        var box = map.Unit("ward");
        Assert.Contains(("stub turned-away", expected), box.Stubs);
        Assert.Contains(box.Texts, line => line.Text == expected);
        Assert.Contains(box.Texts, line => line.Text == "P(full) " + PeopleFormat.Percent(ward.PFull));
    }

    [Fact]
    public void The_emergency_department_has_a_dashed_diversion_line_to_urgent_care_labelled_with_the_tables_rate()
    {
        var solution = Larkspur();
        var emergency = solution.Units.Single(unit => unit.Unit.Id == "emergency");
        Assert.True(emergency.DivertedPerHour > 0.0);
        string expected = "diverted " + Table(emergency, UnitColumns.DivertedRate, solution.Network.TimeUnit) + Suffix(solution);

        string svg = SvgMapWriter.WriteString(MapLayoutBuilder.Build(solution));
        var flow = Assert.Single(SvgMap.Parse(svg).Flows, flow => flow.Kind == "diversion");
        Assert.Equal(("emergency", "urgent_care"), (flow.From, flow.To));
        Assert.True(flow.IsDashed);
        Assert.Equal(expected, flow.Rate);
        Assert.Contains(">" + expected + "</text>", svg, StringComparison.Ordinal);
        Assert.Contains("diverted when full", svg, StringComparison.Ordinal);
        // The emergency department diverts rather than turns away: no turned-away stub there.
        Assert.DoesNotContain(SvgMap.Parse(svg).Unit("emergency").Stubs, stub => stub.Class == "stub turned-away");
    }

    [Fact]
    public void A_network_without_capacities_draws_no_bed_limit_marks()
    {
        string svg = SvgMapWriter.WriteString(MapLayoutBuilder.Build(RenderingFixtures.Solved("harbourside")));
        Assert.DoesNotContain("turned-away", svg, StringComparison.Ordinal);
        Assert.DoesNotContain("diversion", svg, StringComparison.Ordinal);
        Assert.DoesNotContain("P(full)", svg, StringComparison.Ordinal);
    }
}
