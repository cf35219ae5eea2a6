using System.CommandLine;
using System.Globalization;
using System.Text.RegularExpressions;
using NetSolve.Cli.Terminal;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Cli.Commands;

/// <summary>
/// <c>netsolve simulate FILE</c>: discrete-event simulation of the network, with every extension key, confidence
/// intervals and percentiles; <c>--compare</c> sets the formulas beside it.
/// </summary>
internal static partial class SimulateCommand
{
    public static Command Create(CliContext context)
    {
        var file = CommonOptions.NetworkFile();
        var format = CommonOptions.Format();
        var strain = CommonOptions.Strain();
        var seed = new Option<ulong>("--seed") { Description = "Seed of the run; the same seed gives the same numbers on any machine and thread count.", DefaultValueFactory = _ => 1UL };
        var replications = new Option<int>("--replications", "-r") { Description = "Independent replications (at least 2 for confidence intervals).", DefaultValueFactory = _ => SimulationOptions.DefaultReplications };
        replications.Validators.Add(result =>
        {
            if (result.GetValueOrDefault<int>() < 1)
            {
                result.AddError("--replications must be at least 1");
            }
        });
        var warmup = DurationOption("--warmup", "Simulated time discarded at the start of each replication (e.g. 28d; a bare number is in the file's time unit).", "28d", allowZero: true);
        var duration = DurationOption("--duration", "Simulated time measured in each replication after the warm-up (e.g. 364d).", "364d", allowZero: false);
        var waitOver = new Option<string[]>("--wait-over")
        {
            Description = "Report P(wait > t) per unit for each time t (e.g. --wait-over 1h 4h).",
            AllowMultipleArgumentsPerToken = true,
        };
        waitOver.Validators.Add(result =>
        {
            foreach (string text in result.GetValueOrDefault<string[]>() ?? [])
            {
                if (ParseDuration(text, TimeUnit.Hour, allowZero: true) is null)
                {
                    result.AddError($"--wait-over: '{text}' is not a duration (write e.g. 30min, 4h, 1d)");
                }
            }
        });
        var compare = new Option<bool>("--compare") { Description = "Set the formula (Jackson network) results beside the simulation, with a verdict per metric." };
        var threads = new Option<int>("--threads") { Description = "Most replications run at once (default: all cores); results do not depend on it.", DefaultValueFactory = _ => -1 };
        threads.Validators.Add(result =>
        {
            int value = result.GetValueOrDefault<int>();
            if (value is 0 or < -1)
            {
                result.AddError("--threads must be at least 1");
            }
        });

        var command = new Command("simulate", "Simulate the network: means with 95% confidence intervals, percentiles, waits over given times and queues by hour of day.")
        {
            file, format, strain, seed, replications, warmup, duration, waitOver, compare, threads,
        };
        command.SetAction(parse =>
        {
            var network = NetworkLoader.Load(parse.GetValue(file)!, context, forSimulation: true);
            var timeUnit = network.TimeUnit;
            var options = new SimulationOptions
            {
                Seed = parse.GetValue(seed),
                Replications = parse.GetValue(replications),
                WarmupHours = ParseDuration(parse.GetValue(warmup)!, timeUnit, allowZero: true)!.Value,
                DurationHours = ParseDuration(parse.GetValue(duration)!, timeUnit, allowZero: false)!.Value,
                WaitThresholdsHours = [.. (parse.GetValue(waitOver) ?? []).Select(text => ParseDuration(text, timeUnit, allowZero: true)!.Value)],
                MaxDegreeOfParallelism = parse.GetValue(threads),
            };
            var result = Run(network, options, context);
            if (result.ReplicationsFinished == 0)
            {
                context.Report("netsolve: stopped before any replication finished; nothing to report");
                return ExitCodes.InvalidInput;
            }

            if (!result.IsComplete)
            {
                context.Report(string.Create(CultureInfo.InvariantCulture,
                    $"netsolve: stopped: {result.ReplicationsFinished} of {options.Replications} replications finished; the results below use those"));
            }

            var formula = parse.GetValue(compare) ? NetworkSolver.Solve(network, parse.GetValue(strain)) : null;
            SimulationOutput.Write(result, formula, parse.GetValue(format)!, parse.GetValue(strain), context);
            return ExitCodes.Success;
        });
        return command;
    }

    private static SimulationResult Run(Network network, SimulationOptions options, CliContext context)
    {
        using var stop = new CancellationTokenSource();
        ConsoleCancelEventHandler onCancel = (_, args) =>
        {
            // Keep the process alive: the run stops at its next check and reports the finished replications.
            args.Cancel = true;
            stop.Cancel();
        };
        Console.CancelKeyPress += onCancel;
        try
        {
            return context.IsTerminal
                ? SimulationProgressBar.Run(progress => Simulator.Run(network, options, progress, stop.Token), context.Error)
                : Simulator.Run(network, options, null, stop.Token);
        }
        finally
        {
            Console.CancelKeyPress -= onCancel;
        }
    }

    private static Option<string> DurationOption(string name, string description, string defaultValue, bool allowZero)
    {
        var option = new Option<string>(name) { Description = description, DefaultValueFactory = _ => defaultValue };
        option.Validators.Add(result =>
        {
            string text = result.GetValueOrDefault<string>() ?? string.Empty;
            if (ParseDuration(text, TimeUnit.Hour, allowZero) is null)
            {
                result.AddError($"{name}: '{text}' is not a {(allowZero ? string.Empty : "positive ")}duration (write e.g. 28d, 12h, 90min)");
            }
        });
        return option;
    }

    /// <summary>Hours, or null when <paramref name="text"/> is not a duration; bare numbers are in <paramref name="timeUnit"/>.</summary>
    private static double? ParseDuration(string text, TimeUnit timeUnit, bool allowZero)
    {
        if (ValueParser.Duration(text, timeUnit, out double hours) is null)
        {
            return hours;
        }

        return allowZero && ZeroDurationRegex().IsMatch(text) ? 0.0 : null;
    }

    [GeneratedRegex("^0*(?:\\.0*)?(?: ?(?:s|min|h|d))?$", RegexOptions.CultureInvariant)]
    private static partial Regex ZeroDurationRegex();
}
