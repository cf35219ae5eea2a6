using System.Text;
using NetSolve.Analysis;
using NetSolve.Presentation.Formats;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Rendering.Report;

/// <summary>
/// The report's journey sections: one line per journey for every patient, with its mean, its 90th percentile and
/// the share longer than each of its times (the 4-hour share for an emergency journey). By the formula after the
/// units ("Journeys"); with a simulation, again after the comparison with the simulated shares beside the formula's
/// ("Journeys: formula against simulation"), so that the report without a simulation is the start of the one with.
/// Nothing when the network defines no journey.
/// </summary>
internal static class JourneySection
{
    public static void Append(StringBuilder html, NetworkSolution baseline, SimulationResult? simulation)
    {
        var estimates = JourneyFormula.Estimate(baseline).Where(estimate => estimate.Group is null).ToList();
        if (estimates.Count == 0)
        {
            return;
        }

        if (simulation is null)
        {
            html.Append("<section id=\"journeys\">\n<h2>Journeys</h2>\n<p>The time from entering a journey's units to leaving them, per patient; ")
                .Append("formula: each visit's wait and service as phases joined by the routes (docs/methods.md, \"Journeys\").</p>\n<ul>\n");
        }
        else
        {
            html.Append("<section id=\"journeys-simulated\">\n<h2>Journeys: formula against simulation</h2>\n<p>The formula's figures, ")
                .Append("with the simulation's share of patients longer than each time (measured per patient) in brackets.</p>\n<ul>\n");
        }

        foreach (var estimate in estimates)
        {
            var simulated = simulation?.Journeys.FirstOrDefault(journey => journey.Group is null && journey.Journey.Id == estimate.Journey.Id);
            html.Append("<li class=\"journey\">").Append(ReportText.HtmlEncode(Line(estimate, simulated))).Append("</li>\n");
        }

        html.Append("</ul>\n</section>\n");
    }

    /// <summary>One journey in words, e.g. "Emergency stay (emergency, lab): mean 2.1 h, 90% within 3.8 h; longer than 4 h: 7.9% (simulated 8.2% ± 0.5%)".</summary>
    public static string Line(JourneyEstimate estimate, SimulatedJourney? simulated)
    {
        ArgumentNullException.ThrowIfNull(estimate);
        string head = estimate.Journey.Label + " (" + string.Join(", ", estimate.Journey.UnitIds) + "): ";
        if (estimate.MeanHours is not double mean)
        {
            return head + "no formula figures: a unit of the journey is unstable";
        }

        var parts = new List<string> { "mean " + PeopleFormat.Time(mean) + ", 90% within " + PeopleFormat.Time(estimate.Percentiles[1].Hours) };
        for (int t = 0; t < estimate.Over.Length; t++)
        {
            var over = estimate.Over[t];
            string share = "longer than " + PeopleFormat.Time(over.Hours) + ": " + PeopleFormat.Percent(over.Probability);
            if (simulated is not null && t < simulated.Over.Length)
            {
                var probability = simulated.Over[t].Probability;
                share += " (simulated " + PeopleFormat.Percent(probability.Mean)
                    + (probability.HalfWidth is double half ? " \u00B1 " + PeopleFormat.Percent(half) : string.Empty) + ")";
            }

            parts.Add(share);
        }

        return head + string.Join("; ", parts);
    }
}
