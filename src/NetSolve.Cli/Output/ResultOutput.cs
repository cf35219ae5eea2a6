using NetSolve.Presentation;
using NetSolve.Presentation.Scenarios;

namespace NetSolve.Cli.Output;

/// <summary>
/// Writes a command's one result to stdout in the format asked for, streamed as the writer produces it: memory stays
/// flat however long the output. Everything that can fail on bad input (reading, the rules, solving, simulating)
/// has happened before the first byte; the writers only format a finished result, so a bad input never leaves half
/// a document. A table that carries advice ends with the planning caution.
/// </summary>
/// <param name="output">Stdout.</param>
/// <param name="format">The format asked for.</param>
/// <param name="caution">The caution the table ends with (<see cref="Caution.Text"/> for advice from the steady-state formulas), or null; JSON and CSV never carry it.</param>
/// <param name="changes">
/// What a scenario file or <c>--set</c> changed, listed under the table's title and in the JSON's <c>changes</c>
/// array (<see cref="ChangesHeader"/>); CSV rows stay plain data. Null or empty leaves every output as it was.
/// </param>
internal sealed class ResultOutput(TextWriter output, OutputFormat format, string? caution, IReadOnlyList<string>? changes = null)
{
    /// <summary>The format asked for.</summary>
    public OutputFormat Format => format;

    /// <summary>The same output with another caution under the table, for a result that rests on other assumptions (an hour-by-hour roster).</summary>
    public ResultOutput WithCaution(string otherCaution) => new(output, format, otherCaution, changes);

    /// <summary>Writes the result with the writer for <see cref="Format"/>.</summary>
    /// <param name="json">Writes the JSON document (UTF-8); a line break follows it.</param>
    /// <param name="csv">Writes the CSV rows.</param>
    /// <param name="table">Writes the table for people.</param>
    public void Write(Action<Stream> json, Action<TextWriter> csv, Action<TextWriter> table)
    {
        ArgumentNullException.ThrowIfNull(json);
        ArgumentNullException.ThrowIfNull(csv);
        ArgumentNullException.ThrowIfNull(table);
        switch (format)
        {
            case OutputFormat.Json:
                using (var bytes = Utf8Sink.Over(output))
                using (var document = ChangesHeader.IntoJson(bytes, changes ?? []))
                {
                    json(document);
                    document.Flush();
                }

                output.Write("\n");
                break;
            case OutputFormat.Csv:
                csv(output);
                break;
            default:
                WriteTable(table);
                break;
        }
    }

    private void WriteTable(Action<TextWriter> table)
    {
        using var sink = new TableSink(output, changes is { Count: > 0 } ? ChangesHeader.Line(changes) : null) { NewLine = output.NewLine };
        table(sink);
        if (caution is not null)
        {
            sink.Write("\n" + caution + "\n");
        }

        sink.Finish();
    }
}
