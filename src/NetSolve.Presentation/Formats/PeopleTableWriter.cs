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
}
