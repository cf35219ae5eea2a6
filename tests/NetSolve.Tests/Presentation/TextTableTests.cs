using System.Globalization;
using System.Text;
using NetSolve.Presentation;

namespace NetSolve.Tests.Presentation;

/// <summary>
/// The text table keeps its cells as characters in blocks, not as strings; what it writes must still be what the
/// .NET string methods make of the same cells: each cell padded with <see cref="string.PadLeft(int)"/> or
/// <see cref="string.PadRight(int)"/> to its column's widest cell, joined by two spaces, trailing white space trimmed
/// with <see cref="string.TrimEnd()"/>.
/// </summary>
public sealed class TextTableTests
{
    [Fact]
    public void A_table_of_many_blocks_is_laid_out_as_the_string_methods_lay_out_its_cells()
    {
        // Seeded, so the same table every run: 3,000 rows of 5 columns, about 200,000 characters (several 64 KB blocks).
        var random = new Random(17);
        string[] headers = ["unit", ">load", ">wait", "status", ">queue"];
        var rows = new List<string[]>();
        for (int r = 0; r < 3_000; r++)
        {
            rows.Add([.. Enumerable.Range(0, headers.Length).Select(_ => Cell(random))]);
        }

        // A cell longer than a block, and a row of empty cells whose line trims to nothing.
        rows.Insert(1_500, ["long", new string('9', 40_000), "1", "ok", "2"]);
        rows.Add(["", "", "", "", ""]);

        var table = new TextTable(headers);
        foreach (var row in rows)
        {
            table.Add(row);
        }

        using var written = new StringWriter(CultureInfo.InvariantCulture);
        table.Write(written);

        Assert.Equal(Reference(headers, rows), written.ToString());
    }

    [Fact]
    public void A_column_aligned_left_after_its_rows_are_in_is_padded_on_the_right()
    {
        var table = new TextTable(">unit", ">load");
        table.Add("a", "1.5");
        table.Add("longer", "12");
        table.AlignLeft(0);
        using var written = new StringWriter(CultureInfo.InvariantCulture);
        table.Write(written);

        Assert.Equal(Reference(["unit", ">load"], [["a", "1.5"], ["longer", "12"]]), written.ToString());
    }

    /// <summary>The layout written with the string methods alone, as the table wrote it when it kept a string per cell.</summary>
    private static string Reference(string[] headers, List<string[]> rows)
    {
        var right = headers.Select(header => header.StartsWith('>')).ToArray();
        var names = headers.Select(header => header.TrimStart('>')).ToArray();
        var widths = names.Select((name, c) => rows.Select(row => row[c].Length).Append(name.Length).Max()).ToArray();
        var text = new StringBuilder();
        foreach (var row in new[] { names, widths.Select(width => new string('-', width)).ToArray() }.Concat(rows))
        {
            var parts = row.Select((cell, c) => right[c] ? cell.PadLeft(widths[c]) : cell.PadRight(widths[c]));
            text.Append(string.Join("  ", parts).TrimEnd()).Append('\n');
        }

        return text.ToString();
    }

    private static string Cell(Random random) => random.Next(6) switch
    {
        0 => string.Empty,
        1 => "-",
        2 => "text with spaces ",
        3 => random.Next(1_000_000).ToString(CultureInfo.InvariantCulture),
        4 => new string('x', random.Next(1, 30)),
        _ => (random.NextDouble() * 100).ToString("0.###", CultureInfo.InvariantCulture),
    };
}
