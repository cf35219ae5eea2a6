using NetSolve.Presentation.Formats;
using System.Text.Json;
using NetSolve.Analysis;
using NetSolve.Model;

namespace NetSolve.Presentation;

/// <summary>Writes pathway results (<see cref="PathwayResult"/>, <see cref="PathResult"/>) as a table, JSON or CSV.</summary>
/// <remarks>Times are in the network's time unit, which every format states.</remarks>
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
        string suffix = TimeConstants.Suffix(timeUnit);
        output.Write($"{network.Name}: pathways  (times in {TimeConstants.Name(timeUnit)}s)\n");
        if (pathway is not null)
        {
            output.Write($"\nPatients entering at {pathway.FromUnitId}: where they go, per patient\n");
            var table = new TextTable("unit", ">expected visits", ">chance of visiting", $">expected time ({suffix})");
            foreach (var unit in pathway.Units)
            {
                table.Add(unit.UnitId, Numbers.Fixed(unit.ExpectedVisits, 4), Numbers.Percent(unit.VisitProbability), Numbers.Compact(Hours(unit.ExpectedTimeHours, timeUnit)));
            }

            table.Write(output);
            output.Write($"mean time from entry at {pathway.FromUnitId} to leaving the network: {Numbers.Compact(Hours(pathway.MeanTimeInNetworkHours, timeUnit))} {suffix}"
                + (pathway.MeanTimeInNetworkHours is null ? " (a unit on the way is unstable)" : string.Empty) + "\n");
        }

        if (path is not null)
        {
            output.Write($"\nPath {string.Join(" -> ", path.UnitIds)}\n");
            var table = new TextTable("unit", $">mean time in unit ({suffix})");
            for (int k = 0; k < path.UnitIds.Length; k++)
            {
                table.Add(path.UnitIds[k], Numbers.Compact(Hours(path.MeanTimesHours[k], timeUnit)));
            }

            table.Write(output);
            output.Write($"mean time along the path: {Numbers.Compact(Hours(path.MeanTimeHours, timeUnit))} {suffix}"
                + (path.MeanTimeHours is null ? " (a unit on it is unstable)" : string.Empty)
                + $"; chance of following it step by step from {path.UnitIds[0]}: {Numbers.Percent(path.StepProbability)}\n");
        }
    }

    /// <summary>Writes one JSON document.</summary>
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
            json.WriteString("unit", pathway.FromUnitId);
            JsonTableWriter.WriteNumber(json, "mean_time_in_system", Hours(pathway.MeanTimeInNetworkHours, timeUnit));
            json.WriteStartArray("units");
            foreach (var unit in pathway.Units)
            {
                json.WriteStartObject();
                json.WriteString("id", unit.UnitId);
                json.WriteNumber("expected_visits", unit.ExpectedVisits);
                JsonTableWriter.WriteNumber(json, "visit_probability", unit.VisitProbability);
                JsonTableWriter.WriteNumber(json, "expected_time", Hours(unit.ExpectedTimeHours, timeUnit));
                json.WriteEndObject();
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        if (path is null)
        {
            json.WriteNull("path");
        }
        else
        {
            json.WriteStartObject("path");
            json.WriteStartArray("units");
            for (int k = 0; k < path.UnitIds.Length; k++)
            {
                json.WriteStartObject();
                json.WriteString("id", path.UnitIds[k]);
                JsonTableWriter.WriteNumber(json, "mean_time_in_unit", Hours(path.MeanTimesHours[k], timeUnit));
                json.WriteEndObject();
            }

            json.WriteEndArray();
            JsonTableWriter.WriteNumber(json, "mean_time", Hours(path.MeanTimeHours, timeUnit));
            json.WriteNumber("step_probability", path.StepProbability);
            json.WriteEndObject();
        }

        json.WriteEndObject();
        json.Flush();
    }

    /// <summary>Writes CSV: one row per unit reached from the start unit, then one row per unit of the path (with <c>path</c> in the first column).</summary>
    public static void WriteCsv(Network network, PathwayResult? pathway, PathResult? path, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(output);
        string unitName = TimeConstants.Name(network.TimeUnit);
        output.Write(CsvHeader + "\n");
        foreach (var unit in pathway?.Units ?? [])
        {
            output.Write(string.Join(',', MachineFormat.CsvText(pathway!.FromUnitId), MachineFormat.CsvText(unit.UnitId),
                MachineFormat.Csv(unit.ExpectedVisits), MachineFormat.Csv(unit.VisitProbability),
                MachineFormat.Csv(Hours(unit.ExpectedTimeHours, network.TimeUnit)), unitName) + "\n");
        }

        for (int k = 0; k < (path?.UnitIds.Length ?? 0); k++)
        {
            output.Write(string.Join(',', "path", MachineFormat.CsvText(path!.UnitIds[k]), string.Empty,
                k == path.UnitIds.Length - 1 ? MachineFormat.Csv(path.StepProbability) : string.Empty,
                MachineFormat.Csv(Hours(path.MeanTimesHours[k], network.TimeUnit)), unitName) + "\n");
        }
    }

    private static double? Hours(double? hours, TimeUnit timeUnit) => hours is double h ? TimeConstants.FromHours(h, timeUnit) : null;
}
