using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Diagnostics;
using NetSolve.Parsing;

namespace NetSolve.Fitting.Reading;

/// <summary>
/// Reads a unit map: CSV with the header <c>name,id</c> or <c>name,id,label</c>, one log name a row, so that several
/// spellings (<c>A&amp;E</c>, <c>Emergency Dept</c>) become one unit with a chosen id. Every problem is located.
/// </summary>
public static class UnitMapReader
{
    /// <summary>The map read from <paramref name="stream"/>, or null with the errors; <paramref name="fileName"/> is used in diagnostics.</summary>
    public static (ImmutableDictionary<string, UnitMapEntry>? Map, ImmutableArray<Diagnostic> Diagnostics) Read(Stream stream, string fileName, bool ignoreCase)
    {
        ArgumentNullException.ThrowIfNull(stream);
        var diagnostics = new List<Diagnostic>();
        var map = ImmutableDictionary.CreateBuilder<string, UnitMapEntry>(ignoreCase ? StringComparer.OrdinalIgnoreCase : StringComparer.Ordinal);
        int cells = 0;
        foreach (var row in SmallCsvFile.Read(stream))
        {
            var location = new SourceLocation(fileName, row.Line, 1);
            string[] values = row.Cells;
            if (cells == 0)
            {
                cells = Header(values, location, diagnostics);
                if (cells == 0)
                {
                    break;
                }

                continue;
            }

            Row(values, cells, location, map, diagnostics);
        }

        if (cells == 0 && diagnostics.Count == 0)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.Empty, new SourceLocation(fileName, 1, 1), null, "the unit map is empty; it needs the header name,id (or name,id,label)"));
        }

        return diagnostics.Count > 0 ? (null, [.. diagnostics]) : (map.ToImmutable(), []);
    }

    private static int Header(string[] values, SourceLocation location, List<Diagnostic> diagnostics)
    {
        if (values is ["name", "id"] or ["name", "id", "label"])
        {
            return values.Length;
        }

        diagnostics.Add(Diagnostic.Error(DiagnosticCodes.WrongShape, location, null, "the unit map's header must be name,id or name,id,label"));
        return 0;
    }

    private static void Row(string[] values, int cells, SourceLocation location, ImmutableDictionary<string, UnitMapEntry>.Builder map, List<Diagnostic> diagnostics)
    {
        if (values.Length != cells)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.BadValue, location, null, string.Create(CultureInfo.InvariantCulture, $"expected {cells} cells, found {values.Length}")));
            return;
        }

        string name = values[0];
        string id = values[1];
        string? label = cells == 3 && values[2].Length > 0 ? values[2] : null;
        if (name.Length == 0)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.BadValue, location, null, "the name must not be empty"));
        }
        else if (!UnitNaming.IsValidId(id))
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.BadUnitId, location, null, $"'{id}' is not a valid unit id: use letters, digits, '_' and '-', starting with a letter"));
        }
        else if (label is not null && InputCharacters.FindRefused(label) is int refused and >= 0)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.BadText, location, null, "label: " + InputCharacters.Describe(label, refused)));
        }
        else if (!map.TryAdd(name, new UnitMapEntry(id, label)))
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.DuplicateKey, location, null, $"the name '{name}' is mapped twice"));
        }
    }
}
