using Microsoft.VisualBasic.FileIO;

namespace NetSolve.Tests.Support;

/// <summary>Reads CSV back with the framework's own quote-aware reader, so tests do not trust the writer's idea of quoting.</summary>
internal static class CsvRows
{
    /// <summary>Every record of <paramref name="text"/>, the header first; quoted fields unquoted, nothing trimmed.</summary>
    public static List<string[]> Parse(string text)
    {
        using var parser = new TextFieldParser(new StringReader(text))
        {
            TextFieldType = FieldType.Delimited,
            HasFieldsEnclosedInQuotes = true,
            TrimWhiteSpace = false,
        };
        parser.SetDelimiters(",");
        var rows = new List<string[]>();
        while (!parser.EndOfData)
        {
            rows.Add(parser.ReadFields()!);
        }

        return rows;
    }
}
