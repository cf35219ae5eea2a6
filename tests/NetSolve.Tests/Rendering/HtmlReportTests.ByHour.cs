using NetSolve.Presentation.ByHour;
using NetSolve.Rendering.Report;
using NetSolve.Solving;

namespace NetSolve.Tests.Rendering;

/// <summary>The report's hour-by-hour section, from the time-varying formulas.</summary>
public partial class HtmlReportTests
{
    // Exact by hand: the section repeats the formulas' own peak and worst hour of each unit that varies by hour
    // (ByHourUnit, the values solve shows), so each row must name them.
    [Fact]
    public void With_an_arrival_profile_the_report_shows_each_units_peak_and_worst_hour_and_a_chart_from_the_formulas()
    {
        var solution = HourByHour.AddWhenArrivalsVary(RenderingFixtures.Solved("larkspur-simulation"));

        string html = HtmlReport.Write(solution);

        int section = html.IndexOf("<section id=\"hour-by-hour\">", StringComparison.Ordinal);
        Assert.True(section > 0 && section < html.IndexOf("<section id=\"assumptions\">", StringComparison.Ordinal));
        Assert.Contains("<figure id=\"hour-by-hour-figure\">", html, StringComparison.Ordinal);
        var varying = ByHourUnit.All(solution).Where(unit => unit.Varies).ToList();
        Assert.NotEmpty(varying);
        foreach (var unit in varying)
        {
            int row = html.IndexOf("<tr data-unit=\"" + unit.UnitId + "\"", section, StringComparison.Ordinal);
            Assert.True(row > 0, unit.UnitId);
            string cells = html[row..html.IndexOf("</tr>", row, StringComparison.Ordinal)];
            Assert.Contains(ByHourColumns.HourName(unit.PeakHour, unit.CycleHours), cells, StringComparison.Ordinal);
            Assert.Contains(ByHourColumns.HourName(unit.WorstHour!.Value, unit.CycleHours), cells, StringComparison.Ordinal);
            Assert.Contains(System.Net.WebUtility.HtmlEncode(unit.Waits.Method), cells, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Without_an_arrival_profile_the_report_has_no_hour_by_hour_section()
    {
        var solution = HourByHour.AddWhenArrivalsVary(RenderingFixtures.Solved("harbourside"));

        Assert.DoesNotContain("id=\"hour-by-hour\"", HtmlReport.Write(solution), StringComparison.Ordinal);
    }
}
