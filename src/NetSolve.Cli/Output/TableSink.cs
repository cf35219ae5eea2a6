using System.Text;
using NetSolve.Presentation.Formats;

namespace NetSolve.Cli.Output;

/// <summary>
/// Passes a table for people on to stdout line by line as it is written: every line cleaned for the terminal
/// (<see cref="SafeText.ForTerminal"/>: a label with an escape character must not drive it), and an optional line
/// added under the first one, the title. Only the line being written is held, so a table of any length streams.
/// </summary>
/// <param name="output">Stdout.</param>
/// <param name="underTitle">A line to add under the title (the scenario's changes), or null.</param>
internal sealed class TableSink(TextWriter output, string? underTitle) : TextWriter(System.Globalization.CultureInfo.InvariantCulture)
{
    private readonly StringBuilder _line = new();
    private bool _titleWritten;

    /// <inheritdoc/>
    public override Encoding Encoding => output.Encoding;

    /// <inheritdoc/>
    public override void Write(char value)
    {
        _line.Append(value);
        if (value == '\n')
        {
            EndLine();
        }
    }

    /// <inheritdoc/>
    public override void Write(string? value) => Write(value.AsSpan());

    /// <inheritdoc/>
    public override void Write(char[] buffer, int index, int count) => Write(buffer.AsSpan(index, count));

    /// <inheritdoc/>
    public override void Write(ReadOnlySpan<char> buffer)
    {
        while (!buffer.IsEmpty)
        {
            int end = buffer.IndexOf('\n');
            if (end < 0)
            {
                _line.Append(buffer);
                return;
            }

            _line.Append(buffer[..(end + 1)]);
            EndLine();
            buffer = buffer[(end + 1)..];
        }
    }

    /// <summary>Writes what is left of the last line; a table with no line break still gets its added line after it.</summary>
    public void Finish()
    {
        if (!_titleWritten && underTitle is not null)
        {
            _line.Append(NewLine).Append(underTitle);
        }

        _titleWritten = true;
        WriteHeldLine();
    }

    private void EndLine()
    {
        if (!_titleWritten && underTitle is not null)
        {
            _line.Append(underTitle).Append(NewLine);
        }

        _titleWritten = true;
        WriteHeldLine();
    }

    private void WriteHeldLine()
    {
        output.Write(SafeText.ForTerminal(_line.ToString()));
        _line.Clear();
    }
}
