using System.Text.RegularExpressions;

namespace NetSolve.Tests.Architecture;

/// <summary>Reads a two-column table of names from Markdown: each row a name in backticks, then the names it may use.</summary>
internal static partial class MarkdownTable
{
    /// <summary>
    /// The rows of the table whose header row starts with <c>| <paramref name="firstHeader"/> |</c>: for each backticked
    /// name in the first cell, the backticked names in the second (none when the cell has no backticks).
    /// </summary>
    public static Dictionary<string, string[]> Read(string markdown, string firstHeader)
    {
        var lines = markdown.Split('\n').Select(line => line.TrimEnd('\r')).ToList();
        int header = lines.FindIndex(line => line.StartsWith($"| {firstHeader} |", StringComparison.Ordinal));
        if (header < 0)
        {
            throw new InvalidOperationException($"no table with first header '{firstHeader}'");
        }

        var rows = new Dictionary<string, string[]>(StringComparer.Ordinal);
        foreach (string line in lines.Skip(header + 2).TakeWhile(line => line.StartsWith('|')))
        {
            string[] cells = line.Split('|');
            string name = Names(cells[1]).Single();
            rows.Add(name, Names(cells[2]));
        }

        return rows;
    }

    private static string[] Names(string cell) => [.. NameRegex().Matches(cell).Select(match => match.Groups["name"].Value)];

    [GeneratedRegex("`(?<name>[^`]+)`", RegexOptions.CultureInvariant)]
    private static partial Regex NameRegex();
}
