using System.Collections.Immutable;
using System.Text.Json;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Simulation;

namespace NetSolve.Presentation.Journeys;

/// <summary>
/// Writes the contract's <c>journeys</c> array (docs/network-file.md, "Journeys"): per journey and patients its fields,
/// <c>group</c> (null for every patient), <c>units</c> and <c>over</c>, an array of shares longer than each time.
/// Written only when the network defines journeys, so outputs without journeys are unchanged.
/// </summary>
public static class JourneyJsonWriter
{
    /// <summary>The formula's journeys of <paramref name="rows"/>; nothing when there are none.</summary>
    public static void Write(ImmutableArray<JourneyEstimate> rows, TimeUnit timeUnit, Utf8JsonWriter json)
    {
        ArgumentNullException.ThrowIfNull(json);
        if (rows.IsDefaultOrEmpty)
        {
            return;
        }

        var table = JourneyColumns.Table(rows, timeUnit);
        json.WriteStartArray("journeys");
        for (int row = 0; row < rows.Length; row++)
        {
            json.WriteStartObject();
            Head(rows[row].Journey, rows[row].Group, json);
            JsonTableWriter.WriteFields(table, table.Rows[row], json);
            json.WriteStartArray("over");
            foreach (var over in rows[row].Over)
            {
                json.WriteStartObject();
                JsonTableWriter.WriteCell(json, SimulatedJourneyColumns.OverTime.Id, Cell.Of(over.Hours, MetricDimension.Time), timeUnit);
                JsonTableWriter.WriteCell(json, "probability", Cell.Of(over.Probability, MetricDimension.Probability), timeUnit);
                json.WriteEndObject();
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        json.WriteEndArray();
    }

    /// <summary>The simulated journeys of <paramref name="rows"/>, under the same names; nothing when there are none.</summary>
    public static void Write(ImmutableArray<SimulatedJourney> rows, TimeUnit timeUnit, Utf8JsonWriter json)
    {
        ArgumentNullException.ThrowIfNull(json);
        if (rows.IsDefaultOrEmpty)
        {
            return;
        }

        var table = SimulatedJourneyColumns.Table(rows, timeUnit, Audience.Machines);
        json.WriteStartArray("journeys");
        for (int row = 0; row < rows.Length; row++)
        {
            json.WriteStartObject();
            Head(rows[row].Journey, rows[row].Group, json);
            JsonTableWriter.WriteFields(table, table.Rows[row], json);
            JsonTableWriter.WriteArray(ResultTable.Build(SimulatedJourneyColumns.OverForJson, rows[row].Over, timeUnit), "over", json);
            json.WriteEndObject();
        }

        json.WriteEndArray();
    }

    private static void Head(Journey journey, PatientGroup? group, Utf8JsonWriter json)
    {
        if (group is null)
        {
            json.WriteNull("group");
        }
        else
        {
            json.WriteString("group", group.Id);
        }

        json.WriteStartArray("units");
        foreach (string id in journey.UnitIds)
        {
            json.WriteStringValue(id);
        }

        json.WriteEndArray();
    }
}
