using System.Text;
using NetSolve.Presentation;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Scenarios;

namespace NetSolve.Cli.Output;

/// <summary>
/// Writes a command's one result to stdout in the format asked for, whole or not at all: everything is rendered
/// first, so a failure never leaves half a document. A table that carries advice ends with the planning caution.
/// </summary>
/// <param name="output">Stdout.</param>
/// <param name="format">The format asked for.</param>
/// <param name="withCaution">True when the table ends with <see cref="Caution.Text"/>; JSON and CSV never carry it.</param>
/// <param name="changes">
/// What a scenario file or <c>--set</c> changed, listed under the table's title and in the JSON's <c>changes</c>
/// array (<see cref="ChangesHeader"/>); CSV rows stay plain data. Null or empty leaves every output as it was.
/// </param>
internal sealed class ResultOutput(TextWriter output, OutputFormat format, bool withCaution, IReadOnlyList<string>? changes = null)
{
    /// <summary>The format asked for.</summary>
    public OutputFormat Format => format;

    /// <summary>Renders the result with the writer for <see cref="Format"/>, then writes it.</summary>
    /// <param name="json">Writes the JSON document (UTF-8); a line break follows it.</param>
    /// <param name="csv">Writes the CSV rows.</param>
    /// <param name="table">Writes the table for people.</param>
    public void Write(Action<Stream> json, Action<TextWriter> csv, Action<TextWriter> table)
    {
        ArgumentNullException.ThrowIfNull(json);
        ArgumentNullException.ThrowIfNull(csv);
        ArgumentNullException.ThrowIfNull(table);
        output.Write(Render(json, csv, table));
    }

    private string Render(Action<Stream> json, Action<TextWriter> csv, Action<TextWriter> table)
    {
        if (format == OutputFormat.Json)
        {
            using var buffer = new MemoryStream();
            json(buffer);
            return Encoding.UTF8.GetString(ChangesHeader.AddToJson(buffer.ToArray(), changes ?? [])) + "\n";
        }

        using var writer = new StringWriter(System.Globalization.CultureInfo.InvariantCulture) { NewLine = output.NewLine };
        if (format == OutputFormat.Csv)
        {
            csv(writer);
        }
        else
        {
            table(writer);
            if (changes is { Count: > 0 })
            {
                string titled = ChangesHeader.AddToTable(writer.ToString(), changes, output.NewLine);
                writer.GetStringBuilder().Clear().Append(titled);
            }

            if (withCaution)
            {
                writer.Write("\n" + Caution.Text + "\n");
            }

            // A label or name with an escape or other control character must not drive the terminal.
            return SafeText.ForTerminal(writer.ToString());
        }

        return writer.ToString();
    }
}
