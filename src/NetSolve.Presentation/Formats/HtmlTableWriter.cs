using System.Net;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Formats;

/// <summary>
/// Writes a <see cref="ResultTable"/> as an HTML table for people: the columns meant for people, headers as the
/// registry gives them, every value in <see cref="PeopleFormat"/>, so a page shows what the plain-text table shows.
/// </summary>
/// <remarks>
/// Every header and cell carries <c>data-metric</c> with the column's contract id, so a reader (or a test) can tie
/// what is shown to the JSON field it comes from. All text is HTML-encoded. Thread-safe.
/// </remarks>
public static class HtmlTableWriter
{
    /// <summary>Writes the table: a <c>thead</c> row of headers, then one <c>tr</c> per row.</summary>
    public static void Write(ResultTable table, TextWriter output, HtmlTableOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(table);
        ArgumentNullException.ThrowIfNull(output);
        options ??= new HtmlTableOptions();
        var shown = table.ColumnsFor(Audience.People);
        int key = options.RowKey is string rowKey ? IndexOf(table, rowKey) : -1;

        output.Write("<table" + Attribute("id", options.Id) + ">\n<thead><tr>");
        foreach (int i in shown)
        {
            output.Write("<th" + Attribute("data-metric", table.Columns[i].Id) + ">" + Encode(PeopleTableWriter.Header(table.Columns[i], table.TimeUnit)) + "</th>");
        }

        output.Write("</tr></thead>\n<tbody>\n");
        for (int row = 0; row < table.Rows.Length; row++)
        {
            var cells = table.Rows[row];
            output.Write("<tr" + (key >= 0 ? Attribute(options.RowAttribute, cells[key].Text) : string.Empty) + ">");
            foreach (int i in shown)
            {
                var column = table.Columns[i];
                string extra = options.CellAttributes is { } attributes
                    ? string.Concat(attributes(row, column).Select(pair => Attribute(pair.Key, pair.Value)))
                    : string.Empty;
                output.Write("<td" + Attribute("data-metric", column.Id) + extra + ">" + Encode(PeopleFormat.Cell(cells[i], table.TimeUnit)) + "</td>");
            }

            output.Write("</tr>\n");
        }

        output.Write("</tbody>\n</table>\n");
    }

    private static int IndexOf(ResultTable table, string id)
    {
        for (int i = 0; i < table.Columns.Length; i++)
        {
            if (table.Columns[i].Id == id)
            {
                return i;
            }
        }

        throw new ArgumentException($"The table has no column '{id}' to key its rows by.", nameof(table));
    }

    private static string Attribute(string? name, string? value) =>
        name is null || value is null ? string.Empty : " " + name + "=\"" + Encode(value) + "\"";

    private static string Encode(string text) => WebUtility.HtmlEncode(SafeText.ForDisplay(text));
}
