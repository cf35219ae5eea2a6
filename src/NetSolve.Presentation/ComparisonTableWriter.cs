using NetSolve.Analysis;
using System.Globalization;
using NetSolve.Model;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Presentation;

/// <summary>Writes formula against simulation, one row per unit and metric, with the verdict.</summary>
public static class ComparisonTableWriter
{
    /// <summary>Writes the side-by-side table and a count of verdicts.</summary>
    public static void Write(SimulationResult simulated, NetworkSolution formula, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(simulated);
        ArgumentNullException.ThrowIfNull(formula);
        ArgumentNullException.ThrowIfNull(output);
        var scale = new TimeScale(simulated.Network.TimeUnit);
        output.Write($"formula (Jackson network) against simulation; times in {TimeConstants.Name(scale.Unit)}s; "
            + "verdict: is the formula inside the simulation's 95% interval?\n\n");
        var table = new TextTable("unit", "metric", ">formula", ">simulated", "verdict");
        int outside = 0;
        for (int i = 0; i < simulated.Units.Length; i++)
        {
            foreach (var metric in FormulaSimulationComparison.ForUnit(simulated.Units[i], formula.Units[i]))
            {
                double factor = scale.FactorFor(metric.Dimension);
                table.Add(
                    simulated.Units[i].Unit.Id,
                    metric.Name,
                    Numbers.Compact(metric.Formula * factor),
                    SimulationTableWriter.WithHalfWidth(metric.Simulated, factor),
                    metric.Verdict);
                outside += metric.Verdict == "outside" ? 1 : 0;
            }
        }

        table.Write(output);
        output.Write(outside == 0
            ? "\nevery formula value lies inside the simulation's 95% interval\n"
            : string.Create(CultureInfo.InvariantCulture, $"\n{outside} formula value(s) outside the simulation's 95% interval: the formulas' assumptions ")
              + "(exponential service, constant arrival rate, no capacity limit, one patient group) may not hold here; "
              + "about 1 in 20 values falls outside by chance alone\n");
    }
}
