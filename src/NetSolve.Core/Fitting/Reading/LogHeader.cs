using System.Globalization;
using NetSolve.Diagnostics;

namespace NetSolve.Fitting.Reading;

/// <summary>Where each known column sits in a movement log's header; a column not known is counted and ignored.</summary>
internal sealed class LogHeader
{
    /// <summary>The columns a log may have, in the documented order.</summary>
    public static readonly string[] Names = ["patient", "unit", "arrived", "started", "left"];

    private static readonly int[] Required = [0, 1, 2, 4];

    private LogHeader(int[] cellOfColumn, int cells, int unknown)
    {
        CellOfColumn = cellOfColumn;
        Cells = cells;
        Unknown = unknown;
    }

    /// <summary>The cell holding each of <see cref="Names"/>, or -1 for an absent optional column.</summary>
    public int[] CellOfColumn { get; }

    /// <summary>Cells every row must have.</summary>
    public int Cells { get; }

    /// <summary>Header cells naming no known column.</summary>
    public int Unknown { get; }

    /// <summary>Whether the log has a <c>started</c> column.</summary>
    public bool HasStarted => CellOfColumn[3] >= 0;

    /// <summary>
    /// Reads the header cells; null when a required column is missing or one is named twice. An unknown column is an
    /// error under <paramref name="strict"/>, otherwise a warning.
    /// </summary>
    public static LogHeader? Read(string[] cells, SourceLocation location, bool strict, List<Diagnostic> diagnostics)
    {
        // A byte order mark before the first column name is the editor's, not the name's.
        var names = cells.Select((cell, i) => (i == 0 ? cell.TrimStart('\uFEFF') : cell).Trim()).ToArray();
        var map = Names.Select(name => Array.IndexOf(names, name)).ToArray();
        bool ok = true;
        int unknown = 0;
        foreach (var name in names.Where(name => !Names.Contains(name, StringComparer.Ordinal)))
        {
            unknown++;
            string message = $"unknown column '{name}'{NearestName.Hint(name, Names)} (columns: {string.Join(",", Names)})";
            diagnostics.Add(strict
                ? Diagnostic.Error(DiagnosticCodes.UnknownKey, location, null, message)
                : Diagnostic.Warning(DiagnosticCodes.UnknownKey, location, null, message + "; ignored"));
            ok &= !strict;
        }

        foreach (var name in names.Where(name => Names.Contains(name, StringComparer.Ordinal)).GroupBy(name => name, StringComparer.Ordinal).Where(group => group.Count() > 1))
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.DuplicateKey, location, null, $"column '{name.Key}' appears twice"));
            ok = false;
        }

        foreach (int c in Required.Where(c => map[c] < 0))
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.MissingKey, location, null, $"missing column '{Names[c]}' (columns: {string.Join(",", Names)})"));
            ok = false;
        }

        return ok ? new LogHeader(map, cells.Length, unknown) : null;
    }

    /// <summary>The message for a row whose cell count differs from the header's.</summary>
    public string WrongCellCount(int found) =>
        string.Create(CultureInfo.InvariantCulture, $"expected {Cells} cells, found {found}");
}
