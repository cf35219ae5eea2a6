using System.Text.Json;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Growth;

/// <summary>Writes a <see cref="GrowthResult"/> as the contract's JSON document.</summary>
/// <remarks>
/// The document nests each step's units inside the step, so it is written by hand; every value still comes from a
/// registry's cell and is converted to the network's time unit by <see cref="MachineFormat"/>.
/// </remarks>
public static class GrowthJsonWriter
{
    /// <summary>Writes <paramref name="growth"/> to <paramref name="output"/>, indented, UTF-8.</summary>
    public static void Write(GrowthResult growth, Stream output)
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
        JsonTableWriter.WriteArray(SaturationColumns.Table(growth), "saturation_order", json);
        Threshold(json, "first_strained", growth.FirstStrained, SaturationColumns.StrainFactor, timeUnit);
        Threshold(json, "first_unstable", growth.FirstUnstable, SaturationColumns.SaturationFactor, timeUnit);
        JsonTableWriter.WriteArray(BedLimitColumns.Table(growth), "bed_limits", json);
        json.WriteStartArray("steps");
        foreach (var step in growth.Steps)
        {
            WriteStep(json, step, timeUnit);
        }

        json.WriteEndArray();
        json.WriteEndObject();
        json.Flush();
    }

    private static void Threshold(Utf8JsonWriter json, string name, SaturationPoint? point, Column<SaturationPoint> factor, TimeUnit timeUnit)
    {
        if (point is null)
        {
            json.WriteNull(name);
            return;
        }

        json.WriteStartObject(name);
        Write(json, SaturationColumns.Unit, point, timeUnit);
        JsonTableWriter.WriteCell(json, "factor", factor.Read(point), timeUnit);
        json.WriteEndObject();
    }

    private static void WriteStep(Utf8JsonWriter json, GrowthStep step, TimeUnit timeUnit)
    {
        var totals = step.Solution.Totals;
        json.WriteStartObject();
        Write(json, GrowthStepColumns.Factor, step, timeUnit);
        Write(json, GrowthStepColumns.ExternalArrivalRate, totals, timeUnit);
        json.WriteBoolean("stable", step.Solution.IsStable);
        Write(json, GrowthStepColumns.MeanTimeInSystem, totals, timeUnit);

        JsonTableWriter.WriteArray(GrowthStepColumns.UnitTable(step, timeUnit), "units", json);
        json.WriteEndObject();
    }

    private static void Write<TRow>(Utf8JsonWriter json, Column<TRow> column, TRow row, TimeUnit timeUnit) =>
        JsonTableWriter.WriteCell(json, column.Id, column.Read(row), timeUnit);
}
