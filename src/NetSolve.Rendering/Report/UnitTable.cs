using System.Text;
using NetSolve.Model;
using NetSolve.Presentation;
using NetSolve.Solving;
using static System.Net.WebUtility;

namespace NetSolve.Rendering.Report;

/// <summary>The report's per-unit table: the contract's numbers in the network's time unit.</summary>
internal static class UnitTable
{
    public static void Append(StringBuilder html, NetworkSolution solution)
    {
        string unit = TimeConstants.Suffix(solution.Network.TimeUnit);
        html.Append("<table id=\"unit-table\">\n<thead><tr><th>Unit</th><th>Status</th><th>Servers</th><th>Arrivals (/")
            .Append(unit).Append(")</th><th>Utilisation</th><th>Chance of waiting</th><th>Mean wait (").Append(unit)
            .Append(")</th><th>Mean time in unit (").Append(unit).Append(")</th><th>Headroom (\u00D7)</th></tr></thead>\n<tbody>\n");
        foreach (var result in solution.Units)
        {
            var view = UnitView.From(result, solution.Network.TimeUnit);
            html.Append("<tr data-unit=\"").Append(HtmlEncode(view.Id)).Append("\"><td>").Append(HtmlEncode(view.Label)).Append("</td>")
                .Append(HtmlReport.StatusCell(result.Status))
                .Append(HtmlReport.Cell(view.Servers is int servers ? servers.ToString(System.Globalization.CultureInfo.InvariantCulture) : "unlimited"))
                .Append(HtmlReport.Cell(Numbers.Compact(view.ArrivalRate)))
                .Append(HtmlReport.Cell(view.Servers is null ? Numbers.Missing : Numbers.Percent(view.Utilisation)))
                .Append(HtmlReport.Cell(Numbers.Percent(view.PWait)))
                .Append(HtmlReport.Cell(HtmlReport.Time(view.MeanWait)))
                .Append(HtmlReport.Cell(HtmlReport.Time(view.MeanTimeInUnit)))
                .Append(HtmlReport.Cell(view.Headroom is double headroom ? Numbers.Fixed(headroom, 3) : Numbers.Missing))
                .Append("</tr>\n");
        }

        html.Append("</tbody>\n</table>\n");
    }
}
