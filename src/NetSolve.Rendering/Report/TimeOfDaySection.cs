using System.Globalization;
using System.Text;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Simulation;
using NetSolve.Simulation;
using static NetSolve.Rendering.Report.ReportText;

namespace NetSolve.Rendering.Report;

/// <summary>The report's "Time of day" section: the simulated mean queue by hour of day, as a chart and a table.</summary>
internal static class TimeOfDaySection
{
    public static void Append(StringBuilder html, SimulationResult simulation)
    {
        var network = simulation.Network;
        var shown = TimeOfDayQueues.Shown(simulation);
        html.Append("<section id=\"time-of-day\">\n<h2>Time of day</h2>\n<p>").Append(HtmlEncode(RunDescription(simulation))).Append(' ')
            .Append(TimeOfDayQueues.HasArrivalProfile(network)
                ? "Arrivals follow the network file's arrival profile, so queues rise and fall over the day."
                : "The network file has no arrival profile: arrivals are steady, so every hour has the same expected queue and the differences between hours are chance.")
            .Append("</p>\n");
        string? chart = TimeOfDayChart.Svg(simulation);
        if (chart is null || shown.Count == 0)
        {
            html.Append("<p>No patient waited at any unit in the simulation, so there is no queue to show by hour.</p>\n</section>\n");
            return;
        }

        html.Append("<figure id=\"time-of-day-figure\">\n<div class=\"chart-frame\">\n").Append(HtmlReport.StripDeclaration(chart)).Append("\n</div>\n")
            .Append("<figcaption>Mean number of patients waiting (not yet in service) in each hour of the day, averaged over the simulated days and replications. ");
        int hidden = simulation.Units.Length - shown.Count;
        if (hidden > 0)
        {
            html.Append(string.Create(CultureInfo.InvariantCulture, $"Showing the {shown.Count} units whose queues peak highest; the other {hidden} peak lower or never have a queue. "));
        }

        html.Append("</figcaption>\n</figure>\n");
        html.Append("<table id=\"time-of-day-table\">\n<thead><tr><th>Hour</th>");
        foreach (var unit in shown)
        {
            html.Append("<th data-unit=\"").Append(HtmlEncode(unit.Unit.Id)).Append('"').Append(Heading(unit.Unit.Label, MaxColumnHeadingLength)).Append("</th>");
        }

        html.Append("</tr></thead>\n<tbody>\n");
        for (int hour = 0; hour < TimeOfDayQueues.HoursOfDay; hour++)
        {
            html.Append("<tr data-hour=\"").Append(hour.ToString("00", CultureInfo.InvariantCulture)).Append("\">")
                .Append(HtmlReport.Cell(HourRange(hour)));
            foreach (var unit in shown)
            {
                html.Append(HtmlReport.Cell(unit.MeanQueueByHour[hour] is Estimate estimate ? WithHalfWidth(estimate, PeopleFormat.Number) : "not measured"));
            }

            html.Append("</tr>\n");
        }

        html.Append("</tbody>\n</table>\n<p class=\"note\">Each cell: mean patients waiting \u00B1 the half-width of its 95% confidence interval over the replications.</p>\n</section>\n");
    }

    /// <summary>How the simulation was run, in one sentence; times as the tables write them.</summary>
    public static string RunDescription(SimulationResult simulation)
    {
        var options = simulation.Options;
        return string.Create(CultureInfo.InvariantCulture,
            $"Simulated: {simulation.ReplicationsFinished} of {options.Replications} replications of {PeopleFormat.Time(options.DurationHours)} each, after a warm-up of {PeopleFormat.Time(options.WarmupHours)}, seed {options.Seed}.");
    }

    /// <summary>A mean with ± its 95% half-width (the mean alone with one replication), each written by <paramref name="format"/>.</summary>
    /// <remarks>For times each part takes the unit that reads best for it, as every time for people does: <c>1.978 h ± 25.31 min</c>.</remarks>
    public static string WithHalfWidth(Estimate estimate, Func<double, string> format) =>
        estimate.HalfWidth is double half
            ? format(estimate.Mean) + " \u00B1 " + format(half)
            : format(estimate.Mean);

    private static string HourRange(int hour) =>
        string.Create(CultureInfo.InvariantCulture, $"{hour:00}:00\u2013{(hour + 1) % TimeOfDayQueues.HoursOfDay:00}:00");
}
