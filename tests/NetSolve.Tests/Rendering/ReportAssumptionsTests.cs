using System.Net;
using NetSolve.Rendering.Report;

namespace NetSolve.Tests.Rendering;

public sealed class ReportAssumptionsTests
{
    private static string Assumptions(string html)
    {
        int start = html.IndexOf("<section id=\"assumptions\">", StringComparison.Ordinal);
        return WebUtility.HtmlDecode(html[start..html.IndexOf("</section>", start, StringComparison.Ordinal)]);
    }

    [Fact]
    public void The_larkspur_report_names_each_units_method_and_the_bed_limit_treatment()
    {
        // Source: networks/larkspur-simulation.yaml (capacities on emergency and ward, a diversion, a group, a profile)
        // and the methods the solver reports for its units (UnitResult.Method).
        var solution = RenderingFixtures.Solved("larkspur-simulation");
        string section = Assumptions(HtmlReport.Write(solution));
        foreach (var method in solution.Units.GroupBy(unit => unit.Method, StringComparer.Ordinal))
        {
            Assert.Contains($"Method {method.Key}: {string.Join(", ", method.Select(unit => unit.Unit.Id))}.", section, StringComparison.Ordinal);
        }

        Assert.Contains(ReportAssumptions.BedLimits, section, StringComparison.Ordinal);
        Assert.Contains(ReportAssumptions.DivertedBursts, section, StringComparison.Ordinal);
        Assert.Contains("emergency (capacity 30, diverts to urgent_care)", section, StringComparison.Ordinal);
        Assert.Contains("ward (capacity 240, turns away)", section, StringComparison.Ordinal);
        Assert.Contains(ReportAssumptions.Variability, section, StringComparison.Ordinal);
        Assert.Contains(ReportAssumptions.Groups + " Groups: frail_elderly.", section, StringComparison.Ordinal);
        Assert.Contains(ReportAssumptions.ProfileReplacedByMean, section, StringComparison.Ordinal);
        Assert.Contains("M/M/c/K", section, StringComparison.Ordinal);
        Assert.Contains("Erlang B", section, StringComparison.Ordinal);
        Assert.Contains("planning estimates under stated assumptions; decisions follow local clinical governance and safe-staffing rules", section, StringComparison.Ordinal);
    }

    [Fact]
    public void A_network_without_capacities_groups_or_profile_says_so()
    {
        string section = Assumptions(HtmlReport.Write(RenderingFixtures.Solved("harbourside")));
        Assert.Contains("No bed limits", section, StringComparison.Ordinal);
        Assert.Contains(ReportAssumptions.SteadyState, section, StringComparison.Ordinal);
        Assert.DoesNotContain(ReportAssumptions.Groups, section, StringComparison.Ordinal);
        Assert.DoesNotContain(ReportAssumptions.BedLimits, section, StringComparison.Ordinal);
        Assert.DoesNotContain(ReportAssumptions.DivertedBursts, section, StringComparison.Ordinal);
    }
}
