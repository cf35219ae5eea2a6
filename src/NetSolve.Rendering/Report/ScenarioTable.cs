using System.Text;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Solution;
using NetSolve.Rendering.Map;
using NetSolve.Solving;
using static NetSolve.Rendering.Report.ReportText;

namespace NetSolve.Rendering.Report;

/// <summary>The report's scenario comparison: one overview row per solution, then each unit's status, utilisation and wait side by side.</summary>
internal static class ScenarioTable
{
    public static void Append(StringBuilder html, NetworkSolution baseline, IReadOnlyList<ReportScenario> scenarios)
    {
        var all = new List<ReportScenario> { new("Baseline: " + baseline.Network.Name, baseline) };
        all.AddRange(scenarios);

        html.Append("<section id=\"scenarios\">\n<h2>Scenario comparison</h2>\n<p>Each scenario is solved on its own; each time is written with its unit.</p>\n")
            .Append("<table id=\"scenario-table\">\n<thead><tr><th>Scenario</th><th>Every unit stable</th><th>Saturates first</th><th>Headroom (\u00D7)</th><th>Mean time in hospital</th></tr></thead>\n<tbody>\n");
        foreach (var scenario in all)
        {
            var solution = scenario.Solution;
            var first = solution.Units.Where(u => u.Status == UnitStatus.Bottleneck).ToList();
            var timeUnit = solution.Network.TimeUnit;
            html.Append("<tr><td>").Append(HtmlEncode(scenario.Name)).Append("</td>")
                .Append(HtmlReport.Cell(solution.IsStable ? "yes" : "no"))
                .Append(HtmlReport.Cell(first.Count == 0 ? PeopleFormat.Missing : string.Join(", ", first.Select(u => u.Unit.Label))))
                .Append(HtmlReport.Cell(first.Count == 0 ? PeopleFormat.Missing : ShownValue.Of(UnitColumns.Headroom, first[0], timeUnit)))
                .Append(HtmlReport.Cell(ShownValue.Of(TotalsColumns.MeanTimeInSystem, solution.Totals, timeUnit)))
                .Append("</tr>\n");
        }

        html.Append("</tbody>\n</table>\n");
        AppendWhatChanged(html, scenarios);

        var labels = all.SelectMany(s => s.Solution.Units).GroupBy(u => u.Unit.Id, StringComparer.Ordinal)
            .ToDictionary(group => group.Key, group => group.First().Unit.Label, StringComparer.Ordinal);
        var ids = all.SelectMany(s => s.Solution.Units.Select(u => u.Unit.Id)).Distinct(StringComparer.Ordinal).ToList();
        html.Append("<table id=\"scenario-units\">\n<thead><tr><th>Unit</th>");
        foreach (var scenario in all)
        {
            html.Append("<th").Append(Heading(scenario.Name, MaxColumnHeadingLength)).Append("</th>");
        }

        html.Append("</tr></thead>\n<tbody>\n");
        foreach (string id in ids)
        {
            html.Append("<tr><td>").Append(HtmlEncode(labels[id])).Append("</td>");
            foreach (var scenario in all)
            {
                var result = scenario.Solution.Units.FirstOrDefault(u => u.Unit.Id == id);
                html.Append(result is null ? HtmlReport.Cell("not in this scenario") : HtmlReport.Cell(Summary(result, scenario.Solution.Network.TimeUnit)));
            }

            html.Append("</tr>\n");
        }

        html.Append("</tbody>\n</table>\n</section>\n");
    }

    /// <summary>One line per scenario saying what it changes, so the comparison can be read without its files.</summary>
    private static void AppendWhatChanged(StringBuilder html, IReadOnlyList<ReportScenario> scenarios)
    {
        html.Append("<ul id=\"scenario-changes\">\n");
        foreach (var scenario in scenarios)
        {
            string changes = scenario.Changes is { Count: > 0 } listed
                ? string.Join("; ", listed)
                : "a network of its own, compared as it is (no changes listed)";
            html.Append("<li><strong>").Append(HtmlEncode(scenario.Name)).Append("</strong> changes: ").Append(HtmlEncode(changes)).Append("</li>\n");
        }

        html.Append("</ul>\n");
    }

    /// <summary>A unit in one line, in the words and numbers of its map box: <c>◆ bottleneck, 88.3% busy, wait 45.43 min</c>.</summary>
    private static string Summary(UnitResult result, TimeUnit timeUnit)
    {
        string busy = result.Unit.Servers.IsUnlimited
            ? UnitBoxText.Servers(result, timeUnit)
            : ShownValue.Of(UnitColumns.Utilisation, result, timeUnit) + " busy";
        return HarbourLightsPalette.Text(result.Status) + ", " + busy + ", " + UnitBoxText.Wait(result, timeUnit);
    }
}
