using System.Text.Json;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.ByHour;

/// <summary>
/// Writes a unit's <c>by_hour</c> block (docs/network-file.md, "By hour"): one array per column of
/// <see cref="ByHourColumns"/>, hour 00–01 (Monday in a week) first, named as the simulation's JSON names the same quantity.
/// </summary>
public static class ByHourJsonWriter
{
    private static readonly (string Name, Column<ByHourRow> Column)[] Arrays =
    [
        ("arrival_rate_by_hour", ByHourColumns.ArrivalRate),
        ("servers_by_hour", ByHourColumns.Servers),
        ("utilisation_by_hour", ByHourColumns.Utilisation),
        ("mean_queue_by_hour", ByHourColumns.MeanQueue),
        ("mean_wait_by_hour", ByHourColumns.MeanWait),
        ("method_by_hour", ByHourColumns.Method),
    ];

    /// <summary>The names of the arrays in a <c>by_hour</c> block, in order.</summary>
    public static IReadOnlyList<string> ArrayNames { get; } = [.. Arrays.Select(array => array.Name)];

    /// <summary>Writes <c>"by_hour": { ... }</c> for <paramref name="unit"/> into the unit's object.</summary>
    public static void Write(ByHourUnit unit, TimeUnit timeUnit, Utf8JsonWriter json)
    {
        ArgumentNullException.ThrowIfNull(unit);
        ArgumentNullException.ThrowIfNull(json);
        json.WriteStartObject("by_hour");
        json.WriteNumber("hours", unit.CycleHours);
        foreach (var (name, column) in Arrays)
        {
            json.WriteStartArray(name);
            for (int hour = 0; hour < unit.CycleHours; hour++)
            {
                var cell = column.Read(new ByHourRow(unit, hour));
                if (cell.Text is string text)
                {
                    json.WriteStringValue(text);
                }
                else if (MachineFormat.Value(cell, timeUnit) is double value)
                {
                    json.WriteNumberValue(value);
                }
                else
                {
                    json.WriteNullValue();
                }
            }

            json.WriteEndArray();
        }

        json.WriteEndObject();
    }
}
