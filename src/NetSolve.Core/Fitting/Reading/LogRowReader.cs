using System.Globalization;
using NetSolve.Diagnostics;
using NetSolve.Parsing;
using nietras.SeparatedValues;

namespace NetSolve.Fitting.Reading;

/// <summary>
/// Turns the rows of a movement log, one at a time, into <see cref="StayRow"/>s: patient and unit names interned to
/// numbers (a name is kept once, however many rows repeat it), times read and checked, problems counted.
/// </summary>
internal sealed class LogRowReader(string fileName, LogHeader header, MovementLogOptions options, List<Diagnostic> diagnostics)
{
    /// <summary>Errors reported before reading stops: enough to see a pattern, few enough to read.</summary>
    public const int MaxErrors = 20;

    private PatientIds _patients = new();
    private int _line;
    private readonly Dictionary<string, int> _unitKeys = new(options.IgnoreCase ? StringComparer.OrdinalIgnoreCase : StringComparer.Ordinal);
    private readonly LogClock _clock = new(options.TimeZone);

    /// <summary>Header columns not known (ignored).</summary>
    public long UnknownColumns => header.Unknown;

    /// <summary>The rows read so far.</summary>
    public StayTable Rows { get; } = new();

    /// <summary>Each unit key's spelling: the ordinal-first one met, so that the label does not depend on row order.</summary>
    public List<string> UnitSpellings { get; } = [];

    /// <summary>Patients seen.</summary>
    public int Patients => _patients.Count;

    /// <summary>Whether any row has a start-of-service time.</summary>
    public bool HasStartTimes { get; private set; }

    /// <summary>Earliest arrival read, in milliseconds since 1970 UTC.</summary>
    public long EarliestMs { get; private set; } = long.MaxValue;

    /// <summary>Latest time read in any column.</summary>
    public long LatestMs { get; private set; } = long.MinValue;

    /// <summary>Errors reported.</summary>
    public int Errors { get; private set; }

    /// <summary>Rows of no length (kept).</summary>
    public long ZeroDurations { get; private set; }

    /// <summary>Rows whose times run backwards (dropped).</summary>
    public long NegativeDurations { get; private set; }

    /// <summary>Local times in an hour a clock change repeated or skipped.</summary>
    public long ClockChangeTimes => _clock.ClockChangeTimes;

    /// <summary>Reads one data row, which starts on <paramref name="line"/>; problems go to the diagnostics.</summary>
    public void Read(SepReader.Row row, int line)
    {
        _line = line;
        if (row.ColCount != header.Cells)
        {
            Error(new SourceLocation(fileName, line, 1), null, DiagnosticCodes.BadValue, header.WrongCellCount(row.ColCount));
            return;
        }

        var patient = Cell(row, 0);
        var unit = Cell(row, 1);
        if (patient.IsEmpty || unit.IsEmpty)
        {
            Error(At(row, patient.IsEmpty ? 0 : 1), null, DiagnosticCodes.BadValue, "patient and unit must not be empty");
            return;
        }

        if (!Acceptable(row, 0, "patient") || !Acceptable(row, 1, "unit"))
        {
            return;
        }

        if (patient.Length > PatientIds.MaxLength)
        {
            Error(At(row, 0), null, DiagnosticCodes.BadValue, string.Create(CultureInfo.InvariantCulture, $"a patient id is at most {PatientIds.MaxLength} characters"));
            return;
        }

        string unitName = unit.ToString();
        if (Time(row, 2, unitName) is not long arrived)
        {
            return;
        }

        long started = StayRow.NotRecorded;
        if (header.HasStarted && !Cell(row, 3).IsEmpty)
        {
            if (Time(row, 3, unitName) is not long start)
            {
                return;
            }

            started = start;
            HasStartTimes = true;
        }

        long left = StayRow.NotRecorded;
        if (!Cell(row, 4).IsEmpty)
        {
            if (Time(row, 4, unitName) is not long end)
            {
                return;
            }

            left = end;
        }

        if (Duration(row, unitName, arrived, started, left))
        {
            Keep(row, patient, unitName, arrived, started, left);
        }
    }

    /// <summary>Lets go of the patient ids once every row is read: only their numbers are needed from then on.</summary>
    public void ReleasePatientIds() => _patients = new PatientIds();

    private void Keep(SepReader.Row row, ReadOnlySpan<char> patient, string unitName, long arrived, long started, long left)
    {
        int patientNumber = _patients.Intern(patient);
        if (!_unitKeys.TryGetValue(unitName, out int unitNumber))
        {
            unitNumber = _unitKeys.Count;
            _unitKeys[unitName] = unitNumber;
            UnitSpellings.Add(unitName);
        }
        else if (string.CompareOrdinal(unitName, UnitSpellings[unitNumber]) < 0)
        {
            UnitSpellings[unitNumber] = unitName;
        }

        EarliestMs = Math.Min(EarliestMs, arrived);
        LatestMs = Math.Max(LatestMs, Math.Max(arrived, Math.Max(started, left)));
        Rows.Add(new StayRow(patientNumber, unitNumber, arrived, started, left, _line));
    }

    /// <summary>False (and counted) when the stay's times run backwards; a stay of no length is counted and kept.</summary>
    private bool Duration(SepReader.Row row, string unit, long arrived, long started, long left)
    {
        bool backwards = (left != StayRow.NotRecorded && left < arrived)
            || (started != StayRow.NotRecorded && (started < arrived || (left != StayRow.NotRecorded && started > left)));
        if (backwards)
        {
            NegativeDurations++;
            Messy(At(row, 4), unit, "times must run arrived <= started <= left (a negative duration; the row is dropped)");
            return false;
        }

        long serviceStart = started == StayRow.NotRecorded ? arrived : started;
        if (left != StayRow.NotRecorded && left == serviceStart)
        {
            // Kept: a pass through the unit shorter than the log's clock shows, still a step of the journey.
            ZeroDurations++;
            Messy(At(row, 4), unit, "the stay has no length (a zero duration)");
        }

        return true;
    }

    private bool Acceptable(SepReader.Row row, int column, string what)
    {
        var cell = row[header.CellOfColumn[column]].Span;
        int refused = InputCharacters.FindRefused(cell);
        int tab = cell.IndexOf('\t');
        int first = refused < 0 ? tab : tab < 0 ? refused : Math.Min(refused, tab);
        if (first < 0)
        {
            return true;
        }

        string text = cell.ToString();
        string why = text[first] == '\t' ? "a tab is not allowed in a name" : InputCharacters.Describe(text, first);
        var at = At(row, column);
        Error(at with { Column = at.Column + first }, null, DiagnosticCodes.BadText, what + ": " + why);
        return false;
    }

    private long? Time(SepReader.Row row, int column, string unit)
    {
        var text = Cell(row, column);
        if (LogTimeParser.TryParse(text, out var local, out var offset))
        {
            return _clock.Milliseconds(local, offset);
        }

        Error(At(row, column), unit, DiagnosticCodes.BadValue,
            $"'{text.ToString()}' is not a time (write e.g. 2026-03-02T08:15, 2026-03-02T08:15:30+01:00 or 02/03/2026 08:15)");
        return null;
    }

    private ReadOnlySpan<char> Cell(SepReader.Row row, int column) => row[header.CellOfColumn[column]].Span.Trim();

    /// <summary>Where a column's cell starts on its line; cells are counted by their text and the commas between them.</summary>
    private SourceLocation At(SepReader.Row row, int column)
    {
        var line = row.Span;
        var cell = row[header.CellOfColumn[column]].Span;
        int offset = line.Overlaps(cell, out int start) ? start : 0;
        return new SourceLocation(fileName, _line, 1 + offset);
    }

    /// <summary>A messy row: an error under <c>--strict</c>, otherwise only counted.</summary>
    private void Messy(SourceLocation location, string unit, string message)
    {
        if (options.Strict)
        {
            Error(location, unit, DiagnosticCodes.BadValue, message);
        }
    }

    private void Error(SourceLocation location, string? unit, string code, string message)
    {
        Errors++;
        if (Errors <= MaxErrors)
        {
            diagnostics.Add(Diagnostic.Error(code, location, unit, message));
        }
    }

    /// <summary>The note closing a list of errors cut short.</summary>
    public static string MoreErrors() => string.Create(CultureInfo.InvariantCulture, $"reading stopped after {MaxErrors} problems");
}
