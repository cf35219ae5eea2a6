using System.Text;
using NetSolve.Diagnostics;
using NetSolve.Fitting.Reading;
using nietras.SeparatedValues;
using NodaTime;

namespace NetSolve.Fitting;

/// <summary>
/// Reads a patient movement log in one pass over a stream, however large: CSV with the header
/// <c>patient,unit,arrived,started,left</c> (<c>started</c> optional), one row per stay, in any row order. Times and
/// the rules for messy rows are in docs/movement-log.md. Every problem is a located diagnostic; nothing is thrown
/// for bad input.
/// </summary>
public static class MovementLogReader
{
    private const int ProgressEveryRows = 1 << 16;

    /// <summary>Reads a log held as text (small logs and tests), with the default options unless given.</summary>
    public static MovementLogReadResult Read(string text, string fileName, MovementLogOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(text);
        using var stream = new MemoryStream(new UTF8Encoding(false).GetBytes(text));
        return Read(stream, fileName, options ?? MovementLogOptions.Default);
    }

    /// <summary>
    /// Reads a log from <paramref name="stream"/> (strict UTF-8); <paramref name="fileName"/> is used in diagnostics,
    /// <paramref name="progress"/> hears the bytes read every 65,536 rows when the stream knows its position.
    /// </summary>
    public static MovementLogReadResult Read(Stream stream, string fileName, MovementLogOptions options, IProgress<long>? progress = null)
    {
        ArgumentNullException.ThrowIfNull(stream);
        ArgumentNullException.ThrowIfNull(options);
        var diagnostics = new List<Diagnostic>();
        LogRowReader? rows = null;
        int line = 1;
        try
        {
            using var text = new StreamReader(stream, new UTF8Encoding(false, throwOnInvalidBytes: true), detectEncodingFromByteOrderMarks: false, bufferSize: 1 << 16, leaveOpen: true);
            using var csv = Sep.New(',').Reader(o => o with { HasHeader = false, DisableColCountCheck = true, Unescape = true }).From(text);
            LogHeader? header = null;
            foreach (var row in csv)
            {
                // The line a row starts on is where the one before it ended: Sep's own start line is one too far
                // for the first row.
                int rowLine = line;
                line = row.LineNumberToExcl;
                var whole = row.Span.Trim();
                if (whole.IsEmpty || whole[0] == '#')
                {
                    continue;
                }

                if (header is null)
                {
                    header = LogHeader.Read(row[0..row.ColCount].ToStringsArray(), new SourceLocation(fileName, rowLine, 1), options.Strict, diagnostics);
                    if (header is null)
                    {
                        break;
                    }

                    rows = new LogRowReader(fileName, header, options, diagnostics);
                    continue;
                }

                rows!.Read(row, rowLine);
                if (rows.Errors > LogRowReader.MaxErrors)
                {
                    diagnostics.Add(Diagnostic.Error(DiagnosticCodes.BadValue, new SourceLocation(fileName, rowLine, 1), null, LogRowReader.MoreErrors()));
                    break;
                }

                if (progress is not null && rows.Rows.Count % ProgressEveryRows == 0 && stream.CanSeek)
                {
                    progress.Report(stream.Position);
                }
            }
        }
        catch (DecoderFallbackException)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.BadText, new SourceLocation(fileName, line, 1), null,
                "the file is not valid UTF-8 at or after this line; save it as UTF-8"));
        }

        return Finish(rows, fileName, options, diagnostics);
    }

    private static MovementLogReadResult Finish(LogRowReader? rows, string fileName, MovementLogOptions options, List<Diagnostic> diagnostics)
    {
        if (diagnostics.Any(d => d.IsError))
        {
            return new MovementLogReadResult(null, [.. diagnostics]);
        }

        if (rows is null)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.Empty, new SourceLocation(fileName, 1, 1), null, "the log is empty; it needs the header patient,unit,arrived,started,left and one row per stay"));
            return new MovementLogReadResult(null, [.. diagnostics]);
        }

        if (rows.Rows.Count == 0)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.Empty, new SourceLocation(fileName, 1, 1), null, "the log has a header but no stays"));
            return new MovementLogReadResult(null, [.. diagnostics]);
        }

        var start = options.ExtractStart ?? Instant.FromUnixTimeMilliseconds(rows.EarliestMs);
        var end = options.ExtractEnd ?? Instant.FromUnixTimeMilliseconds(rows.LatestMs);
        if (end <= start)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.BadValue, new SourceLocation(fileName, 1, 1), null, "the extract's end is not after its start, so no time is observed"));
            return new MovementLogReadResult(null, [.. diagnostics]);
        }

        int patients = rows.Patients;
        rows.ReleasePatientIds();
        var (units, unitOfName) = UnitNaming.Name(rows.UnitSpellings, options);
        rows.Rows.RenumberUnits(unitOfName);
        var journeys = new JourneyBuilder(rows.Rows, start.ToUnixTimeMilliseconds(), end.ToUnixTimeMilliseconds(), (long)options.NewJourneyAfter.TotalMilliseconds);
        journeys.Build();
        if (options.Strict && journeys.Examples.Count > 0)
        {
            diagnostics.AddRange(journeys.Examples.Select(example =>
                Diagnostic.Error(DiagnosticCodes.BadValue, new SourceLocation(fileName, example.Line, 1), units[example.Unit].Id, example.Message)));
            return new MovementLogReadResult(null, [.. diagnostics]);
        }

        var problems = LogProblems.Count(rows, journeys, start.ToUnixTimeMilliseconds());
        var log = new MovementLog(units, rows.Rows, journeys, patients, rows.HasStartTimes, start, end, options, problems);
        return new MovementLogReadResult(log, [.. diagnostics]);
    }
}
