using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;

namespace NetSolve.Presentation.Scenarios;

/// <summary>Writes a <see cref="ComparisonResult"/> as long-format CSV: one row per scenario, unit and metric.</summary>
/// <remarks>
/// Per scenario, the network totals come first (empty unit), then each unit's metrics from
/// <see cref="ComparedMetrics"/> and a <c>status</c> row whose change is <c>changed</c> or empty. Values are in the base
/// network's time unit at full precision, and the time unit is on every row so each row stands on its own when filtered.
/// </remarks>
public static class ScenarioCsvWriter
{
    /// <summary>The header row.</summary>
    public const string Header = "scenario,unit,metric,base,scenario_value,change,relative_change,time_unit";

    /// <summary>Writes the header and the rows; lines end with <c>\n</c>.</summary>
    public static void Write(ComparisonResult comparison, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(comparison);
        ArgumentNullException.ThrowIfNull(output);
        var timeUnit = comparison.Base.Network.TimeUnit;
        string unitName = TimeConstants.Name(timeUnit);
        output.Write(Header + "\n");
        foreach (var scenario in comparison.Scenarios)
        {
            string name = MachineFormat.CsvText(scenario.Name);
            void Row(string unit, string metric, MetricChange change) => output.Write(string.Join(',', name, unit, metric,
                MachineFormat.Csv(change.Before), MachineFormat.Csv(change.After), MachineFormat.Csv(change.Absolute),
                MachineFormat.Csv(change.Relative), unitName) + "\n");

            foreach (var column in ComparedMetrics.Totals)
            {
                Row(string.Empty, column.Id, ComparedMetrics.InFileUnit(column, scenario.BaseTotals, scenario.Solution.Totals, timeUnit));
            }

            foreach (var unit in scenario.Units)
            {
                string id = MachineFormat.CsvText(unit.UnitId);
                foreach (var column in ComparedMetrics.Units)
                {
                    Row(id, column.Id, ComparedMetrics.InFileUnit(column, unit.Before, unit.After, timeUnit));
                }

                output.Write(string.Join(',', name, id, "status", ScenarioStatus.Base(unit), ScenarioStatus.Scenario(unit),
                    unit.StatusChanged ? "changed" : string.Empty, string.Empty, unitName) + "\n");
            }
        }
    }
}
