using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Diagnostics;

namespace NetSolve.Fitting.Reading;

/// <summary>
/// Reads a roster or bed count: CSV with the header <c>unit,servers</c>, one unit a row, the unit by the name the log
/// uses or by its fitted id, servers a whole number of at least 1. Blank lines and lines starting with <c>#</c> are
/// skipped. Every problem is located (file, line, column) and all are reported, not only the first.
/// </summary>
public static class RosterReader
{
    private static readonly string[] Columns = ["unit", "servers"];

    /// <summary>
    /// Servers by unit id read from <paramref name="stream"/> for <paramref name="units"/> (a log's units), or null with the
    /// errors; <paramref name="fileName"/> is used in diagnostics.
    /// </summary>
    public static (ImmutableDictionary<string, int>? Roster, ImmutableArray<Diagnostic> Diagnostics) Read(Stream stream, string fileName, IReadOnlyList<LogUnit> units)
    {
        ArgumentNullException.ThrowIfNull(stream);
        ArgumentNullException.ThrowIfNull(units);
        var diagnostics = new List<Diagnostic>();
        var roster = ImmutableDictionary.CreateBuilder<string, int>(StringComparer.Ordinal);
        var givenOn = new Dictionary<string, int>(StringComparer.Ordinal);
        bool header = false;
        foreach (var row in SmallCsvFile.Read(stream))
        {
            string[] values = row.Cells;
            SourceLocation At(int cell) => new(fileName, row.Line, row.ColumnOf(cell));
            if (!header)
            {
                if (!values.SequenceEqual(Columns, StringComparer.Ordinal))
                {
                    diagnostics.Add(Diagnostic.Error(DiagnosticCodes.WrongShape, At(0), null, "a roster's header must be unit,servers"));
                    break;
                }

                header = true;
                continue;
            }

            if (values.Length != Columns.Length)
            {
                diagnostics.Add(Diagnostic.Error(DiagnosticCodes.WrongShape, At(Math.Min(values.Length, Columns.Length)), null,
                    string.Create(CultureInfo.InvariantCulture, $"expected 2 cells (unit,servers), found {values.Length}")));
                continue;
            }

            var unit = units.FirstOrDefault(u => string.Equals(u.Id, values[0], StringComparison.Ordinal) || string.Equals(u.Label, values[0], StringComparison.Ordinal));
            if (unit is null)
            {
                diagnostics.Add(Diagnostic.Error(DiagnosticCodes.UnknownUnit, At(0), null,
                    $"the log has no unit '{values[0]}'{NearestName.Hint(values[0], units.Select(u => u.Id))}"));
            }
            else if (!int.TryParse(values[1], NumberStyles.None, CultureInfo.InvariantCulture, out int servers) || servers < 1)
            {
                diagnostics.Add(Diagnostic.Error(DiagnosticCodes.BadValue, At(1), unit.Id, $"servers '{values[1]}' is not a whole number of at least 1"));
            }
            else if (givenOn.TryGetValue(unit.Id, out int first))
            {
                diagnostics.Add(Diagnostic.Error(DiagnosticCodes.DuplicateKey, At(0), unit.Id,
                    string.Create(CultureInfo.InvariantCulture, $"already given on line {first}")));
            }
            else
            {
                givenOn[unit.Id] = row.Line;
                roster[unit.Id] = servers;
            }
        }

        if (!header && diagnostics.Count == 0)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.Empty, new SourceLocation(fileName, 1, 1), null, "the roster is empty; it needs the header unit,servers"));
        }

        return diagnostics.Count > 0 ? (null, [.. diagnostics]) : (roster.ToImmutable(), []);
    }
}
