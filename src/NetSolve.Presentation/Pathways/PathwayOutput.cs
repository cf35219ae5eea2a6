using System.Text.Json;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;

namespace NetSolve.Presentation.Pathways;

/// <summary>
/// Writes pathway results (<see cref="PathwayResult"/>, <see cref="PathResult"/>) as a table, JSON or CSV, all read
/// through <see cref="PathwayColumns"/> and <see cref="PathColumns"/>.
/// </summary>
/// <remarks>JSON and CSV keep the network's time unit, which they state; the table shows each time in the unit that reads best.</remarks>
public static class PathwayOutput
{
    /// <summary>The CSV header: one row per unit reached from the start unit.</summary>
    public const string CsvHeader = "from,unit,expected_visits,visit_probability,expected_time,time_unit";

    /// <summary>Writes the per-unit table and, when given, the path.</summary>
    public static void WriteTable(Network network, PathwayResult? pathway, PathResult? path, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(output);
        var timeUnit = network.TimeUnit;
        output.Write($"{network.Name}: pathways  (rates per {TimeConstants.Name(timeUnit)})\n");
        if (pathway is not null)
        {
            output.Write($"\nPatients entering at {pathway.FromUnitId}: where they go, per patient\n");
            PeopleTableWriter.Write(PathwayColumns.Table(pathway, timeUnit, PathwayColumns.All), output);
            output.Write($"mean time from entry at {pathway.FromUnitId} to leaving the network: {PeopleFormat.Cell(PathwayTotalsColumns.MeanTimeInSystem.Read(pathway), timeUnit)}"
                + (pathway.MeanTimeInNetworkHours is null ? " (a unit on the way is unstable)" : string.Empty) + "\n");
        }

        if (path is not null)
        {
            output.Write($"\nPath {string.Join(" -> ", path.UnitIds)}\n");
            PeopleTableWriter.Write(PathColumns.Table(path, timeUnit, PathColumns.All), output);
            output.Write($"mean time along the path: {PeopleFormat.Cell(PathTotalsColumns.MeanTime.Read(path), timeUnit)}"
                + (path.MeanTimeHours is null ? " (a unit on it is unstable)" : string.Empty)
                + $"; chance of following it step by step from {path.UnitIds[0]}: {PeopleFormat.Cell(PathTotalsColumns.StepProbability.Read(path), timeUnit)}\n");
        }
    }

    /// <summary>Writes one JSON document: <c>from</c> and <c>path</c> are null when not asked for.</summary>
    public static void WriteJson(Network network, PathwayResult? pathway, PathResult? path, Stream output)
    {
        ArgumentNullException.ThrowIfNull(network);
        using var json = new Utf8JsonWriter(output, new JsonWriterOptions { Indented = true });
        var timeUnit = network.TimeUnit;
        json.WriteStartObject();
        json.WriteString("network", network.Name);
        json.WriteString("time_unit", TimeConstants.Name(timeUnit));
        if (pathway is null)
        {
            json.WriteNull("from");
        }
        else
        {
            json.WriteStartObject("from");
            var fields = PathwayTotalsColumns.Table(pathway, timeUnit);
            JsonTableWriter.WriteFields(fields, fields.Rows[0], json);
            JsonTableWriter.WriteArray(PathwayColumns.Table(pathway, timeUnit, PathwayColumns.Json), "units", json);
            json.WriteEndObject();
        }

        if (path is null)
        {
            json.WriteNull("path");
        }
        else
        {
            json.WriteStartObject("path");
            JsonTableWriter.WriteArray(PathColumns.Table(path, timeUnit, PathColumns.All), "units", json);
            var fields = PathTotalsColumns.Table(path, timeUnit);
            JsonTableWriter.WriteFields(fields, fields.Rows[0], json);
            json.WriteEndObject();
        }

        json.WriteEndObject();
        json.Flush();
    }

    /// <summary>Writes CSV: one row per unit reached from the start unit, then one row per unit of the path (with <c>path</c> in the first column).</summary>
    public static void WriteCsv(Network network, PathwayResult? pathway, PathResult? path, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(network);
        var reached = PathwayColumns.Table(pathway, network.TimeUnit, PathwayColumns.All);
        var steps = PathColumns.Table(path, network.TimeUnit, PathColumns.Csv);

        // The path's rows share the pathway's header (PathColumns.Csv has the same ids in the same order), so they
        // follow as further rows of one table.
        CsvTableWriter.Write(reached with { Rows = reached.Rows.AddRange(steps.Rows) }, output);
    }
}
