using System.Globalization;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Journeys;
using NetSolve.Presentation.Metrics;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Presentation.Simulation;

/// <summary>Writes formula against simulation, one row per unit and metric, with the verdict.</summary>
public static class ComparisonTableWriter
{
    /// <summary>Writes the side-by-side table and a count of verdicts.</summary>
    public static void Write(SimulationResult simulated, NetworkSolution formula, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(simulated);
        ArgumentNullException.ThrowIfNull(formula);
        ArgumentNullException.ThrowIfNull(output);
        var rows = ComparisonRow.Of(simulated, formula).AddRange(JourneyComparisonRows.Of(simulated, formula));
        output.Write($"formulas against simulation; rates per {TimeConstants.Name(simulated.Network.TimeUnit)}; "
            + "error: (formula - simulated) / simulated; verdict: is the formula inside the simulation's 95% interval?\n");
        output.Write("formula method per unit:\n");
        int width = formula.Units.Select(unit => unit.Unit.Id.Length).DefaultIfEmpty(0).Max();
        foreach (var unit in formula.Units)
        {
            output.Write("  " + unit.Unit.Id.PadRight(width) + "  " + unit.Method + "\n");
        }

        output.Write("\n");
        PeopleTableWriter.Write(ResultTable.Build(ComparedMetricColumns.All, rows, simulated.Network.TimeUnit), output);
        output.Write("\n" + Summary(rows.Select(row => row.Metric).ToList(), simulated.PrecisionReached) + "\n");
    }

    /// <summary>
    /// One sentence on the verdicts: how many formula values lie outside and which side each points to (the run where
    /// the formula is exact, the formula where it is an approximation), or why none could be judged.
    /// </summary>
    /// <param name="metrics">Every row's compared metric.</param>
    /// <param name="precisionReached">Whether the run reached its requested precision; null when none was asked.</param>
    internal static string Summary(IReadOnlyCollection<ComparedMetric> metrics, bool? precisionReached)
    {
        int onRun = metrics.Count(metric => metric.Suspect == "run");
        int onFormula = metrics.Count(metric => metric.Suspect == "formula");
        if (onRun + onFormula > 0)
        {
            var parts = new List<string>();
            if (onRun > 0)
            {
                string precision = precisionReached == false ? "its precision was not reached, " : string.Empty;
                parts.Add(string.Create(CultureInfo.InvariantCulture, $"{onRun} outside where the formula is exact: doubt the run (")
                    + precision + "it may be short against the unit's relaxation time or its warm-up too short; "
                    + "try a longer --duration and --warmup, or --precision), or chance");
            }

            if (onFormula > 0)
            {
                parts.Add(string.Create(CultureInfo.InvariantCulture, $"{onFormula} outside where the method is an approximation: ")
                    + "the error column gives how far off it is, \u00B1 what the simulation's interval allows; what the formulas "
                    + "do not model (an hour-of-day profile, groups, bursts of diverted patients) may matter too");
            }

            return string.Create(CultureInfo.InvariantCulture, $"{onRun + onFormula} formula value(s) outside the simulation's 95% interval; ")
                + string.Join("; ", parts) + "; about 1 in 20 values falls outside by chance alone";
        }

        // One replication gives no interval, so there is nothing to be inside of.
        return metrics.Any(metric => metric.Verdict == "inside")
            ? "every formula value lies inside the simulation's 95% interval"
            : "no formula value could be judged: one replication gives no interval (use --replications 2 or more)";
    }
}
