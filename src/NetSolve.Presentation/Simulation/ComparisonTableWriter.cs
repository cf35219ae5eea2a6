using System.Globalization;
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
        output.Write($"formula (Jackson network) against simulation; rates per {TimeConstants.Name(simulated.Network.TimeUnit)}; "
            + "verdict: is the formula inside the simulation's 95% interval?\n\n");
        PeopleTableWriter.Write(ResultTable.Build(ComparedMetricColumns.All, rows, simulated.Network.TimeUnit), output);
        output.Write("\n" + Summary(rows.Select(row => row.Metric.Verdict).ToList()) + "\n");
    }

    /// <summary>One sentence on the verdicts: how many formula values lie outside, or why none could be judged.</summary>
    private static string Summary(IReadOnlyCollection<string> verdicts)
    {
        int outside = verdicts.Count(verdict => verdict == "outside");
        if (outside > 0)
        {
            return string.Create(CultureInfo.InvariantCulture, $"{outside} formula value(s) outside the simulation's 95% interval: the formulas' assumptions ")
                + "(exponential service, constant arrival rate, no capacity limit, one patient group) may not hold here; "
                + "about 1 in 20 values falls outside by chance alone";
        }

        // One replication gives no interval, so there is nothing to be inside of.
        return verdicts.Any(verdict => verdict == "inside")
            ? "every formula value lies inside the simulation's 95% interval"
            : "no formula value could be judged: one replication gives no interval (use --replications 2 or more)";
    }
}
