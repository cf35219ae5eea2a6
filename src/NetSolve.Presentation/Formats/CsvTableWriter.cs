using System.Globalization;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Formats;

/// <summary>Writes a <see cref="ResultTable"/> as CSV: the contract's ids as header, one row per result row.</summary>
public static class CsvTableWriter
{
    /// <summary>Room for any double's round-trip text ("-1.7976931348623157E+308" is 24 characters).</summary>
    private const int RoundTripLength = 32;

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

            WriteCell(row[shown[i]], timeUnit, output);
        }

        output.Write('\n');
    }

    /// <summary>
    /// <see cref="MachineFormat.CsvCell"/> written straight to <paramref name="output"/>: a number is formatted into a
    /// buffer on the stack (the same round-trip text) rather than into a string per cell.
    /// </summary>
    private static void WriteCell(Cell cell, TimeUnit timeUnit, TextWriter output)
    {
        if (cell.Text is null && MachineFormat.Value(cell, timeUnit) is double number)
        {
            Span<char> digits = stackalloc char[RoundTripLength];
            if (number.TryFormat(digits, out int written, "R", CultureInfo.InvariantCulture))
            {
                output.Write(digits[..written]);
                return;
            }
        }

        output.Write(MachineFormat.CsvCell(cell, timeUnit));
    }
}
