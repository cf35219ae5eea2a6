using System.CommandLine;
using System.CommandLine.Parsing;
using NetSolve.Analysis;
using NetSolve.Cli.Commands;
using NetSolve.Cli.Settings;
using NetSolve.Model;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Cli;

/// <summary>The simulation options <c>simulate</c> and <c>report --simulate</c> share, defined once so they read the same.</summary>
internal static class SimulationCliOptions
{
    /// <summary>Examples shown when a run length is not a duration.</summary>
    private const string RunExamples = "28d, 12h, 90min";

    private const string TooLong = "longer runs are better spent as more replications";

    /// <summary>What <c>--warmup</c> accepts: 0 up to ten years.</summary>
    public static readonly DurationRule Warmup = new(AllowZero: true, RunExamples, SettingLimits.MaxSimulatedDays, TooLong);

    /// <summary>What <c>--duration</c> accepts: above 0 up to ten years.</summary>
    public static readonly DurationRule Duration = new(AllowZero: false, RunExamples, SettingLimits.MaxSimulatedDays, TooLong);

    /// <summary>What <c>--wait-over</c> accepts: any time, 0 included.</summary>
    public static readonly DurationRule WaitOver = new(AllowZero: true, "30min, 4h, 1d");

    /// <summary><c>--seed</c>, default 1.</summary>
    public static Option<ulong> Seed() => new("--seed")
    {
        Description = "Seed of the run; the same seed gives the same numbers on any machine and thread count.",
        DefaultValueFactory = _ => 1UL,
        CustomParser = result => SettingOptions.Read(result, text => (OptionValues.Seed("--seed", text, out ulong seed), seed)),
    };

    /// <summary><c>--replications/-r</c>, from 1 to <see cref="SettingLimits.MaxReplications"/>.</summary>
    public static Option<int> Replications(int defaultValue)
    {
        var option = SettingOptions.WholeNumber("--replications", 1, SettingLimits.MaxReplications, defaultValue, "Independent replications (at least 2 for confidence intervals).");
        option.Aliases.Add("-r");
        return option;
    }

    /// <summary>A run length (<c>28d</c>, <c>12h</c>, <c>90min</c>); a bad value is a usage error naming the option.</summary>
    public static Option<string> RunLength(string name, string description, string? defaultValue, DurationRule rule) =>
        SettingOptions.Duration(name, rule, defaultValue, description);

    /// <summary>
    /// The options of a run, the run lengths read in the file's time unit; a length that breaks its rule only in
    /// this file's time unit (a bare number) is a <see cref="UsageException"/> naming every such option.
    /// </summary>
    public static SimulationOptions Read(ParseResult parse, TimeUnit timeUnit, Option<ulong> seed, Option<int> replications,
        (Option<string> Option, DurationRule Rule) warmup, (Option<string> Option, DurationRule Rule) duration, Option<string[]>? waitOver = null) =>
        ReadGiven(parse, timeUnit, seed, replications, warmup, duration, waitOver);

    /// <summary>As <see cref="Read"/>; a run length passed as null keeps the default of <see cref="SimulationOptions"/>, for the planner to replace.</summary>
    private static SimulationOptions ReadGiven(ParseResult parse, TimeUnit timeUnit, Option<ulong> seed, Option<int> replications,
        (Option<string> Option, DurationRule Rule)? warmup, (Option<string> Option, DurationRule Rule)? duration, Option<string[]>? waitOver)
    {
        ArgumentNullException.ThrowIfNull(parse);
        var problems = new List<string>();
        double Hours(Option option, string text, DurationRule rule)
        {
            if (OptionValues.Duration(option.Name, text, rule, timeUnit, out double hours) is string problem)
            {
                problems.Add(problem);
            }

            return hours;
        }

        var options = new SimulationOptions
        {
            Seed = parse.GetValue(seed),
            Replications = parse.GetValue(replications),
            WarmupHours = warmup is { } w ? Hours(w.Option, parse.GetValue(w.Option)!, w.Rule) : SimulationOptions.DefaultWarmupHours,
            DurationHours = duration is { } d ? Hours(d.Option, parse.GetValue(d.Option)!, d.Rule) : SimulationOptions.DefaultDurationHours,
            WaitThresholdsHours = waitOver is null ? [] : [.. (parse.GetValue(waitOver) ?? []).Select(text => Hours(waitOver, text, WaitOver))],
        };
        return problems.Count == 0 ? options : throw new UsageException(problems);
    }

    /// <summary><c>--allow-long</c>: run even when the estimated work is above <see cref="SettingLimits.MaxSimulatedEvents"/>.</summary>
    public static Option<bool> AllowLong() => new("--allow-long")
    {
        Description = "Run even when the estimated work is above 1 billion events (visits x run length x replications), which is refused by default as a likely slip.",
    };

    /// <summary>
    /// The work of one replication besides its events, in events of the same time, per unit and per patient group
    /// (and one for all patients): starting the replication and pooling its histograms and counts when it ends. Measured
    /// (docs/hardening.md) so that thousands of short replications, each cheap in events, are not mistaken for a short run.
    /// </summary>
    public const double SetUpEventsPerMetric = 200;

    /// <summary>
    /// The work of a run in events, roughly: two per visit (arrival and departure) at the solved arrival rates, over
    /// warm-up and duration, plus each replication's set-up and pooling (<see cref="SetUpEventsPerMetric"/>), in every replication.
    /// </summary>
    public static double EstimatedEvents(NetworkSolution solution, SimulationOptions options)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(options);
        double visitsPerHour = solution.Units.Sum(unit => double.IsFinite(unit.ArrivalsPerHour) ? unit.ArrivalsPerHour : 0.0);
        double setUp = SetUpEventsPerMetric * (solution.Network.Units.Length + solution.Network.Groups.Length + 1);
        return ((2.0 * visitsPerHour * (options.WarmupHours + options.DurationHours)) + setUp) * options.Replications;
    }

    /// <summary>Refuses a run above <see cref="SettingLimits.MaxSimulatedEvents"/> unless <paramref name="allowLong"/>: a usage error naming the bound.</summary>
    public static void CheckWork(NetworkSolution solution, SimulationOptions options, bool allowLong)
    {
        double events = EstimatedEvents(solution, options);
        if (!allowLong && events > SettingLimits.MaxSimulatedEvents)
        {
            throw new UsageException(Messages.SimulationTooLong(events, SettingLimits.MaxSimulatedEvents));
        }
    }

    /// <summary><c>--precision</c>: a relative precision, <c>5%</c> or <c>0.05</c>, above 0 and below 100%; null when not given.</summary>
    public static Option<double?> Precision() => new("--precision")
    {
        Description = "Add replications until every unit's mean wait and mean number in unit has a 95% half-width within this share of its mean (e.g. 5%); up to --max-replications.",
        HelpName = "share",
        CustomParser = result => SettingOptions.Read<double?>(result, text => ReadPrecision(text) is double value
            ? (null, value)
            : (Messages.NotNumber("--precision", text, "a share", "above 0% and below 100%", "write e.g. 5% or 0.05"), null)),
    };

    /// <summary><c>--max-replications</c>: the bound on effort when a precision is asked.</summary>
    public static Option<int> MaxReplications() => SettingOptions.WholeNumber(
        "--max-replications", 2, SettingLimits.MaxReplications, SimulationOptions.DefaultMaxReplications,
        "With --precision: most replications to run before stopping and saying the precision was not reached.");

    private static double? ReadPrecision(string text)
    {
        bool percent = text.EndsWith('%');
        string number = percent ? text[..^1] : text;
        if (!OptionValues.Number(number, value => value > 0.0, out double value))
        {
            return null;
        }

        double share = percent ? value / 100.0 : value;
        return share is > 0.0 and < 1.0 ? share : null;
    }

    /// <summary>
    /// As <see cref="Read"/>, but a warm-up or run length not given is chosen from the slowest unit's relaxation time
    /// (<see cref="RunLengthPlanner"/>), and each unit whose relaxation time is long against the run is warned about
    /// on stderr, one line each for the slowest units and one line counting the rest.
    /// </summary>
    /// <param name="request">The command's request.</param>
    /// <param name="formula">The request's network solved: the relaxation times come from it (the caller solves once for this and the work estimate).</param>
    /// <param name="seed">The seed option.</param>
    /// <param name="replications">The replications option.</param>
    /// <param name="warmup">The warm-up option and its rule.</param>
    /// <param name="duration">The run length option and its rule.</param>
    /// <param name="waitOver">The wait thresholds option, when the command takes it.</param>
    public static SimulationOptions ReadPlanned(NetworkRequest request, NetworkSolution formula, Option<ulong> seed, Option<int> replications,
        (Option<string> Option, DurationRule Rule) warmup, (Option<string> Option, DurationRule Rule) duration, Option<string[]>? waitOver = null)
    {
        ArgumentNullException.ThrowIfNull(request);
        var parse = request.Parse;
        bool warmupGiven = parse.GetResult(warmup.Option) is { Implicit: false };
        bool durationGiven = parse.GetResult(duration.Option) is { Implicit: false };
        var read = ReadGiven(parse, request.Network.TimeUnit, seed, replications, warmupGiven ? warmup : null, durationGiven ? duration : null, waitOver);
        var plan = RunLengthPlanner.Plan(formula, warmupGiven ? read.WarmupHours : null, durationGiven ? read.DurationHours : null);
        // Slowest first, and at most as many as the warnings of one kind from a file (WarningLog): a generated network
        // run with no warm-up can have a slow unit in every one of its 100,000 units.
        foreach (var slow in plan.SlowUnits.Take(WarningLog.ShownPerKind))
        {
            request.Warnings.Report(Messages.SlowUnit(slow.Unit.Id, slow.Hours, plan.WarmupHours, plan.DurationHours));
        }

        if (plan.SlowUnits.Length > WarningLog.ShownPerKind)
        {
            request.Warnings.Report(Messages.MoreSlowUnits(plan.SlowUnits.Length - WarningLog.ShownPerKind));
        }

        // More replications where the run length met its bound before the slowest unit's relaxation times: in the
        // same proportion to the command's own default (simulate's 10, report's 5), unless given.
        bool replicationsGiven = parse.GetResult(replications) is { Implicit: false };
        int planned = replicationsGiven || plan.Replications <= SimulationOptions.DefaultReplications
            ? read.Replications
            : (int)Math.Ceiling((double)read.Replications * plan.Replications / SimulationOptions.DefaultReplications);
        return read with
        {
            Replications = planned,
            WarmupHours = plan.WarmupHours,
            DurationHours = plan.DurationHours,
            IsWarmupFromModel = plan.IsWarmupFromModel,
            IsDurationFromModel = plan.IsDurationFromModel,
        };
    }

    /// <summary><c>--wait-over T ...</c>: each a duration, 0 included.</summary>
    public static Option<string[]> WaitOverOption() => new("--wait-over")
    {
        Description = "Report P(wait > t) per unit for each time t (e.g. --wait-over 1h 4h).",
        AllowMultipleArgumentsPerToken = true,
        CustomParser = ReadWaits,
    };

    private static string[] ReadWaits(ArgumentResult result)
    {
        foreach (var token in result.Tokens)
        {
            if (OptionValues.Duration("--wait-over", token.Value, WaitOver, null, out _) is string problem)
            {
                result.AddError(problem);
            }
        }

        return [.. result.Tokens.Select(token => token.Value)];
    }
}
