using System.Globalization;
using System.Text;
using NetSolve.Presentation.ByHour;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Solving;
using static NetSolve.Rendering.Report.ReportText;

namespace NetSolve.Rendering.Report;

/// <summary>
/// The report's "Hour by hour" section, from the time-varying formulas (no simulation needed): per unit whose
/// arrivals or servers vary, the peak hour of arrivals, the worst hour with its utilisation and wait and the method
/// (the columns of <c>solve</c>'s by-hour summary), and a chart of the mean queue by hour.
/// </summary>
internal static class HourByHourSection
{
    public static void Append(StringBuilder html, NetworkSolution solution)
    {
        var varying = ByHourUnit.All(solution).Where(unit => unit.Varies).ToList();
        if (varying.Count == 0)
        {
            return;
        }

        html.Append("<section id=\"hour-by-hour\">\n<h2>Hour by hour</h2>\n<p>")
            .Append(HtmlEncode("Arrivals follow the network file's arrival profile. From the time-varying formulas (docs/time-of-day.md): "
                + "each hour's offered load through the network, then each unit's queue with what is carried over from the hours before. "
                + "Hour 00 is 00:00\u201301:00; the worst hour is the one with the longest mean wait."))
            .Append("</p>\n");
        string? chart = ByHourChart.Svg(varying, id => solution.Network.Units.FirstOrDefault(unit => string.Equals(unit.Id, id, StringComparison.Ordinal))?.Label ?? id);
        if (chart is not null)
        {
            int drawn = ByHourChart.Shown(varying).Count;
            html.Append("<figure id=\"hour-by-hour-figure\">\n<div class=\"chart-frame\">\n").Append(HtmlReport.StripDeclaration(chart)).Append("\n</div>\n")
                .Append("<figcaption>Mean number of patients waiting (not yet in service) in each hour, by the formulas.")
                .Append(drawn < varying.Count
                    ? string.Create(CultureInfo.InvariantCulture, $" Showing the {drawn} units with the longest worst-hour waits; the others have shorter waits or no queue.")
                    : string.Empty)
                .Append("</figcaption>\n</figure>\n");
        }

        using var output = new StringWriter(html, CultureInfo.InvariantCulture);
        HtmlTableWriter.Write(ResultTable.Build(ByHourSummaryColumns.All, varying, solution.Network.TimeUnit), output, new HtmlTableOptions
        {
            Id = "hour-by-hour-table",
            RowAttribute = "data-unit",
            RowKey = ByHourSummaryColumns.Id.Id,
        });
        html.Append("</section>\n");
    }
}
