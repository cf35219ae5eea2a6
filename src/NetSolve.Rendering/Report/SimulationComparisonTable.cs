using NetSolve.Analysis;
using System.Text;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Solution;
using NetSolve.Simulation;
using NetSolve.Solving;
using static NetSolve.Rendering.Report.ReportText;

namespace NetSolve.Rendering.Report;

/// <summary>The report's "Formula against simulation" section: per unit, the mean wait both ways and the simulated 95th percentile of time in unit.</summary>
internal static class SimulationComparisonTable
{
    /// <summary>The percentile of time in unit the table shows.</summary>
    private const double TailPercent = 95.0;

    /// <summary>Absolute slack when finding <see cref="TailPercent"/> among the reported percentiles (50, 90, 95, 99).</summary>
    private const double PercentSlack = 0.5;

    /// <summary>What the simulation's spreads rest on, as the report states it.</summary>
    public const string SpreadCaution =
        "Simulation spreads (the \u00B1 half-widths and the percentiles) depend on the modelled assumptions: the service-time "
        + "distributions, arrival profile, capacities, diversions and patient groups in the network file, and the length and number "
        + "of the runs. Other plausible assumptions give other spreads; read them as what this model implies, not as a forecast.";

    public static void Append(StringBuilder html, NetworkSolution formula, SimulationResult simulation)
    {
        var timeUnit = simulation.Network.TimeUnit;
        html.Append("<section id=\"formula-vs-simulation\">\n<h2>Formula against simulation</h2>\n<p>")
            .Append(HtmlEncode(TimeOfDaySection.RunDescription(simulation)))
            .Append(" The formula column is the Jackson network above (exponential service, steady arrivals, no capacity limit, top-level arrivals only); ")
            .Append("the simulation also models every simulation key in the file. A 95% interval misses the true value about one time in twenty by chance.</p>\n")
            .Append("<table id=\"comparison-table\">\n<thead><tr><th>Unit</th><th>Mean wait, formula</th><th>Mean wait, simulated</th>")
            .Append("<th>Formula inside the 95% interval</th><th>95th percentile of time in unit, simulated</th></tr></thead>\n<tbody>\n");
        for (int i = 0; i < simulation.Units.Length; i++)
        {
            var simulated = simulation.Units[i];
            var wait = FormulaSimulationComparison.ForUnit(simulated, formula.Units[i]).Single(metric => metric.Name == "mean_wait");
            var tail = simulated.TimeInUnitPercentiles.FirstOrDefault(p => Math.Abs(p.Percent - TailPercent) < PercentSlack)?.Hours;
            html.Append("<tr data-unit=\"").Append(HtmlEncode(simulated.Unit.Id)).Append("\"><td>").Append(HtmlEncode(simulated.Unit.Label)).Append("</td>")
                .Append(HtmlReport.Cell(ShownValue.Of(UnitColumns.MeanWait, formula.Units[i], timeUnit)))
                .Append(HtmlReport.Cell(TimeOfDaySection.WithHalfWidth(wait.Simulated, PeopleFormat.Time)))
                .Append(HtmlReport.Cell(Verdict(wait.Verdict)))
                .Append(HtmlReport.Cell(tail is Estimate hours ? TimeOfDaySection.WithHalfWidth(hours, PeopleFormat.Time) : "no patient finished"))
                .Append("</tr>\n");
        }

        html.Append("</tbody>\n</table>\n<p class=\"caution\" id=\"simulation-caution\"><strong>Caution:</strong> ").Append(HtmlEncode(SpreadCaution)).Append("</p>\n</section>\n");
    }

    private static string Verdict(string verdict) => verdict switch
    {
        "inside" => "yes",
        "outside" => "no",
        "no formula" => "no formula (over capacity)",
        _ => "no interval (one replication)",
    };
}
