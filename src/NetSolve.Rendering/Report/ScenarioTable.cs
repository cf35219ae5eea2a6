using System.Text;
using NetSolve.Model;
using NetSolve.Presentation;
using NetSolve.Solving;
using static System.Net.WebUtility;

namespace NetSolve.Rendering.Report;

/// <summary>The report's scenario comparison: one overview row per solution, then each unit's status, utilisation and wait side by side.</summary>
internal static class ScenarioTable
{
    public static void Append(StringBuilder html, NetworkSolution baseline, IReadOnlyList<ReportScenario> scenarios)
    {
        var all = new List<ReportScenario> { new("Baseline: " + baseline.Network.Name, baseline) };
        all.AddRange(scenarios);

        html.Append("<section id=\"scenarios\">\n<h2>Scenario comparison</h2>\n<p>Each scenario is solved on its own; times in its own file's time unit.</p>\n")
            .Append("<table id=\"scenario-table\">\n<thead><tr><th>Scenario</th><th>Every unit stable</th><th>Saturates first</th><th>Headroom (\u00D7)</th><th>Mean time in hospital</th></tr></thead>\n<tbody>\n");
        foreach (var scenario in all)
        {
            var solution = scenario.Solution;
            var first = solution.Units.Where(u => u.Status == UnitStatus.Bottleneck).ToList();
            html.Append("<tr><td>").Append(HtmlEncode(scenario.Name)).Append("</td>")
                .Append(HtmlReport.Cell(solution.IsStable ? "yes" : "no"))
                .Append(HtmlReport.Cell(first.Count == 0 ? Numbers.Missing : string.Join(", ", first.Select(u => u.Unit.Label))))
                .Append(HtmlReport.Cell(first.Count == 0 ? Numbers.Missing : Numbers.Fixed(first[0].Headroom, 3)))
                .Append(HtmlReport.Cell(solution.Totals.MeanTimeInSystemHours is double hours ? Units.Time(hours, solution.Network.TimeUnit) : "unbounded"))
                .Append("</tr>\n");
        }

        html.Append("</tbody>\n</table>\n");

        var ids = all.SelectMany(s => s.Solution.Units.Select(u => u.Unit.Id)).Distinct(StringComparer.Ordinal).ToList();
        html.Append("<table id=\"scenario-units\">\n<thead><tr><th>Unit</th>");
        foreach (var scenario in all)
        {
            html.Append("<th>").Append(HtmlEncode(scenario.Name)).Append("</th>");
        }

        html.Append("</tr></thead>\n<tbody>\n");
        foreach (string id in ids)
        {
            html.Append("<tr><td>").Append(HtmlEncode(id)).Append("</td>");
            foreach (var scenario in all)
            {
                var result = scenario.Solution.Units.FirstOrDefault(u => u.Unit.Id == id);
                html.Append(result is null ? HtmlReport.Cell("not in this scenario") : HtmlReport.Cell(Summary(result, scenario.Solution.Network.TimeUnit)));
            }

            html.Append("</tr>\n");
        }

        html.Append("</tbody>\n</table>\n</section>\n");
    }

    private static string Summary(UnitResult result, TimeUnit timeUnit)
    {
        var style = Map.HarbourLightsPalette.For(result.Status);
        string busy = result.Unit.Servers.IsUnlimited ? "unlimited" : Invariant.Percent(result.Utilisation) + " busy";
        string wait = result.MeanWaitHours is double hours ? "wait " + Units.Time(hours, timeUnit) : "wait unbounded";
        return style.Glyph + " " + style.Word + ", " + busy + ", " + wait;
    }
}
