namespace NetSolve.Presentation;

/// <summary>A plain-text table with aligned columns: text left-aligned, numbers right-aligned.</summary>
/// <remarks>
/// Mutable builder; not thread-safe. Output uses only spaces and '-' so it survives any terminal or file. The cells are
/// kept as characters (<see cref="TextCells"/>), not as strings, and each line is written as it is laid out, so a
/// table of 100,000 units costs its characters once, not a string per cell and per line.
/// </remarks>
public sealed class TextTable
{
    private const string Gap = "  ";

    private readonly string[] _headers;
    private readonly bool[] _rightAligned;
    private readonly int[] _widths;
    private readonly TextCells _cells = new();
    private int _rowCount;

    /// <summary>Creates a table; a header starting with '>' is right-aligned (the '>' is not shown).</summary>
    public TextTable(params string[] headers)
    {
        ArgumentNullException.ThrowIfNull(headers);
        _rightAligned = headers.Select(header => header.StartsWith('>')).ToArray();
        _headers = headers.Select(header => header.TrimStart('>')).ToArray();
        _widths = _headers.Select(header => header.Length).ToArray();
    }

    /// <summary>Adds a row with one cell per column.</summary>
    public TextTable Add(params string[] cells)
    {
        ArgumentNullException.ThrowIfNull(cells);
        if (cells.Length != _headers.Length)
        {
            throw new ArgumentException($"A row needs {_headers.Length} cells, not {cells.Length}.", nameof(cells));
        }

        for (int c = 0; c < cells.Length; c++)
        {
            string cell = cells[c] ?? throw new ArgumentException("A cell is null.", nameof(cells));
            _widths[c] = Math.Max(_widths[c], cell.Length);
            _cells.Add(cell);
        }

        _rowCount++;
        return this;
    }

    /// <summary>Left-aligns a column whatever its header said (a column found to hold text once its rows are in).</summary>
    /// <param name="column">The column, from 0.</param>
    public void AlignLeft(int column) => _rightAligned[column] = false;

    /// <summary>Writes the header, a rule and the rows, two spaces between columns.</summary>
    public void Write(TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(output);
        var line = new System.Text.StringBuilder();
        WriteLine(output, line, _headers.Select(header => header.AsMemory()).ToArray());
        WriteLine(output, line, _widths.Select(width => new string('-', width).AsMemory()).ToArray());
        var reader = _cells.Read();
        for (int row = 0; row < _rowCount; row++)
        {
            line.Clear();
            for (int c = 0; c < _headers.Length; c++)
            {
                AppendCell(line, c, reader.Next());
            }

            WriteLine(output, line);
        }
    }

    private void WriteLine(TextWriter output, System.Text.StringBuilder line, ReadOnlyMemory<char>[] cells)
    {
        line.Clear();
        for (int c = 0; c < cells.Length; c++)
        {
            AppendCell(line, c, cells[c].Span);
        }

        WriteLine(output, line);
    }

    /// <summary>One cell padded to its column's width (as <see cref="string.PadLeft(int)"/> or <see cref="string.PadRight(int)"/> would), after the gap.</summary>
    private void AppendCell(System.Text.StringBuilder line, int column, ReadOnlySpan<char> cell)
    {
        if (column > 0)
        {
            line.Append(Gap);
        }

        int padding = Math.Max(0, _widths[column] - cell.Length);
        if (_rightAligned[column])
        {
            line.Append(' ', padding).Append(cell);
        }
        else
        {
            line.Append(cell).Append(' ', padding);
        }
    }

    /// <summary>The line without its trailing white space (as <see cref="string.TrimEnd()"/>), then a line feed.</summary>
    private static void WriteLine(TextWriter output, System.Text.StringBuilder line)
    {
        int end = line.Length;
        while (end > 0 && char.IsWhiteSpace(line[end - 1]))
        {
            end--;
        }

        line.Length = end;
        line.Append('\n');
        output.Write(line);
    }
}
