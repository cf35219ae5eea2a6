using NetSolve.Model;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Formats;

/// <summary>Writes a <see cref="ResultTable"/> as an aligned plain-text table for people.</summary>
public static class PeopleTableWriter
{
    /// <summary>The header people read: a rate's header carries its time unit (<c>arrivals/h</c>).</summary>
    public static string Header(ResultColumn column, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(column);
        return column.Dimension == MetricDimension.Rate ? column.Header + "/" + TimeConstants.Suffix(timeUnit) : column.Header;
    }

    /// <summary>Writes the columns meant for people: words left-aligned, numbers right-aligned.</summary>
    public static void Write(ResultTable table, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(table);
        ArgumentNullException.ThrowIfNull(output);
        var shown = table.ColumnsFor(Audience.People);
        var text = new TextTable([.. shown.Select(i => (table.Columns[i].IsText ? string.Empty : ">") + Header(table.Columns[i], table.TimeUnit))]);
        foreach (var row in table.Rows)
        {
            text.Add([.. shown.Select(i => PeopleFormat.Cell(row[i], table.TimeUnit))]);
        }

        text.Write(output);
    }

    /// <summary>
    /// As <see cref="Write(ResultTable, TextWriter)"/> for a <see cref="ResultTable.Build"/> of these columns and rows,
    /// byte for byte, without holding every row's cells: each cell is formatted as it is read and only its text is
    /// kept (a column is left-aligned once one of its cells is text, as the table's <see cref="ResultColumn.IsText"/>).
    /// </summary>
    public static void Write<TRow>(IReadOnlyList<Column<TRow>> columns, IEnumerable<TRow> rows, TimeUnit timeUnit, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(columns);
        ArgumentNullException.ThrowIfNull(rows);
        ArgumentNullException.ThrowIfNull(output);
        var shown = columns.Where(column => ResultTable.Shows(column.Audience, Audience.People)).ToArray();
        var text = new TextTable([.. shown.Select(column => ">" + Header(new ResultColumn(column.Id, column.Header, column.Dimension, IsText: false, column.Audience), timeUnit))]);
        var isText = new bool[shown.Length];
        var cells = new string[shown.Length];
        foreach (var row in rows)
        {
            for (int i = 0; i < shown.Length; i++)
            {
                var cell = shown[i].Read(row);
                isText[i] |= cell.IsText;
                cells[i] = PeopleFormat.Cell(cell, timeUnit);
            }

            text.Add(cells);
        }

        for (int i = 0; i < shown.Length; i++)
        {
            if (isText[i])
            {
                text.AlignLeft(i);
            }
        }

        text.Write(output);
    }
}
