using System.Globalization;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
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
        var rows = ComparisonRow.Of(simulated, formula);
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
        output.Write("\n" + Summary(rows.Select(row => row.Metric.Verdict).ToList(), formula.Units.Any(FormulaSimulationComparison.IsApproximate)) + "\n");
    }

    /// <summary>One sentence on the verdicts: how many formula values lie outside, or why none could be judged.</summary>
    /// <param name="verdicts">Every row's verdict.</param>
    /// <param name="approximate">Whether some unit's method is an approximation rather than exact for the unit as modelled.</param>
    private static string Summary(IReadOnlyCollection<string> verdicts, bool approximate)
    {
        int outside = verdicts.Count(verdict => verdict == "outside");
        if (outside > 0)
        {
            string count = string.Create(CultureInfo.InvariantCulture, $"{outside} formula value(s) outside the simulation's 95% interval: ");
            string reason = approximate
                ? "some units use an approximate method (see the error column for how far off it is), and what the formulas "
                    + "do not model (an hour-of-day profile, bursts of diverted patients) may matter here; "
                : "the formulas are exact for these units as modelled, so what they do not model "
                    + "(an hour-of-day profile) may matter here, or the run is short; ";
            return count + reason + "about 1 in 20 values falls outside by chance alone";
        }

        // One replication gives no interval, so there is nothing to be inside of.
        return verdicts.Any(verdict => verdict == "inside")
            ? "every formula value lies inside the simulation's 95% interval"
            : "no formula value could be judged: one replication gives no interval (use --replications 2 or more)";
    }
}
