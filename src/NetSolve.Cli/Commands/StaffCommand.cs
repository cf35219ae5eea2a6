using System.CommandLine;
using System.Globalization;
using NetSolve.Analysis;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Presentation;
using NetSolve.Presentation.Staffing;
using NetSolve.Parsing;
using NetSolve.Solving;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve staff FILE</c>: the fewest added servers that meet targets, or where a budget of servers helps most.</summary>
internal static class StaffCommand
{
    public static Command Create(CliContext context)
    {
        var input = new NetworkInput();
        var format = CommonOptions.Format();
        format.Description = "Output: table (for people), json (one document) or csv (one row per unit).";
        var strain = CommonOptions.Strain();
        var maxUtil = new Option<double?>("--max-util") { Description = "Target: utilisation at most this, from 0 to 1 (e.g. 0.85).", HelpName = "FRACTION" };
        var maxWait = new Option<string>("--max-wait") { Description = "Target: mean wait before service at most this (e.g. 30min, 4h).", HelpName = "DURATION" };
        var maxTime = new Option<string>("--max-time") { Description = "Target: mean time in unit, wait plus service, at most this.", HelpName = "DURATION" };
        var waitOver = new Option<string>("--wait-over") { Description = "Target, with --at-most: the wait whose chance of being exceeded is limited (e.g. 4h).", HelpName = "DURATION" };
        var atMost = new Option<string>("--at-most") { Description = "Target, with --wait-over: largest share of patients waiting longer (e.g. 5%).", HelpName = "PROBABILITY" };
        var cost = new Option<string[]>("--cost")
        {
            Description = "Cost of one server at a unit, repeatable (default 1 each): the targets search reports the cost of what it adds.",
            HelpName = "UNIT=COST",
            Arity = ArgumentArity.ZeroOrMore,
        };
        var budget = new Option<int?>("--budget") { Description = "Instead of targets: place this many extra servers where they cut the mean time in network most.", HelpName = "N" };
        maxUtil.Validators.Add(result =>
        {
            if (result.GetValueOrDefault<double?>() is double u && !(u >= 0.0 && u <= 1.0))
            {
                result.AddError(string.Create(CultureInfo.InvariantCulture, $"--max-util must be from 0 to 1, not {u}"));
            }
        });
        budget.Validators.Add(result =>
        {
            if (result.GetValueOrDefault<int?>() is int n && n < 0)
            {
                result.AddError("--budget must be 0 or more servers");
            }
        });
        var command = new Command("staff", "Staffing: the fewest added servers (optionally weighted by cost) so that every unit meets the targets, "
            + "or with --budget N where N extra servers cut the mean time in network most.")
        {
            input.File, format, strain, input.Set, maxUtil, maxWait, maxTime, waitOver, atMost, cost, budget,
        };
        command.SetAction(parse =>
        {
            var network = input.Load(parse, context);
            var targets = Targets(network.TimeUnit, parse.GetValue(maxUtil), parse.GetValue(maxWait), parse.GetValue(maxTime), parse.GetValue(waitOver), parse.GetValue(atMost));
            var costs = Costs(network, parse.GetValue(cost) ?? []);
            var solution = NetworkSolver.Solve(network, parse.GetValue(strain));
            string chosen = parse.GetValue(format)!;
            if (parse.GetValue(budget) is int servers)
            {
                if (!targets.IsEmpty || costs.Count > 0)
                {
                    throw new InputException("netsolve: staff: --budget answers its own question; give it without targets or --cost");
                }

                var plan = BudgetAllocation.Allocate(solution, servers);
                if (plan.Impossible is not null)
                {
                    throw new InputException("netsolve: staff: " + plan.Impossible);
                }

                Write(chosen, context, json => BudgetOutput.WriteJson(plan, json), text => BudgetOutput.WriteCsv(plan, text), text => BudgetOutput.WriteTable(plan, text));
                return ExitCodes.Success;
            }

            if (targets.IsEmpty)
            {
                throw new InputException("netsolve: staff: give a target (--max-util, --max-wait, --max-time, or --wait-over with --at-most) or --budget N");
            }

            var staffing = StaffingSearch.MeetTargets(solution, targets, costs);
            if (!staffing.IsFeasible)
            {
                throw new InputException(string.Join("\n", staffing.Units.Where(unit => unit.Impossible is not null)
                    .Select(unit => $"netsolve: staff: unit '{unit.UnitId}' cannot meet the targets: {unit.Impossible}")));
            }

            Write(chosen, context, json => StaffingOutput.WriteJson(staffing, json), text => StaffingOutput.WriteCsv(staffing, text), text => StaffingOutput.WriteTable(staffing, text));
            return ExitCodes.Success;
        });
        return command;
    }

    private static StaffingTargets Targets(TimeUnit timeUnit, double? maxUtil, string? maxWait, string? maxTime, string? waitOver, string? atMost)
    {
        if ((waitOver is null) != (atMost is null))
        {
            throw new InputException("netsolve: staff: --wait-over and --at-most go together (e.g. --wait-over 4h --at-most 5%)");
        }

        WaitTailTarget? tail = null;
        if (waitOver is not null)
        {
            double over = Duration("--wait-over", waitOver, timeUnit, allowZero: true);
            if (ValueParser.Probability(atMost!, out double probability) is string error)
            {
                throw new InputException($"netsolve: staff: --at-most: {error}");
            }

            tail = new WaitTailTarget(over, probability);
        }

        return new StaffingTargets(
            maxUtil,
            maxWait is null ? null : Duration("--max-wait", maxWait, timeUnit, allowZero: true),
            maxTime is null ? null : Duration("--max-time", maxTime, timeUnit, allowZero: true),
            tail);
    }

    private static double Duration(string option, string text, TimeUnit timeUnit, bool allowZero)
    {
        // A zero target is a valid question with the answer "impossible", which the search explains per unit.
        if (allowZero && ValueParser.Number(text.TrimEnd('s', 'm', 'i', 'n', 'h', 'd', ' '), out double number) is null && number == 0.0)
        {
            return 0.0;
        }

        return ValueParser.Duration(text, timeUnit, out double hours) is string error
            ? throw new InputException($"netsolve: staff: {option}: {error}")
            : hours;
    }

    private static Dictionary<string, double> Costs(Network network, string[] texts)
    {
        var costs = new Dictionary<string, double>(StringComparer.Ordinal);
        var ids = network.Units.Select(unit => unit.Id).ToList();
        foreach (string text in texts)
        {
            int equals = text.IndexOf('=', StringComparison.Ordinal);
            string id = equals > 0 ? text[..equals] : string.Empty;
            if (equals <= 0 || ValueParser.Number(text[(equals + 1)..], out double value) is not null || !(value > 0.0))
            {
                throw new InputException($"netsolve: --cost {text}: expected UNIT=COST with a cost above 0, e.g. --cost ward=2.5");
            }

            if (!ids.Contains(id))
            {
                throw new InputException($"netsolve: --cost {text}: unknown unit '{id}'{NearestName.Hint(id, ids)}");
            }

            costs[id] = value;
        }

        return costs;
    }

    private static void Write(string format, CliContext context, Action<Stream> json, Action<TextWriter> csv, Action<TextWriter> table)
    {
        switch (format)
        {
            case "json":
                using (var buffer = new MemoryStream())
                {
                    json(buffer);
                    context.Out.Write(System.Text.Encoding.UTF8.GetString(buffer.ToArray()) + "\n");
                }

                break;
            case "csv":
                csv(context.Out);
                break;
            default:
                table(context.Out);
                context.Out.Write("\n" + Caution.Text + "\n");
                break;
        }
    }
}
