using System.Text;
using nietras.SeparatedValues;

namespace NetSolve.Fitting.Reading;

/// <summary>
/// The rows of a small CSV file given beside a log (a unit map, a roster), with the line each starts on; blank lines
/// and lines starting with <c>#</c> are skipped. Read whole: such files have a row per unit.
/// </summary>
internal static class SmallCsvFile
{
    public static List<CsvLine> Read(Stream stream)
    {
        var lines = new List<CsvLine>();
        using var text = new StreamReader(stream, new UTF8Encoding(false, throwOnInvalidBytes: false), leaveOpen: true);
        using var csv = Sep.New(',').Reader(o => o with { HasHeader = false, DisableColCountCheck = true, Unescape = true }).From(text);
        int line = 1;
        foreach (var row in csv)
        {
            // A row starts where the one before it ended (Sep's own start line is one too far for the first row).
            int rowLine = line;
            line = row.LineNumberToExcl;
            var whole = row.Span.Trim();
            if (!whole.IsEmpty && whole[0] != '#')
            {
                lines.Add(new CsvLine(rowLine, [.. row[0..row.ColCount].ToStringsArray().Select(value => value.Trim())], CellColumns(row.Span)));
            }
        }

        return lines;
    }

    /// <summary>The 1-based column where each cell of <paramref name="raw"/> begins; commas inside quotes do not split.</summary>
    private static int[] CellColumns(ReadOnlySpan<char> raw)
    {
        var columns = new List<int> { 1 };
        bool quoted = false;
        for (int i = 0; i < raw.Length; i++)
        {
            quoted = raw[i] == '"' ? !quoted : quoted;
            if (raw[i] == ',' && !quoted)
            {
                columns.Add(i + 2);
            }
        }

        return [.. columns];
    }
}
