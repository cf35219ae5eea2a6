namespace NetSolve.Fitting.Reading;

/// <summary>One row of a small CSV file: the line it starts on, its cells trimmed, and the 1-based column where each cell begins.</summary>
internal readonly record struct CsvLine(int Line, string[] Cells, int[] Columns)
{
    /// <summary>The column of cell <paramref name="cell"/>, or of the last cell when the row has fewer.</summary>
    public int ColumnOf(int cell) => Columns[Math.Min(cell, Columns.Length - 1)];
}
