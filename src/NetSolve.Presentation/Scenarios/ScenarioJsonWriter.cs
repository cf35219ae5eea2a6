using System.Text.Json;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Solution;

namespace NetSolve.Presentation.Scenarios;

/// <summary>Writes a <see cref="ComparisonResult"/> as the contract's JSON document.</summary>
/// <remarks>
/// Each compared metric is an object of base, scenario and change, which no flat table expresses, so the nesting is
/// written by hand; the metrics and their ids come from <see cref="ComparedMetrics"/> and every value is in the base
/// network's time unit.
/// </remarks>
public static class ScenarioJsonWriter
{
    /// <summary>Writes <paramref name="comparison"/> to <paramref name="output"/>, indented, UTF-8.</summary>
    public static void Write(ComparisonResult comparison, Stream output)
    {
        ArgumentNullException.ThrowIfNull(comparison);
        using var json = new Utf8JsonWriter(output, new JsonWriterOptions { Indented = true });
        var timeUnit = comparison.Base.Network.TimeUnit;
        json.WriteStartObject();
        json.WriteString("base", comparison.BaseName);
        json.WriteString("time_unit", TimeConstants.Name(timeUnit));
        Ids(json, "base_bottleneck", comparison.BaseBottlenecks);
        json.WriteStartArray("scenarios");
        foreach (var scenario in comparison.Scenarios)
        {
            WriteScenario(json, comparison, scenario, timeUnit);
        }

        json.WriteEndArray();
        json.WriteEndObject();
        json.Flush();
    }

    private static void WriteScenario(Utf8JsonWriter json, ComparisonResult comparison, ScenarioComparison scenario, TimeUnit timeUnit)
    {
        json.WriteStartObject();
        json.WriteString("name", scenario.Name);
        json.WriteBoolean("stable", scenario.Solution.IsStable);
        Ids(json, "bottleneck", scenario.Bottlenecks);
        json.WriteBoolean("bottleneck_changed", !scenario.Bottlenecks.SequenceEqual(comparison.BaseBottlenecks));
        json.WriteStartObject("totals");
        foreach (var column in ComparedMetrics.Totals)
        {
            Change(json, column.Id, ComparedMetrics.InFileUnit(column, scenario.BaseTotals, scenario.Solution.Totals, timeUnit));
        }

        json.WriteEndObject();
        json.WriteStartArray("units");
        foreach (var unit in scenario.Units)
        {
            json.WriteStartObject();
            json.WriteString(UnitColumns.Id.Id, unit.UnitId);
            json.WriteString("status_base", ScenarioStatus.Base(unit));
            json.WriteString(UnitColumns.Status.Id, ScenarioStatus.Scenario(unit));
            json.WriteBoolean("status_changed", unit.StatusChanged);
            foreach (var column in ComparedMetrics.Units)
            {
                Change(json, column.Id, ComparedMetrics.InFileUnit(column, unit.Before, unit.After, timeUnit));
            }

            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteEndObject();
    }

    private static void Ids(Utf8JsonWriter json, string name, IEnumerable<string> ids)
    {
        json.WriteStartArray(name);
        foreach (var id in ids)
        {
            json.WriteStringValue(id);
        }

        json.WriteEndArray();
    }

    private static void Change(Utf8JsonWriter json, string name, MetricChange change)
    {
        json.WriteStartObject(name);
        JsonTableWriter.WriteNumber(json, "base", change.Before);
        JsonTableWriter.WriteNumber(json, "scenario", change.After);
        JsonTableWriter.WriteNumber(json, "change", change.Absolute);
        JsonTableWriter.WriteNumber(json, "relative_change", change.Relative);
        json.WriteEndObject();
    }
}
