using System.Globalization;
using NetSolve.Presentation.Formats;

namespace NetSolve.Cli;

/// <summary>
/// Every line the command line shows people, besides the results themselves and the help texts kept beside their
/// options: usage errors, input errors, progress and confirmations. One place, so the wording stays consistent and
/// a change of wording is one edit.
/// </summary>
/// <remarks>
/// Usage problems name their option first (<c>--steps: '0' is not a whole number from 1 to 10000</c>) and get the
/// <see cref="Program"/> prefix when printed; every number is written in invariant culture.
/// </remarks>
internal static class Messages
{
    /// <summary>Starts every line the program writes about itself (not lines that start with a file path).</summary>
    public const string Program = "netsolve: ";

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
    public static string Usage(string problem) => Program + problem;

    /// <summary>A defect in NetSolve: one line, the stack only with <c>--verbose</c>.</summary>
    public static string InternalError(Exception exception, bool verbose) =>
        $"{Program}internal error: {OneLine(exception.Message)}" + (verbose ? "\n" + exception : " (run again with --verbose for details)");

    /// <summary>The first line of <paramref name="text"/>, so a defect's message stays one line without --verbose.</summary>
    private static string OneLine(string text) => text.Split('\n', 2)[0].TrimEnd('\r');

    /// <summary>A problem the solver found in a network that passed validation (for example traffic that cannot be solved).</summary>
    public static string SolverProblem(string message) => Program + message;

    // Option values: one message per kind of value, each naming the option.

    /// <summary>A simulation whose estimated work is above the bound, refused unless asked for.</summary>
    public static string SimulationTooLong(double events, double bound) =>
        Invariant($"--duration: the run would simulate about {events:0.#e+0} events, more than the bound of {bound:0.#e+0} (fewer --replications or a shorter --duration or --warmup; --allow-long to run it anyway)");

    /// <summary>A whole number out of its range (or not a whole number at all).</summary>
    public static string NotWholeNumber(string option, string text, decimal min, decimal max) =>
        Invariant($"{option}: '{text}' is not a whole number from {min} to {max}");

    /// <summary>A number out of its range (or not a number at all); <paramref name="range"/> says which, as in "above 0 and at most 1".</summary>
    public static string NotNumber(string option, string text, string what, string range, string example) =>
        $"{option}: '{text}' is not {what} {range} ({example})";

    /// <summary>One of a fixed set of words.</summary>
    public static string NotOneOf(string option, string text, IEnumerable<string> choices) =>
        $"{option}: '{text}' is not one of {string.Join(", ", choices)}";

    /// <summary>A duration in a form not understood.</summary>
    public static string NotDuration(string option, string text, bool allowZero, string examples) =>
        $"{option}: '{text}' is not a {(allowZero ? string.Empty : "positive ")}duration (write e.g. {examples}; a bare number is in the file's time unit)";

    /// <summary>A duration longer than the command takes.</summary>
    public static string DurationTooLong(string option, string text, double maxDays, string why) =>
        Invariant($"{option}: '{text}' is longer than {maxDays} days; {why}");

    /// <summary>A duration shorter than the command needs.</summary>
    public static string DurationTooShort(string option, string text, string shortest, string why) =>
        $"{option}: '{text}' is shorter than {shortest}; {why}";

    /// <summary>A probability in a form not understood, or outside 0 to 1 (the message of the shared value parser).</summary>
    public static string NotProbability(string option, string problem) => $"{option}: {problem}";

    /// <summary>A value the files' own parser refuses as outside its range; its problem already says the range.</summary>
    public static string OutOfRange(string option, string problem) => $"{option}: {problem}";

    /// <summary>An output file name whose extension the command does not write.</summary>
    public static string WrongExtension(string option, string? text, IEnumerable<string> extensions) =>
        $"{option} '{text}': the file name must end in {string.Join(", ", extensions)}";

    /// <summary>An option that only means something with another.</summary>
    public static string OnlyWith(string option, string needed) => $"{option} applies only with {needed}";

    /// <summary>A unit named in an option that the network does not have.</summary>
    public static string UnknownUnit(string option, string text, string id, string hint) =>
        $"{Program}{option} {text}: unknown unit '{id}'{hint}";

    // Commands.

    /// <summary><c>check</c>: the file is valid.</summary>
    public static string Valid(string path, int units, int arrivals, int routes) =>
        Invariant($"{path}: valid: {units} units, {arrivals} arrival streams, {routes} routes");

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
        $"{Program}--stream {unit}: unit '{unit}' has no arrivals from outside to grow (streams: {string.Join(", ", streams)})";

    /// <summary><c>pathway</c> with neither start nor path.</summary>
    public const string PathwayNeedsStart = "pathway: give --from UNIT, --path A,B,C, or both";

    /// <summary><c>pathway --to</c> without <c>--from</c>.</summary>
    public const string PathwayToNeedsFrom = "pathway: --to needs --from (the chance of visiting is from a start unit)";

    /// <summary><c>pathway</c>: a question the analysis cannot answer for this network.</summary>
    public static string PathwayProblem(string problem) => $"{Program}pathway: {problem}";

    /// <summary><c>staff</c> with no question.</summary>
    public const string StaffNeedsTarget = "staff: give a target (--max-util, --max-wait, --max-time, --wait-over with --at-most, or --max-turned-away) or --budget N";

    /// <summary><c>staff --budget</c> mixed with targets.</summary>
    public const string StaffBudgetAlone = "staff: --budget answers its own question; give it without targets or --cost";

    /// <summary><c>staff --by-hour</c> with a question it does not answer.</summary>
    public const string StaffByHourTargets = "staff: --by-hour takes --max-wait, --max-time, --wait-over with --at-most and --max-util, not --budget, --cost or --max-turned-away";

    /// <summary><c>staff</c>: --shifts, --exact or --no-check without --by-hour.</summary>
    public const string StaffByHourOnly = "staff: --shifts, --exact and --no-check shape a roster; give them with --by-hour";

    /// <summary><c>staff --shifts</c> not a list of start hours.</summary>
    public static string NotShifts(string text) => $"--shifts: '{text}' is not a list of shift start hours; write whole hours from 0 to 23 in rising order, e.g. 07,15,23";

    /// <summary><c>staff --by-hour</c>: a target no roster can meet.</summary>
    public static string RosterImpossible(string unitId, string reason) => $"unit '{unitId}': no roster meets the targets: {reason}";

    /// <summary><c>staff</c>: the two halves of the wait-tail target.</summary>
    public const string StaffWaitTailPair = "staff: --wait-over and --at-most go together (e.g. --wait-over 4h --at-most 5%)";

    /// <summary><c>staff --cost</c> not in the form UNIT=COST.</summary>
    public static string NotCost(string text, double max) =>
        Invariant($"--cost: '{text}' is not UNIT=COST with a cost above 0 and at most {max:0} (write e.g. --cost ward=2.5)");

    /// <summary><c>staff --budget</c>: the servers cannot be placed.</summary>
    public static string BudgetImpossible(string why) => $"{Program}staff: {why}";

    /// <summary><c>staff</c>: one unit cannot meet the targets.</summary>
    public static string TargetImpossible(string unit, string why) => $"{Program}staff: unit '{unit}' cannot meet the targets: {why}";

    /// <summary><c>simulate</c>: a unit's relaxation time is long against the warm-up or the run, so its simulated means may be biased.</summary>
    public static string SlowUnit(string unit, double relaxationHours, double warmupHours, double durationHours) =>
        $"{Program}warning: unit '{unit}' relaxes in about {RelaxationText(relaxationHours)}, long against a warm-up of {PeopleFormat.Time(warmupHours)} "
        + $"and a run of {PeopleFormat.Time(durationHours)} (aim for 5 and 10 times it): its simulated means may be biased; "
        + "try a longer --warmup and --duration, or more replications";

    private static string RelaxationText(double hours) => double.IsFinite(hours) ? PeopleFormat.Time(hours) : "never (it is unstable)";

    /// <summary><c>simulate</c> or <c>report --simulate</c> stopped with some replications finished.</summary>
    public static string StoppedPartway(int finished, int replications, string consequence) =>
        Invariant($"{Program}stopped: {finished} of {replications} replications finished; {consequence}");

    /// <summary><c>map</c> written.</summary>
    public static string MapWritten(int units, string target) => Invariant($"map of {units} units written to {target}");

    /// <summary><c>report</c> written.</summary>
    public static string ReportWritten(string target) => $"report written to {target}";

    /// <summary><c>fit -o</c> written.</summary>
    public static string NetworkWritten(string target) => $"network file written to {target}";

    /// <summary><c>fit</c>: the movement log cannot be fitted.</summary>
    public static string FitProblem(string path, string problem) => $"{path}: {problem}";

    /// <summary><c>fit</c>: the comment heading the network file written, one line each.</summary>
    public static string[] FittedHeader(string log, int patients, int stays, double window, string timeUnitName) =>
    [
        Invariant($"Estimated by netsolve fit from {log}: {patients} patients, {stays} stays,"),
        Invariant($"arrivals over {window:0.##} {timeUnitName}s. Servers are the most patients seen in service at once:"),
        "check them against the roster before planning with this file.",
    ];

    // Files written.

    /// <summary>The folder of an output file does not exist.</summary>
    public static string NoFolder(string path, string folder) => $"{path}: cannot write: the folder {folder} does not exist";

    /// <summary>An output file cannot be written.</summary>
    public static string CannotWrite(string path, string reason) => $"{path}: cannot write: {reason}";

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
