namespace NetSolve.Presentation;

/// <summary>A plain-text table with aligned columns: text left-aligned, numbers right-aligned.</summary>
/// <remarks>Mutable builder; not thread-safe. Output uses only spaces and '-' so it survives any terminal or file.</remarks>
public sealed class TextTable
{
    private readonly string[] _headers;
    private readonly bool[] _rightAligned;
    private readonly List<string[]> _rows = [];

    /// <summary>Creates a table; a header starting with '>' is right-aligned (the '>' is not shown).</summary>
    public TextTable(params string[] headers)
    {
        ArgumentNullException.ThrowIfNull(headers);
        _rightAligned = headers.Select(header => header.StartsWith('>')).ToArray();
        _headers = headers.Select(header => header.TrimStart('>')).ToArray();
    }

    /// <summary>Adds a row with one cell per column.</summary>
    public TextTable Add(params string[] cells)
    {
        ArgumentNullException.ThrowIfNull(cells);
        if (cells.Length != _headers.Length)
        {
            throw new ArgumentException($"A row needs {_headers.Length} cells, not {cells.Length}.", nameof(cells));
        }

        _rows.Add(cells);
        return this;
    }

    /// <summary>Writes the header, a rule and the rows, two spaces between columns.</summary>
    public void Write(TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(output);
        var widths = new int[_headers.Length];
        foreach (var row in _rows.Prepend(_headers))
        {
            for (int c = 0; c < row.Length; c++)
            {
                widths[c] = Math.Max(widths[c], row[c].Length);
            }
        }

        WriteRow(output, _headers, widths);
        WriteRow(output, widths.Select(width => new string('-', width)).ToArray(), widths);
        foreach (var row in _rows)
        {
            WriteRow(output, row, widths);
        }
    }

    private void WriteRow(TextWriter output, string[] cells, int[] widths)
    {
        var parts = new string[cells.Length];
        for (int c = 0; c < cells.Length; c++)
        {
            parts[c] = _rightAligned[c] ? cells[c].PadLeft(widths[c]) : cells[c].PadRight(widths[c]);
        }

        output.Write(string.Join("  ", parts).TrimEnd() + "\n");
    }
}
