using NetSolve.Presentation.Formats;
using System.Text.Json;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Presentation;

/// <summary>Writes a <see cref="GrowthResult"/> as a table for people, as JSON, or as long-format CSV ready to plot.</summary>
/// <remarks>Times are in the network's time unit, which every format states.</remarks>
public static class GrowthOutput
{
    /// <summary>Most unit columns in the people's table (units that saturate first); the JSON and CSV hold every unit.</summary>
    public const int MaxTableColumns = 8;

    /// <summary>Width in characters of the longest bar in the text chart.</summary>
    public const int ChartWidth = 40;

    /// <summary>The CSV header: one row per factor and unit.</summary>
    public const string CsvHeader = "factor,unit,utilisation,mean_wait,mean_time_in_unit,status,time_unit";

    /// <summary>Writes the saturation order, the thresholds, utilisation and wait by factor, and a text chart.</summary>
    public static void WriteTable(GrowthResult growth, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(growth);
        ArgumentNullException.ThrowIfNull(output);
        var timeUnit = growth.Network.TimeUnit;
        string suffix = TimeConstants.Suffix(timeUnit);
        output.Write($"{growth.Network.Name}: demand growth of {What(growth)}  (times in {TimeConstants.Name(timeUnit)}s, strain threshold {Numbers.Percent(growth.StrainThreshold)})\n\n");
        output.Write($"Saturation order (factor = multiple of today's {(growth.Stream is null ? "demand" : What(growth))})\n");
        var order = new TextTable("unit", ">strained at", ">unstable at", ">growth to unstable");
        foreach (var point in growth.Saturation)
        {
            order.Add(point.UnitId, Factor(point.StrainFactor), Factor(point.SaturationFactor), Numbers.Percent(point.SaturationFactor - 1.0));
        }

        order.Write(output);
        output.Write("\n" + Findings(growth) + "\n");
        var columns = Columns(growth);
        if (columns.Count == 0 || growth.Steps.IsEmpty)
        {
            return;
        }

        if (columns.Count < growth.Steps[0].Solution.Units.Length)
        {
            output.Write(columns.Count == MaxTableColumns
                ? $"\nColumns: the {MaxTableColumns} units that saturate first; --format csv or json gives every unit.\n"
                : "\nColumns: the units that can saturate; --format csv or json gives every unit.\n");
        }

        output.Write("\nUtilisation by growth factor\n");
        WriteGrid(growth, columns, output, unit => Numbers.Percent(unit.Utilisation));
        output.Write($"\nMean wait ({suffix}) by growth factor  (- = unstable: the queue grows without limit)\n");
        WriteGrid(growth, columns, output, unit => Numbers.Compact(unit.MeanWaitHours is double h ? TimeConstants.FromHours(h, timeUnit) : null));
        WriteChart(growth, columns[0], output);
    }

    /// <summary>Writes one JSON document.</summary>
    public static void WriteJson(GrowthResult growth, Stream output)
    {
        ArgumentNullException.ThrowIfNull(growth);
        using var json = new Utf8JsonWriter(output, new JsonWriterOptions { Indented = true });
        var timeUnit = growth.Network.TimeUnit;
        json.WriteStartObject();
        json.WriteString("network", growth.Network.Name);
        json.WriteString("time_unit", TimeConstants.Name(timeUnit));
        if (growth.Stream is null)
        {
            json.WriteNull("stream");
        }
        else
        {
            json.WriteString("stream", growth.Stream);
        }

        json.WriteNumber("strain_threshold", growth.StrainThreshold);
        json.WriteStartArray("saturation_order");
        foreach (var point in growth.Saturation)
        {
            json.WriteStartObject();
            json.WriteString("unit", point.UnitId);
            json.WriteNumber("strain_factor", point.StrainFactor);
            json.WriteNumber("saturation_factor", point.SaturationFactor);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        Threshold(json, "first_strained", growth.FirstStrained, point => point.StrainFactor);
        Threshold(json, "first_unstable", growth.FirstUnstable, point => point.SaturationFactor);
        json.WriteStartArray("steps");
        foreach (var step in growth.Steps)
        {
            WriteStep(json, step, timeUnit);
        }

        json.WriteEndArray();
        json.WriteEndObject();
        json.Flush();
    }

    /// <summary>Writes long-format CSV: a header, then one row per factor and unit, factors in order.</summary>
    public static void WriteCsv(GrowthResult growth, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(growth);
        ArgumentNullException.ThrowIfNull(output);
        var timeUnit = growth.Network.TimeUnit;
        string unitName = TimeConstants.Name(timeUnit);
        output.Write(CsvHeader + "\n");
        foreach (var step in growth.Steps)
        {
            string factor = MachineFormat.Csv(step.Factor);
            foreach (var unit in step.Solution.Units)
            {
                output.Write(string.Join(',',
                    factor,
                    MachineFormat.CsvText(unit.Unit.Id),
                    MachineFormat.Csv(unit.Utilisation),
                    MachineFormat.Csv(unit.MeanWaitHours is double w ? TimeConstants.FromHours(w, timeUnit) : null),
                    MachineFormat.Csv(unit.MeanTimeInUnitHours is double t ? TimeConstants.FromHours(t, timeUnit) : null),
                    StatusWords.Name(unit.Status),
                    unitName) + "\n");
            }
        }
    }

    /// <summary>The two threshold sentences.</summary>
    public static string Findings(GrowthResult growth)
    {
        ArgumentNullException.ThrowIfNull(growth);
        if (growth.FirstUnstable is not SaturationPoint unstable || growth.FirstStrained is not SaturationPoint strained)
        {
            return $"No unit with finite servers carries the growing demand: growth of {What(growth)} never saturates any unit.";
        }

        return $"First to cross the strain threshold: {strained.UnitId} at x{Numbers.Fixed(strained.StrainFactor, 3)}{Already(strained.StrainFactor, "strained")}.\n"
            + $"First to become unstable: {unstable.UnitId} at x{Numbers.Fixed(unstable.SaturationFactor, 3)}{Already(unstable.SaturationFactor, "unstable")}.";
    }

    private static string Already(double factor, string state) => factor <= 1.0
        ? $" (already {state} at today's demand)"
        : $" ({Numbers.Percent(factor - 1.0)} more demand)";

    private static string What(GrowthResult growth) => growth.Stream is null ? "all arrivals" : $"arrivals at {growth.Stream}";

    private static string Factor(double factor) => "x" + Numbers.Fixed(factor, 3);

    private static List<int> Columns(GrowthResult growth)
    {
        var index = growth.Network.BuildIndex();
        return growth.Saturation.Take(MaxTableColumns).Select(point => index[point.UnitId]).ToList();
    }

    private static void WriteGrid(GrowthResult growth, List<int> columns, TextWriter output, Func<UnitResult, string> cell)
    {
        string[] headers = [">factor", .. columns.Select(c => ">" + growth.Network.Units[c].Id)];
        var table = new TextTable(headers);
        foreach (var step in growth.Steps)
        {
            table.Add([Factor(step.Factor), .. columns.Select(c => cell(step.Solution.Units[c]))]);
        }

        table.Write(output);
    }

    private static void WriteChart(GrowthResult growth, int column, TextWriter output)
    {
        var timeUnit = growth.Network.TimeUnit;
        var unit = growth.Network.Units[column];
        var waits = growth.Steps.Select(step => step.Solution.Units[column].MeanWaitHours is double h ? TimeConstants.FromHours(h, timeUnit) : (double?)null).ToList();
        double largest = waits.Max(wait => wait ?? 0.0);
        output.Write($"\nMean wait at {unit.Id} ({TimeConstants.Suffix(timeUnit)}), the first unit to saturate  (charts: the report draws these numbers)\n");
        for (int k = 0; k < growth.Steps.Length; k++)
        {
            string bar = waits[k] is double wait
                ? new string('#', largest > 0.0 ? (int)Math.Round(ChartWidth * wait / largest) : 0).PadRight(ChartWidth) + " " + Numbers.Compact(wait)
                : new string('!', ChartWidth) + " unstable";
            output.Write($"{Factor(growth.Steps[k].Factor)} |{bar}\n");
        }
    }

    private static void Threshold(Utf8JsonWriter json, string name, SaturationPoint? point, Func<SaturationPoint, double> factor)
    {
        if (point is null)
        {
            json.WriteNull(name);
            return;
        }

        json.WriteStartObject(name);
        json.WriteString("unit", point.UnitId);
        json.WriteNumber("factor", factor(point));
        json.WriteEndObject();
    }

    private static void WriteStep(Utf8JsonWriter json, GrowthStep step, TimeUnit timeUnit)
    {
        var solution = step.Solution;
        json.WriteStartObject();
        json.WriteNumber("factor", step.Factor);
        json.WriteNumber("external_arrival_rate", TimeConstants.RateFromPerHour(solution.Totals.ExternalArrivalsPerHour, timeUnit));
        json.WriteBoolean("stable", solution.IsStable);
        JsonTableWriter.WriteNumber(json, "mean_time_in_system", solution.Totals.MeanTimeInSystemHours is double h ? TimeConstants.FromHours(h, timeUnit) : null);
        json.WriteStartArray("units");
        foreach (var unit in solution.Units)
        {
            json.WriteStartObject();
            json.WriteString("id", unit.Unit.Id);
            json.WriteNumber("utilisation", unit.Utilisation);
            JsonTableWriter.WriteNumber(json, "mean_wait", unit.MeanWaitHours is double w ? TimeConstants.FromHours(w, timeUnit) : null);
            JsonTableWriter.WriteNumber(json, "mean_time_in_unit", unit.MeanTimeInUnitHours is double t ? TimeConstants.FromHours(t, timeUnit) : null);
            json.WriteString("status", StatusWords.Name(unit.Status));
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteEndObject();
    }
}
