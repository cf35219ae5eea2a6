using System.Globalization;
using NetSolve.Diagnostics;
using NetSolve.Fitting.Reading;
using NetSolve.Presentation.Formats;

namespace NetSolve.Cli;

/// <summary>
/// Every line the command line shows people, besides the results themselves and the help texts kept beside their
/// options: usage errors, input errors, progress and confirmations. One place, so the wording stays consistent and
/// a change of wording is one edit.
/// </summary>
/// <remarks>
/// Usage problems name their option first (<c>--steps: '0' is not a whole number from 1 to 10000</c>) and get the
/// <see cref="Program"/> prefix when printed; every number is written in invariant culture. Every value quoted from
/// the command line or a file (option values, ids, paths, the readers' own problems) passes through <see cref="Q"/>,
/// so NUL, ESC, a line feed or a right-to-left override is shown as <c>\uXXXX</c>, never acted on by the terminal.
/// </remarks>
internal static class Messages
{
    /// <summary>Starts every line the program writes about itself (not lines that start with a file path).</summary>
    public const string Program = "netsolve: ";

    /// <summary>Warnings of one kind past the first few of one file, summed up in one line.</summary>
    public static string MoreWarnings(string file, int count, string code) => string.Create(
        CultureInfo.InvariantCulture,
        $"{Q(file)}: warning: {count:N0} more warnings of a kind shown above (code {code}) are not listed; {WarningLog.ShownPerKind} of each kind are");

    /// <summary>Follows the usage errors.</summary>
    public const string UsageHint = "Run 'netsolve --help' for usage.";

    /// <summary>Ctrl-C before a command that does not report partial work finished.</summary>
    public const string Stopped = Program + "stopped";

    /// <summary>A simulation was stopped before any replication finished, so there is nothing to show.</summary>
    public const string StoppedBeforeAnyReplication = Program + "stopped before any replication finished; nothing to report";

    /// <summary>As <see cref="StoppedBeforeAnyReplication"/>, for the report.</summary>
    public const string StoppedBeforeAnyReplicationNoReport = Program + "stopped before any replication finished; no report written";

    /// <summary>What a FILE argument may be, as named when it is neither ("is a directory, not a network or scenario file").</summary>
    public const string NetworkOrScenarioFile = "a network or scenario file";

    /// <summary>A usage problem as printed: the program's prefix and the problem.</summary>
    public static string Usage(string problem) => Program + Q(problem);

    /// <summary>A defect in NetSolve: one line, the stack only with <c>--verbose</c>.</summary>
    public static string InternalError(Exception exception, bool verbose) =>
        $"{Program}internal error: {Q(OneLine(exception.Message))}" + (verbose ? "\n" + TerminalText.Lines(exception.ToString()) : " (run again with --verbose for details)");

    /// <summary>The first line of <paramref name="text"/>, so a defect's message stays one line without --verbose.</summary>
    private static string OneLine(string text) => text.Split('\n', 2)[0].TrimEnd('\r');

    /// <summary>A problem the solver found in a network that passed validation (for example traffic that cannot be solved).</summary>
    public static string SolverProblem(string message) => Program + Q(message);

    /// <summary>A first word that is no command; <paramref name="hint"/> is the nearest command ("; did you mean 'solve'?") or empty.</summary>
    public static string UnknownCommand(string text, string hint) => $"unknown command '{text}'{hint}";

    /// <summary>An option the command does not have; <paramref name="hint"/> is the nearest option or empty.</summary>
    public static string UnknownOption(string option, string command, string hint) => $"{option}: unknown option for '{command}'{hint}";

    // Option values: one message per kind of value, each naming the option.

    /// <summary>A simulation whose estimated work is above the bound, refused unless asked for.</summary>
    public static string SimulationTooLong(double events, double bound) =>
        Invariant($"--duration: the run would simulate about {events:0.#e+0} events, more than the bound of {bound:0.#e+0} (fewer --replications or a shorter --duration or --warmup; --allow-long to run it anyway)");

    /// <summary>A whole number out of its range (or not a whole number at all).</summary>
    public static string NotWholeNumber(string option, string text, decimal min, decimal max) =>
        Invariant($"{option}: '{Q(text)}' is not a whole number from {min} to {max}");

    /// <summary>A number out of its range (or not a number at all); <paramref name="range"/> says which, as in "above 0 and at most 1".</summary>
    public static string NotNumber(string option, string text, string what, string range, string example) =>
        $"{option}: '{Q(text)}' is not {what} {range} ({example})";

    /// <summary>One of a fixed set of words.</summary>
    public static string NotOneOf(string option, string text, IEnumerable<string> choices) =>
        $"{option}: '{Q(text)}' is not one of {string.Join(", ", choices)}";

    /// <summary>A duration in a form not understood.</summary>
    public static string NotDuration(string option, string text, bool allowZero, string examples) =>
        $"{option}: '{Q(text)}' is not a {(allowZero ? string.Empty : "positive ")}duration (write e.g. {examples}; a bare number is in the file's time unit)";

    /// <summary>A duration longer than the command takes.</summary>
    public static string DurationTooLong(string option, string text, double maxDays, string why) =>
        Invariant($"{option}: '{Q(text)}' is longer than {maxDays} days; {why}");

    /// <summary>A duration shorter than the command needs.</summary>
    public static string DurationTooShort(string option, string text, string shortest, string why) =>
        $"{option}: '{Q(text)}' is shorter than {shortest}; {why}";

    /// <summary>A probability in a form not understood, or outside 0 to 1 (the message of the shared value parser).</summary>
    public static string NotProbability(string option, string problem) => $"{option}: {Q(problem)}";

    /// <summary>A value the files' own parser refuses as outside its range; its problem already says the range.</summary>
    public static string OutOfRange(string option, string problem) => $"{option}: {Q(problem)}";

    /// <summary>An output file name whose extension the command does not write.</summary>
    public static string WrongExtension(string option, string? text, IEnumerable<string> extensions) =>
        $"{option} '{Q(text ?? string.Empty)}': the file name must end in {string.Join(", ", extensions)}";

    /// <summary>An option that only means something with another.</summary>
    public static string OnlyWith(string option, string needed) => $"{option} applies only with {needed}";

    /// <summary>A unit named in an option that the network does not have.</summary>
    public static string UnknownUnit(string option, string text, string id, string hint) =>
        $"{Program}{option} {Q(text)}: unknown unit '{Q(id)}'{Q(hint)}";

    /// <summary>A time on the command line without a unit of time, read in the file's time unit.</summary>
    public static string BareOptionNumber(string option, string text, double amount, string timeUnitName) =>
        Invariant($"{Program}warning: {option} {text} has no unit of time, so it was read as {amount:0.###} {timeUnitName}s (the file's time_unit is {timeUnitName}); write e.g. {text}min or {text}h to say which");

    // Commands.

    /// <summary><c>check</c>: the file is valid.</summary>
    public static string Valid(string path, int units, int arrivals, int routes) =>
        Invariant($"{Q(path)}: valid: {Counted(units, "unit", "units")}, {Counted(arrivals, "arrival stream", "arrival streams")}, {Counted(routes, "route", "routes")}");

    /// <summary>The name of a network changed by <c>--set</c>: results say they are what-if numbers.</summary>
    public static string WhatIfName(string network, IEnumerable<string> changes) => $"{network} (what-if: {string.Join(", ", changes)})";

    /// <summary>The name of a scenario's network: results say which scenario they are for.</summary>
    public static string ScenarioName(string network, string scenario) => $"{network} (scenario: {scenario})";

    /// <summary><c>compare</c>: the name of the scenario made of <c>--set</c> changes.</summary>
    public static string WhatIfScenario(IEnumerable<string> changes) => "what-if: " + string.Join(", ", changes);

    /// <summary><c>compare</c> with nothing to compare.</summary>
    public const string CompareNeedsScenario = "compare: give at least one SCENARIO file, or --set changes, to compare with the base";

    /// <summary><c>growth</c>: both factors given, the last below the first.</summary>
    public static string GrowthLastBelowFirst(double last, double first) =>
        Invariant($"growth: the last factor ({last:0.###}) is below the first ({first:0.###}); give --to above --from");

    /// <summary><c>growth</c>: the default last factor (where the first unit saturates) is below <c>--from</c>.</summary>
    public static string GrowthDefaultLastBelowFirst(double last, double first) => Program + GrowthLastBelowFirst(last, first);

    /// <summary><c>growth --stream</c> at a unit without arrivals from outside.</summary>
    public static string StreamWithoutArrivals(string unit, IEnumerable<string> streams) =>
        $"{Program}--stream {Q(unit)}: unit '{Q(unit)}' has no arrivals from outside to grow (streams: {Q(string.Join(", ", streams))})";

    /// <summary><c>pathway</c> with neither start nor path.</summary>
    public const string PathwayNeedsStart = "pathway: give --from UNIT, --path A,B,C, or both";

    /// <summary><c>pathway --to</c> without <c>--from</c>.</summary>
    public const string PathwayToNeedsFrom = "pathway: --to needs --from (the chance of visiting is from a start unit)";

    /// <summary><c>pathway</c>: a question the analysis cannot answer for this network.</summary>
    public static string PathwayProblem(string problem) => $"{Program}pathway: {Q(problem)}";

    /// <summary><c>staff</c> with no question.</summary>
    public const string StaffNeedsTarget = "staff: give a target (--max-util, --max-wait, --max-time, --wait-over with --at-most, --max-turned-away or --target), a 'targets' section in the file, or --budget N";

    /// <summary><c>staff --budget</c> mixed with targets.</summary>
    public const string StaffBudgetAlone = "staff: --budget answers its own question; give it without targets or --only (--cost weighs its servers)";

    /// <summary><c>staff --by-hour</c> with a question it does not answer.</summary>
    public const string StaffByHourTargets = "staff: --by-hour takes --max-wait, --max-time, --max-util and --wait-over with --at-most, not --budget, --cost or --max-turned-away";

    /// <summary><c>staff</c>: --shifts, --exact or --no-check without --by-hour.</summary>
    public const string StaffByHourOnly = "staff: --shifts, --exact and --no-check shape a roster; give them with --by-hour";

    /// <summary><c>staff</c>: --allow-long without --by-hour --exact.</summary>
    public const string StaffAllowLongExactOnly = "staff: --allow-long lifts the bound on the exact chain's work; give it with --by-hour --exact";

    /// <summary><c>staff --by-hour --exact</c>: the estimated work of the exact chain is above the bound.</summary>
    public static string StaffExactTooLong(double work, double bound) =>
        Invariant($"--exact: judging every trial roster by the exact chain would take about {work:0.#e+0} state-steps, more than the bound of {bound:0.#e+0} (without --exact the search uses MOL first and the chain only where MOL has no answer; --allow-long to run it anyway)");

    /// <summary><c>staff</c>: --chart without --by-hour.</summary>
    public const string StaffChartByHourOnly = "staff: --chart draws a roster by hour; give it with --by-hour";

    /// <summary><c>staff --by-hour --chart</c> when no unit has a roster to draw (every unit has unlimited servers).</summary>
    public static string RosterChartEmpty(string path) => $"--chart '{Q(path)}': no unit has a limited number of servers, so there is no roster to draw";

    /// <summary><c>solve</c>: the hour-by-hour formulas did not settle; the steady state is still written.</summary>
    public static string SolveByHourNotSettled(string file, string reason) =>
        $"{file}: warning: no hour-by-hour view: the time-varying formulas did not settle ({reason}); the steady state below is the daily average";

    /// <summary><c>report</c>: the hour-by-hour formulas did not settle; the report goes on without its hour-by-hour section.</summary>
    public static string ReportByHourNotSettled(string file, string reason) =>
        $"{file}: warning: no hour-by-hour section: the time-varying formulas did not settle ({reason}); the report shows the daily average";

    /// <summary><c>staff --shifts</c> not a list of start hours.</summary>
    public static string NotShifts(string text) => $"--shifts: '{text}' is not a list of shift start hours; write whole hours from 0 to 23 in rising order, e.g. 07,15,23";

    /// <summary><c>staff --by-hour</c>: a target no roster can meet.</summary>
    public static string RosterImpossible(string unitId, string reason) => $"{Program}staff --by-hour: unit '{Q(unitId)}': no roster meets the targets: {Q(reason)}";

    /// <summary><c>staff</c>: the two halves of the wait-tail target.</summary>
    public const string StaffWaitTailPair = "staff: --wait-over and --at-most go together (e.g. --wait-over 4h --at-most 5%)";

    /// <summary><c>staff --cost</c> not in the form UNIT=COST.</summary>
    public static string NotCost(string text, double max) =>
        Invariant($"--cost: '{Q(text)}' is not UNIT=COST with a cost above 0 and at most {max:0} (write e.g. --cost ward=2.5)");

    /// <summary><c>--target</c> not in the form of a target.</summary>
    public static string NotTarget(string text, string problem) =>
        $"--target: '{SafeText.ForDisplay(text)}' {SafeText.ForDisplay(problem)} (write e.g. --target 'emergency: mean_wait <= 15min' or --target 'wait_over 4h <= 5%')";

    /// <summary><c>--target</c>: turned_away at a unit that is never full.</summary>
    public static string TargetNeedsCapacity(string text, string unit) =>
        $"{Program}--target {SafeText.ForDisplay(text)}: unit '{unit}' has no capacity, so it is never full; turned_away needs 'capacity'";

    /// <summary><c>staff --only</c> naming no unit.</summary>
    public const string StaffOnlyEmpty = "--only: give unit ids separated by commas (e.g. --only emergency,imaging)";

    /// <summary><c>staff --budget</c>: the servers cannot be placed.</summary>
    public static string BudgetImpossible(string why) => $"{Program}staff: {Q(why)}";

    /// <summary><c>staff</c>: one unit cannot meet the targets.</summary>
    public static string TargetImpossible(string unit, string why) => $"{Program}staff: unit '{Q(unit)}' cannot meet the targets: {Q(why)}";

    /// <summary><c>simulate</c>: a unit's relaxation time is long against the warm-up or the run, so its simulated means may be biased.</summary>
    public static string SlowUnit(string unit, double relaxationHours, double warmupHours, double durationHours) =>
        $"{Program}warning: unit '{Q(unit)}' relaxes in about {RelaxationText(relaxationHours)}, long against a warm-up of {PeopleFormat.Time(warmupHours)} "
        + $"and a run of {PeopleFormat.Time(durationHours)} (aim for 5 and 10 times it): its simulated means may be biased; "
        + "try a longer --warmup and --duration, or more replications";

    /// <summary><c>simulate</c>: the slow units beyond those listed by <see cref="SlowUnit"/>, counted in one line.</summary>
    public static string MoreSlowUnits(int count) => string.Create(
        CultureInfo.InvariantCulture,
        $"{Program}warning: {count:N0} more units relax slowly against this warm-up and run (the {WarningLog.ShownPerKind} slowest are listed above); their simulated means may be biased too");

    /// <summary><c>simulate</c>: MSER-5 on the number in the network says the start-up transient outlasted the warm-up.</summary>
    public static string WarmupShortByMser(double cutHours, double warmupHours) =>
        $"{Program}warning: the number of patients in the network settled only after about {PeopleFormat.Time(cutHours)} (MSER-5), "
        + $"beyond the warm-up of {PeopleFormat.Time(warmupHours)}: the results may carry the empty start; try a --warmup of at least that";

    private static string RelaxationText(double hours) => double.IsFinite(hours) ? PeopleFormat.Time(hours) : "never (it is unstable)";

    /// <summary><c>simulate</c> or <c>report --simulate</c> stopped with some replications finished.</summary>
    public static string StoppedPartway(int finished, int replications, string consequence) =>
        Invariant($"{Program}stopped: {finished} of {replications} replications finished; {consequence}");

    /// <summary><c>map</c> refused: the network is larger than a map is drawn for.</summary>
    public static string MapTooLarge(int units, int most) =>
        Invariant($"{Program}the network has {units} units and a map is drawn for at most {most}, because a larger map is too big to open or print legibly: map one part of the network at a time (a file with one hospital's units), or use 'report', whose unit table lists every unit");

    /// <summary><c>map</c> written.</summary>
    public static string MapWritten(int units, string target) => Invariant($"map of {units} units written to {Q(target)}");

    /// <summary><c>report</c>: <c>SOURCE_DATE_EPOCH</c> is set but is not a date the report can show.</summary>
    public static string BadSourceDateEpoch(string value) =>
        $"SOURCE_DATE_EPOCH: '{value}' is not a whole number of seconds since 1970-01-01 UTC between 0 and 253402300799";

    /// <summary><c>report</c> written.</summary>
    public static string ReportWritten(string target) => $"report written to {Q(target)}";

    /// <summary><c>fit -o</c> written.</summary>
    public static string NetworkWritten(string target) => $"network file written to {Q(target)}";

    /// <summary><c>fit</c>: the movement log cannot be fitted.</summary>
    /// <summary>A count with its noun in the right number: "1 route", "5 routes".</summary>
    private static string Counted(int count, string one, string many) => Invariant($"{count} {(count == 1 ? one : many)}");

    public static string FitProblem(string path, string problem) => $"{Q(path)}: {Q(problem)}";

    /// <summary><c>fit</c>: the comment heading the network file written, one line each.</summary>
    public static string[] FittedHeader(string log, int patients, int stays, double window, string timeUnitName) =>
    [
        Invariant($"Estimated by netsolve fit from {Q(log)}: {patients} {(patients == 1 ? "patient" : "patients")}, {stays} {(stays == 1 ? "stay" : "stays")},"),
        Invariant($"arrivals over {window:0.##} {timeUnitName}s. Servers are the most patients seen in service at once:"),
        "check them against the roster before planning with this file.",
    ];

    /// <summary><c>fit --time-zone</c>: not a zone of the bundled tz database.</summary>
    public static string NotTimeZone(string text) =>
        $"--time-zone: '{Q(text)}' is not an IANA time zone name (write e.g. Europe/London, America/New_York or UTC)";

    /// <summary><c>fit --extract-start</c> / <c>--extract-end</c>: not a time in a log format.</summary>
    public static string NotLogTime(string option, string text) =>
        $"{option}: '{Q(text)}' is not a time (write e.g. 2026-03-02T08:15, 2026-03-02T08:15:30+01:00 or 02/03/2026 08:15)";

    /// <summary><c>fit</c>: the extract's end is not after its start.</summary>
    public const string ExtractEndsBeforeStart = "--extract-end: the extract must end after it starts (--extract-start)";

    /// <summary><c>fit</c>: the summary's account of the log read and its window.</summary>
    public static string FitRead(long patients, long journeys, long stays, string from, string to) =>
        Invariant($"read {stays:N0} stays of {patients:N0} patients in {journeys:N0} journeys, extract {from} to {to} (UTC)");

    /// <summary><c>fit</c>: the messy rows found, each kind with its count and what was done ("messy rows: none" when clean).</summary>
    public static string FitMessyRows(LogProblemCounts p, double newJourneyAfterHours)
    {
        ArgumentNullException.ThrowIfNull(p);
        (long Count, string What)[] kinds =
        [
            (p.Duplicates, "exact duplicates dropped"),
            (p.Readmissions, Invariant($"readmissions (a new journey after a gap over {newJourneyAfterHours:0.##} h)")),
            (p.OverlappingStays, "overlapping stays taken as transfers"),
            (p.NestedStays, "stays inside another stay kept out of routing"),
            (p.ZeroDurations, "stays of no length (kept)"),
            (p.NegativeDurations, "stays running backwards dropped"),
            (p.UnknownColumns, "unknown columns ignored"),
            (p.RowsOutOfOrder, "rows out of time order"),
            (p.OutsideExtract, "stays outside the extract dropped"),
            (p.ClockChangeTimes, "local times in a clock-change hour"),
        ];
        var counts = kinds.Where(kind => kind.Count > 0).Select(kind => Invariant($"{kind.Count:N0} {kind.What}")).ToList();
        return counts.Count > 0 ? "messy rows: " + string.Join("; ", counts) : "messy rows: none";
    }

    /// <summary><c>fit</c>: stays cut by the extract's ends, allowed for in the mean stays.</summary>
    public static string FitCensored(long stillRunning, long runningAtStart) =>
        Invariant($"{stillRunning:N0} stays still running at the extract's end and {runningAtStart:N0} already running at its start: mean stays are fitted with them counted as such, not dropped (exponential and lognormal maximum likelihood with censoring, Kaplan-Meier curve)");

    /// <summary><c>fit</c>: a unit where no patient waited, so its peak in service is only a lower bound on servers.</summary>
    public static string FitNeverQueued(string unit, int peak) =>
        Invariant($"unit '{Q(unit)}': never queued: at least {peak} servers (no patient waited, so the peak in service shows demand, not capacity; set servers from the roster)");

    /// <summary><c>fit --servers</c>: not UNIT=N with N a whole number of at least 1.</summary>
    public static string FitServersNotCount(string entry) =>
        $"--servers: '{Q(entry)}' is not UNIT=N with N a whole number of servers, at least 1, nor a roster file (write e.g. --servers ward=30 or --servers roster.csv)";

    /// <summary><c>fit --servers</c>: one unit's servers given twice.</summary>
    public static string FitServersTwice(string unit, string first, string second) =>
        $"--servers: unit '{Q(unit)}' is given twice ('{Q(first)}' and '{Q(second)}'); give each unit once";

    /// <summary><c>fit --servers</c>: the unit is not in the log.</summary>
    public static string FitServersUnknownUnit(string unit, IEnumerable<string> units) =>
        $"--servers: the log has no unit '{Q(unit)}' (its units: {Q(string.Join(", ", units))})";

    /// <summary><c>fit</c>: the progress bar's label while a large log is read.</summary>
    public static string ReadingLog(string fileName) => $"reading {Q(fileName)}";

    /// <summary><c>fit</c>: the log has no start-of-service times.</summary>
    public const string FitNoStartTimes = "no start-of-service times (column 'started'): waits count as service, so mean service and servers include any waiting";

    // Files written.

    /// <summary>The folder of an output file does not exist.</summary>
    public static string NoFolder(string path, string folder) => $"{Q(path)}: cannot write: the folder {Q(folder)} does not exist";

    /// <summary>An output file cannot be written.</summary>
    public static string CannotWrite(string path, string reason) => $"{Q(path)}: cannot write: {Q(reason)}";

    /// <summary>A file option given an empty value.</summary>
    public static string EmptyPath(string option) => $"{option}: an empty value names no file; give a file name";

    /// <summary>An output path that cannot name a file: a NUL or another character the system refuses in a path.</summary>
    public static string NotPath(string option, string text) =>
        $"{option}: '{Q(text)}' is not a usable file name (it holds a character such as NUL that no file name may hold)";

    /// <summary>A name given on the command line with a character that names may not hold; <paramref name="why"/> says which.</summary>
    public static string NotName(string option, string text, string why) => $"{option}: '{Q(text)}' cannot be a name: {why}";

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);

    /// <summary>A value quoted from the input, escaped for the terminal (<see cref="TerminalText.Quote"/>).</summary>
    private static string Q(string text) => TerminalText.Quote(text);
}
