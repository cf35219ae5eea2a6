using System.Text.Json;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Presentation;

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
        var timeUnit = solution.Network.TimeUnit;
        json.WriteStartObject();
        json.WriteString("network", solution.Network.Name);
        json.WriteString("time_unit", TimeConstants.Name(timeUnit));
        json.WriteBoolean("stable", solution.IsStable);
        json.WriteStartArray("units");
        foreach (var result in solution.Units)
        {
            WriteUnit(json, UnitView.From(result, timeUnit));
        }

        json.WriteEndArray();
        var totals = solution.Totals;
        json.WriteStartObject("totals");
        json.WriteNumber("external_arrival_rate", TimeConstants.RateFromPerHour(totals.ExternalArrivalsPerHour, timeUnit));
        Number(json, "throughput", totals.ThroughputPerHour is double t ? TimeConstants.RateFromPerHour(t, timeUnit) : null);
        Number(json, "mean_in_system", totals.MeanInSystem);
        Number(json, "mean_time_in_system", totals.MeanTimeInSystemHours is double h ? TimeConstants.FromHours(h, timeUnit) : null);
        json.WriteEndObject();
        json.WriteEndObject();
        json.Flush();
    }

    private static void WriteUnit(Utf8JsonWriter json, UnitView unit)
    {
        json.WriteStartObject();
        json.WriteString("id", unit.Id);
        json.WriteString("label", unit.Label);
        Number(json, "servers", unit.Servers);
        json.WriteNumber("arrival_rate", unit.ArrivalRate);
        json.WriteNumber("visits_per_patient", unit.VisitsPerPatient);
        json.WriteNumber("offered_load", unit.OfferedLoad);
        json.WriteNumber("utilisation", unit.Utilisation);
        json.WriteNumber("p_wait", unit.PWait);
        Number(json, "mean_queue", unit.MeanQueue);
        Number(json, "mean_wait", unit.MeanWait);
        Number(json, "mean_in_unit", unit.MeanInUnit);
        Number(json, "mean_time_in_unit", unit.MeanTimeInUnit);
        Number(json, "headroom", unit.Headroom);
        json.WriteString("status", unit.Status);
        json.WriteEndObject();
    }

    /// <summary>Writes a number, or null when absent.</summary>
    public static void Number(Utf8JsonWriter json, string name, double? value)
    {
        ArgumentNullException.ThrowIfNull(json);
        if (value is double number)
        {
            json.WriteNumber(name, number);
        }
        else
        {
            json.WriteNull(name);
        }
    }
}
