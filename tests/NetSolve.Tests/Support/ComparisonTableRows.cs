using System.Text.RegularExpressions;

namespace NetSolve.Tests.Support;

/// <summary>Reads the rows back from the comparison table that <c>simulate --compare</c> prints.</summary>
internal static partial class ComparisonTableRows
{
    /// <summary>The rows of the comparison section of <paramref name="text"/>, in printed order.</summary>
    /// <remarks>
    /// Columns are at least two spaces apart and no cell holds two spaces in a row ("0 ±0", "no formula" hold one),
    /// so splitting on runs of two or more spaces recovers the cells; the error column (cells[4]) is skipped.
    /// </remarks>
    public static List<ComparisonTableRow> Parse(string text)
    {
        var lines = text.Split('\n');
        int title = Array.FindIndex(lines, line => line.StartsWith("formulas against simulation", StringComparison.Ordinal));
        Assert.True(title >= 0, "no comparison table in:\n" + text);
        int rule = Array.FindIndex(lines, title, line => line.StartsWith("---", StringComparison.Ordinal));
        return lines.Skip(rule + 1)
            .TakeWhile(line => line.Length > 0)
            .Select(line => ColumnGap().Split(line.TrimEnd()))
            .Select(cells => new ComparisonTableRow(cells[0], cells[1], cells[2], cells[3], cells[5]))
            .ToList();
    }

    [GeneratedRegex(" {2,}")]
    private static partial Regex ColumnGap();
}
