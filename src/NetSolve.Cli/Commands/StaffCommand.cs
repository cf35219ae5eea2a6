using System.CommandLine;
using System.CommandLine.Parsing;
using System.Text;
using NetSolve.Analysis;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Presentation;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Staffing;
using NetSolve.Cli.Settings;
using NetSolve.Parsing;
using NetSolve.Rendering.Staffing;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve staff FILE</c>: the fewest added servers that meet targets, or where a budget of servers helps most.</summary>
internal sealed class StaffCommand() : NetworkCommand(
    "staff", "Staffing: the fewest added servers (optionally weighted by cost) so that every unit meets the targets, "
    + "or with --budget N where N extra servers cut the mean time in network most.")
{
    /// <summary>Staffing targets: a zero target is a valid question with the answer "impossible", which the search explains per unit.</summary>
    private static readonly DurationRule Target = new(AllowZero: true, "30min, 4h, 2d");

    private readonly Option<double?> _maxUtil = SettingOptions.OptionalFraction(
        "--max-util", _ => true, text => Messages.NotNumber("--max-util", text, "a utilisation", "from 0 to 1", "write e.g. 0.85 or 85%"),
        "Target: utilisation at most this, from 0 to 1 or 0% to 100% (e.g. 0.85 or 85%).",
        "FRACTION");

    private readonly Option<string> _maxWait = SettingOptions.Duration("--max-wait", Target, null, "Target: mean wait before service at most this (e.g. 30min, 4h).", "DURATION");

    private readonly Option<string> _maxTime = SettingOptions.Duration("--max-time", Target, null, "Target: mean time in unit, wait plus service, at most this.", "DURATION");

    private readonly Option<string> _waitOver = SettingOptions.Duration(
        "--wait-over", Target, null, "Target, with --at-most: the wait whose chance of being exceeded is limited (e.g. 4h).", "DURATION");

    private readonly Option<double?> _atMost = new("--at-most")
    {
        Description = "Target, with --wait-over: largest share of patients waiting longer (e.g. 5%).",
        HelpName = "PROBABILITY",
        CustomParser = result => SettingOptions.Read<double?>(result, text =>
            ValueParser.Probability(text, out double probability) is string problem ? (Messages.NotProbability("--at-most", problem), null) : (null, probability)),
    };

    private readonly Option<double?> _maxTurnedAway = new("--max-turned-away")
    {
        Description = "Target for units with a capacity: largest share of arriving patients who find the unit full (e.g. 5%); "
            + "each added server brings its own bed, so waiting places are kept.",
        HelpName = "PROBABILITY",
        CustomParser = result => SettingOptions.Read<double?>(result, text =>
            ValueParser.Probability(text, out double probability) is string problem ? (Messages.NotProbability("--max-turned-away", problem), null) : (null, probability)),
    };

    private readonly Option<string[]> _cost = new("--cost")
    {
        Description = "Cost of one server at a unit, repeatable (default 1 each): the targets search reports the cost of what it adds.",
        HelpName = "UNIT=COST",
        Arity = ArgumentArity.ZeroOrMore,
        CustomParser = ReadCosts,
    };

    private readonly Option<string[]> _target = TargetOption.Create("Set over the file's targets; staff meets every unit's own targets beside the options above.");

    private readonly Option<string> _only = new("--only")
    {
        Description = "Change only these units (ids separated by commas); the others keep their servers and are not checked.",
        HelpName = "UNIT,UNIT",
    };

    private readonly Option<int?> _budget = SettingOptions.OptionalWholeNumber(
        "--budget", 0, SettingLimits.MaxBudget, "Instead of targets: place this many extra servers where they cut the mean time in network most; with --cost, N is the most they may cost in all (solved exactly).", "N");

    private readonly Option<bool> _byHour = new("--by-hour")
    {
        Description = "Instead of one number per unit: the fewest servers in each hour of the day (a roster) that meet the targets in every hour, from the time-varying queue over the whole day.",
    };

    private readonly Option<int[]> _shifts = new("--shifts")
    {
        Description = "With --by-hour: shift start hours (e.g. 07,15,23); servers stay the same from each start to the next.",
        HelpName = "HOURS",
        CustomParser = ReadShifts,
    };

    private readonly Option<bool> _exact = new("--exact")
    {
        Description = "With --by-hour: judge every trial roster by the exact time-dependent queue (up to 50 servers; slower) instead of MOL first.",
    };

    private readonly Option<bool> _allowLong = new("--allow-long")
    {
        Description = "With --by-hour --exact: search even when the estimated work of the exact chain is above 200 million state-steps, which is refused by default as a likely slip.",
    };

    private readonly Option<bool> _noCheck = new("--no-check")
    {
        Description = "With --by-hour: skip the short simulation that checks the roster hour by hour.",
    };

    /// <summary>Chart extensions and what they write.</summary>
    private static readonly string[] ChartExtensions = [".svg", ".png"];

    private readonly Option<string> _chart = ChartOption();

    protected override string FormatDescription => "Output: table (for people), json (one document) or csv (one row per unit).";

    protected override IEnumerable<Symbol> Symbols => [_maxUtil, _maxWait, _maxTime, _waitOver, _atMost, _maxTurnedAway, _target, _only, _cost, _budget, _byHour, _shifts, _exact, _allowLong, _noCheck, _chart];

    protected override IEnumerable<string> CheckSettings(CommandResult settings)
    {
        bool tail = settings.IsGiven(_waitOver), atMost = settings.IsGiven(_atMost);
        if (tail != atMost)
        {
            yield return Messages.StaffWaitTailPair;
        }

        if (settings.IsGiven(_byHour) && (settings.IsGiven(_budget) || settings.IsGiven(_cost) || settings.IsGiven(_maxTurnedAway)))
        {
            yield return Messages.StaffByHourTargets;
        }

        if (!settings.IsGiven(_byHour) && (settings.IsGiven(_shifts) || settings.IsGiven(_exact) || settings.IsGiven(_noCheck)))
        {
            yield return Messages.StaffByHourOnly;
        }

        if (settings.IsGiven(_allowLong) && !(settings.IsGiven(_byHour) && settings.IsGiven(_exact)))
        {
            yield return Messages.StaffAllowLongExactOnly;
        }

        if (!settings.IsGiven(_byHour) && settings.IsGiven(_chart))
        {
            yield return Messages.StaffChartByHourOnly;
        }

        bool targets = settings.IsGiven(_maxUtil) || settings.IsGiven(_maxWait) || settings.IsGiven(_maxTime) || tail || atMost || settings.IsGiven(_maxTurnedAway)
            || settings.IsGiven(_target);
        if (settings.IsGiven(_budget) && (targets || settings.IsGiven(_only)))
        {
            yield return Messages.StaffBudgetAlone;
        }

        if (settings.IsGiven(_only) && settings.TryGetValue(_only, out string? only) && Ids(only).Length == 0)
        {
            yield return Messages.StaffOnlyEmpty;
        }
    }

    private static string[] Ids(string? list) => list is null ? [] : list.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries);

    protected override int Execute(NetworkRequest request)
    {
        var network = request.Network;
        if (request.GetValue(_budget) is int servers)
        {
            var costs = Costs(network, request.GetValue(_cost) ?? []);
            var plan = costs.Count == 0 ? BudgetAllocation.Allocate(request.Solve(), servers) : CostedBudgetAllocation.Allocate(request.Solve(), servers, costs);
            if (plan.Impossible is not null)
            {
                throw new InputException(Messages.BudgetImpossible(plan.Impossible));
            }

            request.Output.Write(json => BudgetOutput.WriteJson(plan, json), csv => BudgetOutput.WriteCsv(plan, csv), table => BudgetOutput.WriteTable(plan, table));
            return ExitCodes.Success;
        }

        network = TargetOption.Apply(network, request.GetValue(_target));
        var targets = Targets(request, network.TimeUnit);
        if (targets.IsEmpty && network.Units.All(unit => unit.Targets is not { IsEmpty: false }))
        {
            throw new UsageException(Messages.StaffNeedsTarget);
        }

        if (request.GetValue(_byHour))
        {
            // The hour-by-hour search reads the command line's targets only (per-unit file targets are for the steady state).
            if (targets.IsEmpty)
            {
                throw new UsageException(Messages.StaffNeedsTarget);
            }

            return ExecuteByHour(request with { Network = network }, targets);
        }

        var unitCosts = Costs(network, request.GetValue(_cost) ?? []);
        var only = Only(network, request.GetValue(_only));
        var staffing = StaffingSearch.MeetTargets((request with { Network = network }).Solve(), targets, unitCosts, only);
        if (!staffing.IsFeasible)
        {
            throw new InputException(string.Join("\n", staffing.Units.Where(unit => unit.Impossible is not null)
                .Select(unit => Messages.TargetImpossible(unit.UnitId, unit.Impossible!))));
        }

        request.Output.Write(json => StaffingOutput.WriteJson(staffing, json), csv => StaffingOutput.WriteCsv(staffing, csv), table => StaffingOutput.WriteTable(staffing, table));
        return ExitCodes.Success;
    }

    private StaffingTargets Targets(NetworkRequest request, TimeUnit timeUnit)
    {
        var problems = new List<string>();
        double? Hours(Option<string> option)
        {
            if (request.GetValue(option) is not string text)
            {
                return null;
            }

            if (OptionValues.Duration(option.Name, text, Target, timeUnit, out double hours) is string problem)
            {
                problems.Add(problem);
            }
            else
            {
                BareOptionNumbers.Report(request.Warnings, option.Name, text, timeUnit);
            }

            return hours;
        }

        double? maxWait = Hours(_maxWait), maxTime = Hours(_maxTime), over = Hours(_waitOver);
        if (problems.Count > 0)
        {
            throw new UsageException(problems);
        }

        var tail = over is double t && request.GetValue(_atMost) is double probability ? new WaitTailTarget(t, probability) : null;
        return new StaffingTargets(request.GetValue(_maxUtil), maxWait, maxTime, tail, request.GetValue(_maxTurnedAway));
    }

    /// <summary>The units of <c>--only</c>; null when not given. An id the network lacks is invalid input, every one named.</summary>
    private static HashSet<string>? Only(Network network, string? list)
    {
        if (list is null)
        {
            return null;
        }

        var ids = network.Units.Select(unit => unit.Id).ToList();
        var problems = Ids(list).Where(id => !ids.Contains(id, StringComparer.Ordinal))
            .Select(id => Messages.UnknownUnit("--only", SafeText.ForDisplay(list), SafeText.ForDisplay(id), NearestName.Hint(id, ids))).ToList();
        return problems.Count == 0 ? Ids(list).ToHashSet(StringComparer.Ordinal) : throw new InputException(string.Join("\n", problems));
    }

    private int ExecuteByHour(NetworkRequest request, StaffingTargets targets)
    {
        var network = request.Network;
        var options = HourlyStaffingOptions.Default with
        {
            ShiftStarts = [.. request.GetValue(_shifts) ?? []],
            ExactChain = request.GetValue(_exact),
            Simulate = !request.GetValue(_noCheck),
        };
        if (options.ExactChain && !request.GetValue(_allowLong) && ExactChainWork.Estimate(network) is double work && work > SettingLimits.MaxExactChainStateSteps)
        {
            throw new UsageException(Messages.StaffExactTooLong(work, SettingLimits.MaxExactChainStateSteps));
        }

        var plan = HourlyStaffingSearch.Find(network, targets, options, out var impossible);
        if (plan is null)
        {
            throw new InputException(Messages.RosterImpossible(impossible!.Value.UnitId, impossible.Value.Reason));
        }

        // The chart is drawn and written before anything is printed, so a chart that cannot be written leaves no output behind.
        if (request.GetValue(_chart) is string chartPath)
        {
            byte[]? chart = string.Equals(Path.GetExtension(chartPath), ".png", StringComparison.OrdinalIgnoreCase)
                ? RosterChart.Png(plan, network)
                : RosterChart.Svg(plan, network) is string svg ? new UTF8Encoding(false).GetBytes(svg + "\n") : null;
            if (chart is null)
            {
                throw new InputException(Messages.RosterChartEmpty(chartPath));
            }

            AtomicFile.Write(chartPath, stream => stream.Write(chart));
        }

        request.Output.WithCaution(Caution.HourByHour).Write(
            json => HourlyStaffingOutput.WriteJson(plan, network.Name, network.TimeUnit, json),
            csv => HourlyStaffingOutput.WriteCsv(plan, network.TimeUnit, csv),
            table => HourlyStaffingOutput.WriteTable(plan, network.Name, network.TimeUnit, table));
        return ExitCodes.Success;
    }

    /// <summary><c>--chart FILE</c>: its extension (.svg or .png) picks the format; another is a usage error.</summary>
    private static Option<string> ChartOption()
    {
        var option = new Option<string>("--chart")
        {
            Description = "With --by-hour: also draw the roster here, per unit demand by hour against the roster's servers and the flat staffing; the extension picks the format: .svg or .png.",
            HelpName = "FILE",
        };
        option.Validators.Add(result =>
        {
            string value = result.GetValueOrDefault<string>() ?? string.Empty;
            if (value.IndexOfAny(Path.GetInvalidPathChars()) >= 0)
            {
                result.AddError(Messages.NotPath("--chart", value));
            }
            else if (!ChartExtensions.Contains(Path.GetExtension(value).ToLowerInvariant(), StringComparer.Ordinal))
            {
                result.AddError(Messages.WrongExtension("--chart", value, ChartExtensions));
            }
        });
        return option;
    }

    private static int[] ReadShifts(ArgumentResult result)
    {
        string text = string.Join(",", result.Tokens.Select(token => token.Value));
        var hours = new List<int>();
        foreach (string part in text.Split(','))
        {
            if (!OptionValues.Number(part, value => value is >= 0 and <= 23 && value == Math.Floor(value), out double hour) || (hours.Count > 0 && hour <= hours[^1]))
            {
                result.AddError(Messages.NotShifts(text));
                return [];
            }

            hours.Add((int)hour);
        }

        return [.. hours];
    }

    private static string[] ReadCosts(ArgumentResult result)
    {
        foreach (var token in result.Tokens)
        {
            if (ParseCost(token.Value) is null)
            {
                result.AddError(Messages.NotCost(token.Value, SettingLimits.MaxCost));
            }
        }

        return [.. result.Tokens.Select(token => token.Value)];
    }

    private static (string Unit, double Cost)? ParseCost(string text)
    {
        int equals = text.IndexOf('=', StringComparison.Ordinal);
        return equals > 0 && OptionValues.Number(text[(equals + 1)..], value => value is > 0.0 and <= SettingLimits.MaxCost, out double cost)
            ? (text[..equals], cost)
            : null;
    }

    private static Dictionary<string, double> Costs(Network network, string[] texts)
    {
        var costs = new Dictionary<string, double>(StringComparer.Ordinal);
        var ids = network.Units.Select(unit => unit.Id).ToList();
        var problems = new List<string>();
        foreach (string text in texts)
        {
            var (id, cost) = ParseCost(text)!.Value;
            if (ids.Contains(id, StringComparer.Ordinal))
            {
                costs[id] = cost;
            }
            else
            {
                problems.Add(Messages.UnknownUnit("--cost", text, id, NearestName.Hint(id, ids)));
            }
        }

        return problems.Count == 0 ? costs : throw new InputException(string.Join("\n", problems));
    }
}
