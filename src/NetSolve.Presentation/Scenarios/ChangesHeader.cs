using System.Text.Json;

namespace NetSolve.Presentation.Scenarios;

/// <summary>
/// Puts a scenario's or <c>--set</c>'s changes into a finished output, so a table, JSON document or map made from a
/// changed network says what changed without the reader opening the scenario file. With no changes every output
/// stays exactly as it was.
/// </summary>
public static class ChangesHeader
{
    /// <summary>The JSON property that lists the changes, one phrase each.</summary>
    public const string JsonProperty = "changes";

    /// <summary>The JSON property the changes follow: the network's name, which already says scenario or what-if.</summary>
    private const string NameProperty = "network";

    /// <summary>The line under a title: <c>changes: imaging: +1 server; lab: service ×0.8</c>.</summary>
    public static string Line(IReadOnlyList<string> changes)
    {
        ArgumentNullException.ThrowIfNull(changes);
        return "changes: " + string.Join("; ", changes);
    }

    /// <summary>A table with the changes line under its first line, the title; the table itself when nothing changed.</summary>
    /// <param name="table">The rendered table.</param>
    /// <param name="changes">The changes, in the order they applied.</param>
    /// <param name="newLine">The table's line break.</param>
    public static string AddToTable(string table, IReadOnlyList<string> changes, string newLine = "\n")
    {
        ArgumentNullException.ThrowIfNull(table);
        ArgumentNullException.ThrowIfNull(changes);
        if (changes.Count == 0)
        {
            return table;
        }

        int end = table.IndexOf('\n', StringComparison.Ordinal);
        return end < 0
            ? table + newLine + Line(changes)
            : string.Concat(table.AsSpan(0, end + 1), Line(changes), newLine, table.AsSpan(end + 1));
    }

    /// <summary>
    /// A JSON document with a top-level <c>changes</c> array of strings after its <c>network</c> name (first when it
    /// has none); the document itself, byte for byte, when nothing changed or it is not an object.
    /// </summary>
    public static byte[] AddToJson(byte[] json, IReadOnlyList<string> changes)
    {
        ArgumentNullException.ThrowIfNull(json);
        ArgumentNullException.ThrowIfNull(changes);
        if (changes.Count == 0)
        {
            return json;
        }

        using var document = JsonDocument.Parse(json);
        if (document.RootElement.ValueKind != JsonValueKind.Object)
        {
            return json;
        }

        bool hasName = document.RootElement.TryGetProperty(NameProperty, out _);
        using var buffer = new MemoryStream();
        using (var writer = new Utf8JsonWriter(buffer, new JsonWriterOptions { Indented = true }))
        {
            writer.WriteStartObject();
            if (!hasName)
            {
                WriteChanges(writer, changes);
            }

            foreach (var property in document.RootElement.EnumerateObject())
            {
                property.WriteTo(writer);
                if (hasName && property.NameEquals(NameProperty))
                {
                    WriteChanges(writer, changes);
                }
            }

            writer.WriteEndObject();
        }

        return buffer.ToArray();
    }

    private static void WriteChanges(Utf8JsonWriter writer, IReadOnlyList<string> changes)
    {
        writer.WriteStartArray(JsonProperty);
        foreach (string change in changes)
        {
            writer.WriteStringValue(change);
        }

        writer.WriteEndArray();
    }
}
