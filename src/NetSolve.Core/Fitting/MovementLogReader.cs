using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Diagnostics;
using NetSolve.Parsing;

namespace NetSolve.Fitting;

/// <summary>
/// Reads a patient movement log: CSV with the header <c>patient,unit,arrived,started,left</c> (the <c>started</c>
/// column may be left out or left empty), one row per stay, times as <c>yyyy-MM-ddTHH:mm[:ss]</c> or
/// <c>yyyy-MM-dd HH:mm[:ss]</c>. Every problem is a located diagnostic; nothing is thrown for bad input.
/// </summary>
public static class MovementLogReader
{
    private static readonly string[] TimeFormats = ["yyyy-MM-dd'T'HH:mm", "yyyy-MM-dd'T'HH:mm:ss", "yyyy-MM-dd HH:mm", "yyyy-MM-dd HH:mm:ss"];
    private static readonly string[] Columns = ["patient", "unit", "arrived", "started", "left"];
    private static readonly int[] RequiredColumns = [0, 1, 2, 4];

    /// <summary>Reads the log text; <paramref name="fileName"/> is used in diagnostics.</summary>
    public static (ImmutableArray<UnitVisit> Visits, ImmutableArray<Diagnostic> Diagnostics) Read(string text, string fileName)
    {
        ArgumentNullException.ThrowIfNull(text);
        var diagnostics = new List<Diagnostic>();
        var rows = new List<(int Line, string Patient, string Unit, DateTime Arrived, DateTime? Started, DateTime Left)>();
        string[] lines = text.Split('\n');
        int[]? map = null;
        for (int i = 0; i < lines.Length; i++)
        {
            string line = lines[i].TrimEnd('\r');
            if (line.Trim().Length == 0 || line.StartsWith('#'))
            {
                continue;
            }

            string[] cells = line.Split(',');
            if (map is null)
            {
                map = Header(cells, new SourceLocation(fileName, i + 1, 1), diagnostics);
                if (map is null)
                {
                    break;
                }

                continue;
            }

            if (ReadRow(cells, map, fileName, i + 1, diagnostics) is { } row)
            {
                rows.Add(row);
            }
        }

        if (map is null && diagnostics.Count == 0)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.Empty, new SourceLocation(fileName, 1, 1), null, "the log is empty; it needs the header patient,unit,arrived,started,left and one row per stay"));
        }
        else if (map is not null && rows.Count == 0 && diagnostics.Count == 0)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.Empty, new SourceLocation(fileName, 1, 1), null, "the log has a header but no stays"));
        }

        if (diagnostics.Any(d => d.IsError))
        {
            return ([], [.. diagnostics]);
        }

        var origin = rows.Min(row => row.Arrived);
        var visits = rows.Select(row => new UnitVisit(row.Patient, row.Unit, Hours(row.Arrived, origin),
            row.Started is DateTime started ? Hours(started, origin) : null, Hours(row.Left, origin), row.Line));
        return ([.. visits], [.. diagnostics]);
    }

    private static double Hours(DateTime time, DateTime origin) => (time - origin).TotalHours;

    private static int[]? Header(string[] cells, SourceLocation location, List<Diagnostic> diagnostics)
    {
        var names = cells.Select(cell => cell.Trim()).ToArray();
        var map = new int[Columns.Length];
        for (int c = 0; c < Columns.Length; c++)
        {
            map[c] = Array.IndexOf(names, Columns[c]);
        }

        foreach (var name in names.Where(name => !Columns.Contains(name)))
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.UnknownKey, location, null, $"unknown column '{name}'{NearestName.Hint(name, Columns)} (columns: {string.Join(",", Columns)})"));
        }

        foreach (int c in RequiredColumns.Where(c => map[c] < 0))
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.MissingKey, location, null, $"missing column '{Columns[c]}' (columns: {string.Join(",", Columns)})"));
        }

        return diagnostics.Count == 0 ? map : null;
    }

    private static (int, string, string, DateTime, DateTime?, DateTime)? ReadRow(string[] cells, int[] map, string fileName, int line, List<Diagnostic> diagnostics)
    {
        int expected = map.Count(index => index >= 0);
        if (cells.Length != expected)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.BadValue, new SourceLocation(fileName, line, 1), null,
                string.Create(CultureInfo.InvariantCulture, $"expected {expected} cells, found {cells.Length}")));
            return null;
        }

        string Cell(int column) => cells[map[column]].Trim();
        SourceLocation At(int column) => new(fileName, line, 1 + cells.Take(map[column]).Sum(cell => cell.Length + 1));

        string patient = Cell(0);
        string unit = Cell(1);
        if (patient.Length == 0 || unit.Length == 0)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.BadValue, At(patient.Length == 0 ? 0 : 1), null, "patient and unit must not be empty"));
            return null;
        }

        if (RefusedCharacter(cells[map[0]]) is int inPatient)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.BadText, At(0) with { Column = At(0).Column + inPatient }, null, "patient: " + Describe(cells[map[0]], inPatient)));
            return null;
        }

        if (RefusedCharacter(cells[map[1]]) is int inUnit)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.BadText, At(1) with { Column = At(1).Column + inUnit }, null, "unit: " + Describe(cells[map[1]], inUnit)));
            return null;
        }

        var arrived = Time(Cell(2), At(2), unit, diagnostics);
        DateTime? started = map[3] >= 0 && Cell(3).Length > 0 ? Time(Cell(3), At(3), unit, diagnostics) : null;
        var left = Time(Cell(4), At(4), unit, diagnostics);
        if (arrived is not DateTime a || left is not DateTime l || (map[3] >= 0 && Cell(3).Length > 0 && started is null))
        {
            return null;
        }

        if (l < a || (started is DateTime s && (s < a || s > l)))
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.BadValue, At(4), unit, "times must run arrived <= started <= left"));
            return null;
        }

        return (line, patient, unit, a, started, l);
    }

    /// <summary>
    /// Where <paramref name="cell"/> holds a character that network files refuse (see <see cref="InputCharacters"/>) or a
    /// tab: a unit name becomes a unit id in the fitted network, so it must pass the same rules.
    /// </summary>
    private static int? RefusedCharacter(string cell)
    {
        int index = InputCharacters.FindRefused(cell);
        int tab = cell.IndexOf('\t', StringComparison.Ordinal);
        int first = index < 0 ? tab : tab < 0 ? index : Math.Min(index, tab);
        return first < 0 ? null : first;
    }

    private static string Describe(string cell, int index) =>
        cell[index] == '\t' ? "a tab is not allowed in a name" : InputCharacters.Describe(cell, index);

    private static DateTime? Time(string text, SourceLocation location, string unit, List<Diagnostic> diagnostics)
    {
        if (DateTime.TryParseExact(text, TimeFormats, CultureInfo.InvariantCulture, DateTimeStyles.None, out var time))
        {
            return time;
        }

        diagnostics.Add(Diagnostic.Error(DiagnosticCodes.BadValue, location, unit, $"'{text}' is not a time (write e.g. 2026-03-02T08:15)"));
        return null;
    }
}
