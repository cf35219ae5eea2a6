using NetSolve.Model;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Formats;

/// <summary>Writes a <see cref="ResultTable"/> as CSV: the contract's ids as header, one row per result row.</summary>
public static class CsvTableWriter
{
    /// <summary>The header row of the columns meant for programs.</summary>
    public static string Header(ResultTable table)
    {
        ArgumentNullException.ThrowIfNull(table);
        return string.Join(',', table.ColumnsFor(Audience.Machines).Select(i => table.Columns[i].Id));
    }

    /// <summary>Writes the header and the rows, values in the network's time unit at full precision.</summary>
    public static void Write(ResultTable table, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(table);
        ArgumentNullException.ThrowIfNull(output);
        var shown = table.ColumnsFor(Audience.Machines);
        output.Write(Header(table) + "\n");
        foreach (var row in table.Rows)
        {
            WriteRow(row, shown, table.TimeUnit, output);
        }
    }

    /// <summary>One row as <see cref="Write"/> writes it: the cells at <paramref name="shown"/>, comma-separated, then a line feed.</summary>
    public static void WriteRow(IReadOnlyList<Cell> row, IReadOnlyList<int> shown, TimeUnit timeUnit, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(row);
        ArgumentNullException.ThrowIfNull(shown);
        ArgumentNullException.ThrowIfNull(output);
        for (int i = 0; i < shown.Count; i++)
        {
            if (i > 0)
            {
                output.Write(',');
            }

            output.Write(MachineFormat.CsvCell(row[shown[i]], timeUnit));
        }

        output.Write('\n');
    }
}
