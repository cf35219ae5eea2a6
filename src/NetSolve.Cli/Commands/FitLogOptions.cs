using System.CommandLine;
using NetSolve.Cli.Settings;
using NetSolve.Fitting.Reading;
using NetSolve.Parsing;
using NodaTime;

namespace NetSolve.Cli.Commands;

/// <summary>The options of <c>fit</c> that say how to read the movement log, and their conversion to <see cref="MovementLogOptions"/>.</summary>
internal sealed class FitLogOptions
{
    private static readonly DurationRule JourneyGap = new(AllowZero: true, "12h, 1d, 30d");

    public Option<string?> ExtractStart { get; } = TimeOption("--extract-start", "When the extract begins; stays that arrived earlier were already running (default: the earliest arrival).");

    public Option<string?> ExtractEnd { get; } = TimeOption("--extract-end", "When the extract was taken; an empty 'left' means still in the unit then (default: the latest time in the log).");

    public Option<string> TimeZone { get; } = new("--time-zone")
    {
        Description = "IANA time zone the log's local times are in, so stays across a clock change come out right (default: UTC).",
        HelpName = "NAME",
        DefaultValueFactory = _ => "UTC",
        CustomParser = result => SettingOptions.Read(result, text => (DateTimeZoneProviders.Tzdb.GetZoneOrNull(text) is null ? Messages.NotTimeZone(text) : null, text)),
    };

    public Option<string> NewJourneyAfter { get; } = SettingOptions.Duration("--new-journey-after", JourneyGap, "24h",
        "A gap between a patient's stays longer than this starts a new journey (a readmission).", "DURATION");

    public Option<bool> IgnoreCase { get; } = new("--ignore-case") { Description = "Unit names differing only in letter case (ED, ed) are one unit." };

    public Option<bool> Strict { get; } = new("--strict") { Description = "Fail on any messy row (duplicate, readmission, overlap, zero or negative stay, unknown column, row out of order)." };

    public Option<string?> UnitMap { get; } = new("--unit-map") { Description = "CSV name,id[,label] mapping the log's unit names to unit ids.", HelpName = "FILE" };

    /// <summary>The options, to add to the command.</summary>
    public IEnumerable<Option> All => [ExtractStart, ExtractEnd, TimeZone, NewJourneyAfter, IgnoreCase, Strict, UnitMap];

    /// <summary>The reading options given; a unit map that cannot be read, or a window that ends before it starts, is an <see cref="InputException"/>.</summary>
    public MovementLogOptions Read(ParseResult parse)
    {
        var zone = DateTimeZoneProviders.Tzdb[parse.GetValue(TimeZone)!];
        var start = parse.GetValue(ExtractStart) is string from ? LogTimeText.Parse(from, zone) : null;
        var end = parse.GetValue(ExtractEnd) is string to ? LogTimeText.Parse(to, zone) : null;
        if (start is Instant s && end is Instant e && e <= s)
        {
            throw new InputException(Messages.ExtractEndsBeforeStart);
        }

        OptionValues.Duration("--new-journey-after", parse.GetValue(NewJourneyAfter)!, JourneyGap, null, out double gapHours);
        bool ignoreCase = parse.GetValue(IgnoreCase);
        return new MovementLogOptions
        {
            ExtractStart = start,
            ExtractEnd = end,
            TimeZone = zone,
            NewJourneyAfter = Duration.FromHours(gapHours),
            IgnoreCase = ignoreCase,
            Strict = parse.GetValue(Strict),
            UnitMap = parse.GetValue(UnitMap) is string path ? ReadUnitMap(path, ignoreCase) : MovementLogOptions.Default.UnitMap,
        };
    }

    private static System.Collections.Immutable.ImmutableDictionary<string, UnitMapEntry> ReadUnitMap(string path, bool ignoreCase)
    {
        using var stream = InputFile.TryOpen(path, "a unit map", out var problem) ?? throw new InputException(problem!.ToString());
        var (map, diagnostics) = UnitMapReader.Read(stream, path, ignoreCase);
        return map ?? throw new InputException(string.Join("\n", diagnostics.Where(d => d.IsError)));
    }

    private static Option<string?> TimeOption(string name, string description) => new(name)
    {
        Description = description,
        HelpName = "TIME",
        CustomParser = result => SettingOptions.Read<string?>(result, text => (LogTimeText.IsTime(text) ? null : Messages.NotLogTime(name, text), text)),
    };
}
