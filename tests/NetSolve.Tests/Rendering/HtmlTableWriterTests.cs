using System.Text.RegularExpressions;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Presentation.Solution;

namespace NetSolve.Tests.Rendering;

public partial class HtmlTableWriterTests
{
    /// <summary>An invented result row: a name that needs encoding, a tiny wait and a rate.</summary>
    private sealed record Row(string Key, string Name, double WaitHours, double PerHour);

    private static readonly Column<Row>[] RowColumns =
    [
        Columns.Words<Row>("key", "key", row => row.Key, Audience.Machines),
        Columns.Words<Row>("name", "name", row => row.Name),
        Columns.Number<Row>("mean_wait", "wait", MetricDimension.Time, row => row.WaitHours),
        Columns.Number<Row>("arrival_rate", "arrivals", MetricDimension.Rate, row => row.PerHour),
    ];

    private static string Write(ResultTable table, HtmlTableOptions? options = null)
    {
        using var output = new StringWriter();
        HtmlTableWriter.Write(table, output, options);
        return output.ToString();
    }

    [Fact]
    public void Every_header_and_cell_carries_its_contract_id_and_headers_come_from_the_registry()
    {
        var solution = RenderingFixtures.Solved("harbourside");
        var table = UnitColumns.Table(solution);
        string html = Write(table);

        var people = table.ColumnsFor(Audience.People).Select(i => table.Columns[i]).ToList();
        var headers = HeaderRegex().Matches(html).Select(m => (m.Groups[1].Value, m.Groups[2].Value)).ToList();
        Assert.Equal(people.Select(c => (c.Id, PeopleTableWriter.Header(c, table.TimeUnit))), headers);
        Assert.Contains(("arrival_rate", "arrivals/h"), headers);
        Assert.DoesNotContain(headers, header => header.Item1 == "label");

        var rows = RowRegex().Matches(html).Select(m => CellRegex().Matches(m.Value).Select(c => c.Groups[1].Value).ToList()).ToList();
        Assert.Equal(solution.Units.Length, rows.Count);
        Assert.All(rows, ids => Assert.Equal(people.Select(c => c.Id), ids, StringComparer.Ordinal));
    }

    [Fact]
    public void Values_read_as_in_the_people_table_and_text_is_html_encoded()
    {
        var table = ResultTable.Build(RowColumns, [new Row("a&e", "A&E <resus> \"bay\"", 2e-14, 11.5)], TimeUnit.Hour);
        string html = Write(table, new HtmlTableOptions { Id = "t", RowAttribute = "data-unit", RowKey = "key" });

        // Source: PeopleFormat: a time below 0.001 min is "< 0.001 min", never 2E-14; a rate has four significant digits.
        Assert.StartsWith("<table id=\"t\">\n<thead><tr>", html, StringComparison.Ordinal);
        Assert.Contains(
            "<tr data-unit=\"a&amp;e\"><td data-metric=\"name\">A&amp;E &lt;resus&gt; &quot;bay&quot;</td>"
            + "<td data-metric=\"mean_wait\">&lt; 0.001 min</td><td data-metric=\"arrival_rate\">11.50</td></tr>",
            html,
            StringComparison.Ordinal);
        Assert.DoesNotContain("E-", html, StringComparison.Ordinal);
        Assert.EndsWith("</tbody>\n</table>\n", html, StringComparison.Ordinal);
    }

    [Fact]
    public void A_page_may_add_encoded_attributes_to_chosen_cells()
    {
        var table = ResultTable.Build(RowColumns, [new Row("x", "X", 1.0, 1.0), new Row("y", "Y", 1.0, 1.0)], TimeUnit.Hour);
        string html = Write(table, new HtmlTableOptions
        {
            CellAttributes = (row, column) => column.Id == "name" ? [new("title", row == 0 ? "first <" : "second")] : [],
        });

        Assert.Contains("<td data-metric=\"name\" title=\"first &lt;\">X</td>", html, StringComparison.Ordinal);
        Assert.Contains("<td data-metric=\"name\" title=\"second\">Y</td>", html, StringComparison.Ordinal);
        Assert.Contains("<td data-metric=\"mean_wait\">1.000 h</td>", html, StringComparison.Ordinal);
        Assert.Contains("<table>", html, StringComparison.Ordinal);
    }

    [Fact]
    public void Keying_rows_by_a_column_the_table_lacks_is_refused()
    {
        var table = ResultTable.Build(RowColumns, [], TimeUnit.Hour);
        Assert.Throws<ArgumentException>("table", () => Write(table, new HtmlTableOptions { RowAttribute = "data-unit", RowKey = "nope" }));
    }

    [GeneratedRegex("<th data-metric=\"([^\"]+)\">([^<]*)</th>")]
    private static partial Regex HeaderRegex();

    [GeneratedRegex("<tr><td.*?</tr>")]
    private static partial Regex RowRegex();

    [GeneratedRegex("<td data-metric=\"([^\"]+)\"")]
    private static partial Regex CellRegex();
}
