using System.Text;
using System.Text.Json;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Tests.Presentation;

/// <summary>Runs a writer into memory, and reads a registry's contract ids, for the presentation tests.</summary>
internal static class Written
{
    /// <summary>What <paramref name="write"/> wrote, as text.</summary>
    public static string Text(Action<TextWriter> write)
    {
        using var output = new StringWriter();
        write(output);
        return output.ToString();
    }

    /// <summary>What <paramref name="write"/> wrote, parsed as one JSON document.</summary>
    public static JsonDocument Json(Action<Stream> write)
    {
        using var buffer = new MemoryStream();
        write(buffer);
        return JsonDocument.Parse(Encoding.UTF8.GetString(buffer.ToArray()));
    }

    /// <summary>The cells of the table row that starts with <paramref name="first"/>, split at spaces.</summary>
    public static string[] Cells(string table, string first) =>
        table.Split('\n').Single(line => line.StartsWith(first + " ", StringComparison.Ordinal)).Split(' ', StringSplitOptions.RemoveEmptyEntries);

    /// <summary>The names of an object's fields, in order.</summary>
    public static string[] FieldNames(JsonElement element) => [.. element.EnumerateObject().Select(field => field.Name)];

    /// <summary>The ids of the columns programs see (JSON, CSV), in order.</summary>
    public static string[] MachineIds<TRow>(IEnumerable<Column<TRow>> columns) =>
        [.. columns.Where(column => column.Audience != Audience.People).Select(column => column.Id)];
}
