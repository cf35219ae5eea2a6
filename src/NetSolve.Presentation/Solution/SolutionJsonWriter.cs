using System.Text.Json;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.ByHour;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Journeys;
using NetSolve.Presentation.Metrics;
using NetSolve.Solving;

namespace NetSolve.Presentation.Solution;

/// <summary>Writes a solution as the contract's JSON document (one document, units in file order).</summary>
public static class SolutionJsonWriter
{
    /// <summary>Writes <paramref name="solution"/> to <paramref name="output"/>, indented, UTF-8.</summary>
    public static void Write(NetworkSolution solution, Stream output)
    {
        ArgumentNullException.ThrowIfNull(solution);
        using var json = new Utf8JsonWriter(output, new JsonWriterOptions { Indented = true });
        Write(solution, json);
    }

    /// <summary>Writes <paramref name="solution"/> as one JSON object to <paramref name="json"/>.</summary>
    public static void Write(NetworkSolution solution, Utf8JsonWriter json)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(json);
        json.WriteStartObject();
        json.WriteString("network", solution.Network.Name);
        json.WriteString("time_unit", TimeConstants.Name(solution.Network.TimeUnit));
        json.WriteBoolean("stable", solution.IsStable);
        WriteUnits(solution, json);
        var totals = TotalsColumns.Table(solution);
        json.WritePropertyName("totals");
        JsonTableWriter.WriteObject(totals, totals.Rows[0], json);
        if (!solution.Groups.IsEmpty)
        {
            GroupColumns.WriteArray(solution, json);
        }

        JourneyJsonWriter.Write(JourneyFormula.Estimate(solution), solution.Network.TimeUnit, json);

        json.WriteEndObject();
        json.Flush();
    }

    /// <summary>
    /// The units array; <c>targets_breached</c>, present only when some unit has a target, is an array of keys; <c>by_hour</c>,
    /// present only with an hour-by-hour solution, is an object of arrays.
    /// </summary>
    /// <remarks>
    /// Each unit's values are read and written as it comes, not built into a table first: a table of 100,000 units
    /// held about 100 MB of cells only to be written once. The field names are encoded once.
    /// </remarks>
    private static void WriteUnits(NetworkSolution solution, Utf8JsonWriter json)
    {
        var columns = UnitColumns.For(solution).Where(column => ResultTable.Shows(column.Audience, Audience.Machines)).ToArray();
        var names = columns.Select(column => JsonEncodedText.Encode(column.Id)).ToArray();
        int targets = Array.FindIndex(columns, column => column.Id == UnitColumns.TargetsBreached.Id);
        var byHour = ByHourUnit.All(solution);
        var timeUnit = solution.Network.TimeUnit;
        json.WriteStartArray("units");
        for (int row = 0; row < solution.Units.Length; row++)
        {
            var unit = solution.Units[row];
            json.WriteStartObject();
            for (int i = 0; i < columns.Length; i++)
            {
                if (i == targets)
                {
                    json.WriteStartArray(names[i]);
                    foreach (var kind in unit.TargetsBreached)
                    {
                        json.WriteStringValue(TargetKeys.Of(kind));
                    }

                    json.WriteEndArray();
                }
                else
                {
                    JsonTableWriter.WriteCell(json, names[i], columns[i].Read(unit), timeUnit);
                }
            }

            if (byHour.Count > 0)
            {
                ByHourJsonWriter.Write(byHour[row], timeUnit, json);
            }

            json.WriteEndObject();
            JsonTableWriter.PassOnWhenFull(json);
        }

        json.WriteEndArray();
    }
}
