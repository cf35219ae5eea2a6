using System.Text.Json;
using NetSolve.Presentation.Formats;

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
    /// does not start with one); the document itself, byte for byte, when nothing changed or it is not an object.
    /// </summary>
    public static byte[] AddToJson(byte[] json, IReadOnlyList<string> changes)
    {
        ArgumentNullException.ThrowIfNull(json);
        ArgumentNullException.ThrowIfNull(changes);
        if (changes.Count == 0)
        {
            return json;
        }

        using var buffer = new MemoryStream(json.Length + 64);
        using (var withChanges = IntoJson(buffer, changes))
        {
            withChanges.Write(json);
        }

        return buffer.ToArray();
    }

    /// <summary>
    /// A stream that passes a JSON document on to <paramref name="output"/> as it is written, adding the <c>changes</c>
    /// array as <see cref="AddToJson"/> does; <paramref name="output"/> itself when nothing changed. The document is
    /// never held whole, so an output of any size streams through.
    /// </summary>
    public static Stream IntoJson(Stream output, IReadOnlyList<string> changes)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(changes);
        if (changes.Count == 0)
        {
            return output;
        }

        // The array as the only property of an indented object: "{", the member, a line break and "}". The member
        // alone (without the braces) is what goes into a document that has other properties.
        using var alone = new MemoryStream();
        using (var writer = new Utf8JsonWriter(alone, new JsonWriterOptions { Indented = true }))
        {
            writer.WriteStartObject();
            WriteChanges(writer, changes);
            writer.WriteEndObject();
        }

        byte[] whole = alone.ToArray();
        int memberEnd = Array.LastIndexOf(whole, (byte)'\n', whole.Length - 1);
        return new JsonPropertyInsertingStream(output, whole.AsMemory(1, memberEnd - 1), whole, System.Text.Encoding.UTF8.GetBytes(NameProperty));
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
