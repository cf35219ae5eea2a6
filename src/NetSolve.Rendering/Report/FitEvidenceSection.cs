using System.Globalization;
using System.Text;
using NetSolve.Fitting.Estimation;
using NetSolve.Model;
using NetSolve.Presentation.Fitting.Evidence;
using NetSolve.Presentation.Formats;
using static NetSolve.Rendering.Report.ReportText;

namespace NetSolve.Rendering.Report;

/// <summary>
/// The report's "How sure the fit is" section, for a network fitted from a movement log: per unit the stays, the mean
/// stay and cv with their 95% intervals, the distribution chosen and its figures of fit, the servers (flagged when the
/// unit never queued), the observed wait beside the predicted one; then the routes with their intervals, the arrival
/// profile decisions and every thin-data warning. Self-contained HTML like the other sections; all text encoded.
/// </summary>
public static class FitEvidenceSection
{
    /// <summary>How the numbers were made, as the report states it (sources in docs/movement-log.md).</summary>
    public const string MethodNote =
        "Stays still running at the end of the extract, or already running at its start, are counted as such (censored and "
        + "left-truncated), not dropped: the mean stay and cv come from maximum-likelihood fits of the exponential and lognormal "
        + "distributions, the one with the lower AIC kept (the lognormal only when lower by more than 2). The largest gap is the "
        + "widest distance between the observed stay curve (Kaplan-Meier) and the chosen fit. Routing shares have Wilson intervals, "
        + "entry rates exact Poisson intervals, mean stays delta-method intervals on the log scale.";

    /// <summary>Appends the section for <paramref name="evidence"/>; predictions by unit id, none when null.</summary>
    public static void Append(StringBuilder html, NetworkEvidence evidence, IReadOnlyDictionary<string, double?>? predictedWaitHours, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(html);
        ArgumentNullException.ThrowIfNull(evidence);
        html.Append("<section id=\"fit-evidence\">\n<h2>How sure the fit is</h2>\n<p>")
            .Append(HtmlEncode(string.Create(CultureInfo.InvariantCulture,
                $"{PeopleFormat.Time(evidence.Window.Hours)} of extract: {EvidenceWords.Count(evidence.Stays)} stays, {EvidenceWords.Count(evidence.Censored)} still running at its end. ")))
            .Append(HtmlEncode(FitEvidenceTable.IntervalNote)).Append("</p>\n");
        using (var output = new StringWriter(html, CultureInfo.InvariantCulture))
        {
            HtmlTableWriter.Write(FitEvidenceTable.Table(FitEvidenceRow.For(evidence, predictedWaitHours), timeUnit), output, new HtmlTableOptions
            {
                Id = "fit-evidence-table",
                RowAttribute = "data-unit",
                RowKey = "id",
            });
        }

        AppendRoutes(html, evidence);
        html.Append("<p id=\"fit-profile\">Arrival profile by hour of day: ").Append(HtmlEncode(EvidenceWords.Decision(evidence.Profile.HourOfDay.Decision)))
            .Append("; by day of week: ").Append(HtmlEncode(EvidenceWords.Decision(evidence.Profile.DayOfWeek.Decision))).Append(".</p>\n");
        var warnings = evidence.Warnings.ToList();
        if (warnings.Count > 0)
        {
            html.Append("<ul id=\"fit-warnings\">\n");
            foreach (var warning in warnings)
            {
                html.Append("<li data-unit=\"").Append(HtmlEncode(warning.UnitId)).Append("\">").Append(HtmlEncode(warning.Message)).Append("</li>\n");
            }

            html.Append("</ul>\n");
        }

        html.Append("<p class=\"caution\" id=\"fit-method\"><strong>How:</strong> ").Append(HtmlEncode(MethodNote)).Append("</p>\n</section>\n");
    }

    private static void AppendRoutes(StringBuilder html, NetworkEvidence evidence)
    {
        var routes = evidence.Units.SelectMany(unit => unit.Routes.Select(route => (From: unit.UnitId, Route: route))).ToList();
        if (routes.Count == 0)
        {
            return;
        }

        html.Append("<table id=\"fit-routes\">\n<thead><tr><th>From</th><th>To</th><th>Share of departures (95%)</th><th>Moves</th></tr></thead>\n<tbody>\n");
        foreach (var (from, route) in routes)
        {
            html.Append("<tr data-unit=\"").Append(HtmlEncode(from)).Append('"').Append(route.IsThin ? " class=\"thin\"" : string.Empty).Append("><td>")
                .Append(HtmlEncode(from)).Append("</td><td>").Append(HtmlEncode(route.ToUnitId)).Append("</td><td>")
                .Append(HtmlEncode(EvidenceWords.Percent(route.Fraction))).Append("</td><td>")
                .Append(HtmlEncode(EvidenceWords.Count(route.Count) + " of " + EvidenceWords.Count(route.Total))).Append("</td></tr>\n");
        }

        html.Append("</tbody>\n</table>\n");
    }
}
