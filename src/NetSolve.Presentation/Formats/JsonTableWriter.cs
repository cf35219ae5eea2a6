using System.Runtime.CompilerServices;
using System.Text.Json;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Formats;

/// <summary>Writes a <see cref="ResultTable"/>'s rows as JSON objects keyed by the contract's ids.</summary>
public static class JsonTableWriter
{
    /// <summary>Bytes a writer may hold before <see cref="PassOnWhenFull"/> hands them to its stream.</summary>
    public const int PassOnAt = 1 << 16;

    /// <summary>Writes an array property <paramref name="name"/> with one object per row.</summary>
    public static void WriteArray(ResultTable table, string name, Utf8JsonWriter json)
    {
        ArgumentNullException.ThrowIfNull(table);
        ArgumentNullException.ThrowIfNull(json);
        json.WriteStartArray(name);
        foreach (var row in table.Rows)
        {
            WriteObject(table, row, json);
            PassOnWhenFull(json);
        }

        json.WriteEndArray();
    }

    /// <summary>
    /// Hands what <paramref name="json"/> holds to its stream once it holds <see cref="PassOnAt"/> bytes. A
    /// <see cref="Utf8JsonWriter"/> over a stream keeps everything until it is flushed: without this a 100,000-unit
    /// document (68 MB) was held whole, in a buffer regrown by doubling (139 MB allocated).
    /// </summary>
    public static void PassOnWhenFull(Utf8JsonWriter json)
    {
        ArgumentNullException.ThrowIfNull(json);
        if (json.BytesPending >= PassOnAt)
        {
            json.Flush();
        }
    }

    /// <summary>Writes one row as an object: numbers in the network's time unit, absent values as null.</summary>
    public static void WriteObject(ResultTable table, IReadOnlyList<Cell> row, Utf8JsonWriter json)
    {
        ArgumentNullException.ThrowIfNull(table);
        ArgumentNullException.ThrowIfNull(row);
        ArgumentNullException.ThrowIfNull(json);
        json.WriteStartObject();
        foreach (int i in table.ColumnsFor(Audience.Machines))
        {
            WriteCell(json, table.Columns[i].Id, row[i], table.TimeUnit);
        }

        json.WriteEndObject();
    }

    /// <summary>
    /// Writes the fields of one row into the object being written, for documents that put a result's values beside
    /// other fields rather than in an object of their own.
    /// </summary>
    public static void WriteFields(ResultTable table, IReadOnlyList<Cell> row, Utf8JsonWriter json)
    {
        ArgumentNullException.ThrowIfNull(table);
        ArgumentNullException.ThrowIfNull(row);
        ArgumentNullException.ThrowIfNull(json);
        foreach (int i in table.ColumnsFor(Audience.Machines))
        {
            WriteCell(json, table.Columns[i].Id, row[i], table.TimeUnit);
        }
    }

    /// <summary>Writes one named value: a string for text, a number, or null when absent.</summary>
    public static void WriteCell(Utf8JsonWriter json, string name, Cell cell, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(json);
        if (cell.Text is string text)
        {
            json.WriteString(name, text);
        }
        else
        {
            WriteNumber(json, name, MachineFormat.Value(cell, timeUnit));
        }
    }

    /// <summary>As the other overload, with the name encoded once for many rows (the per-unit values of a large network).</summary>
    // Optimized from its first call: a one-time pass over 100,000 units spent most of its time here in tier-0 and
    // instrumented copies (docs/performance.md).
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void WriteCell(Utf8JsonWriter json, JsonEncodedText name, Cell cell, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(json);
        if (cell.Text is string text)
        {
            json.WriteString(name, text);
        }
        else if (MachineFormat.Value(cell, timeUnit) is double number)
        {
            // The runtime's round-trip text, byte for byte, written by the faster formatter.
            Span<byte> digits = stackalloc byte[ShortestRoundTrip.MaxLength];
            json.WritePropertyName(name);
            json.WriteRawValue(digits[..ShortestRoundTrip.Format(number, digits)], skipInputValidation: true);
        }
        else
        {
            json.WriteNull(name);
        }
    }

    /// <summary>Writes a number, or null when absent or not finite (JSON has no infinity).</summary>
    public static void WriteNumber(Utf8JsonWriter json, string name, double? value)
    {
        ArgumentNullException.ThrowIfNull(json);
        if (MachineFormat.Finite(value) is double number)
        {
            json.WriteNumber(name, number);
        }
        else
        {
            json.WriteNull(name);
        }
    }
}
