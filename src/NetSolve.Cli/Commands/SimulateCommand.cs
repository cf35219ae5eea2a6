using System.CommandLine;
using System.Globalization;
using NetSolve.Model;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Cli.Commands;

/// <summary>
/// <c>netsolve simulate FILE</c>: discrete-event simulation of the network, with every extension key, confidence
/// intervals and percentiles; <c>--compare</c> sets the formulas beside it.
/// </summary>
internal static class SimulateCommand
{
    public static Command Create(CliContext context)
    {
        var input = new NetworkInput();
        var format = CommonOptions.Format();
        format.Description = "Output: table (for people), json (the contract's document) or csv (one row per unit; with --compare, one row per unit and metric).";
        var strain = CommonOptions.Strain();
        var seed = SimulationCliOptions.Seed();
        var replications = SimulationCliOptions.Replications(SimulationOptions.DefaultReplications);
        var warmup = SimulationCliOptions.Duration("--warmup", "Simulated time discarded at the start of each replication (e.g. 28d; a bare number is in the file's time unit).", "28d", allowZero: true);
        var duration = SimulationCliOptions.Duration("--duration", "Simulated time measured in each replication after the warm-up (e.g. 364d).", "364d", allowZero: false);
        var waitOver = new Option<string[]>("--wait-over")
        {
            Description = "Report P(wait > t) per unit for each time t (e.g. --wait-over 1h 4h).",
            AllowMultipleArgumentsPerToken = true,
        };
        waitOver.Validators.Add(result =>
        {
            foreach (string text in result.GetValueOrDefault<string[]>() ?? [])
            {
                if (SimulationCliOptions.ParseDuration(text, TimeUnit.Hour, allowZero: true) is null)
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
            input.File, input.Set, format, strain, seed, replications, warmup, duration, waitOver, compare, threads,
        };
        command.SetAction(parse =>
        {
            var network = input.Load(parse, context, forSimulation: true);
            var timeUnit = network.TimeUnit;
            var options = new SimulationOptions
            {
                Seed = parse.GetValue(seed),
                Replications = parse.GetValue(replications),
                WarmupHours = SimulationCliOptions.ParseDuration(parse.GetValue(warmup)!, timeUnit, allowZero: true)!.Value,
                DurationHours = SimulationCliOptions.ParseDuration(parse.GetValue(duration)!, timeUnit, allowZero: false)!.Value,
                WaitThresholdsHours = [.. (parse.GetValue(waitOver) ?? []).Select(text => SimulationCliOptions.ParseDuration(text, timeUnit, allowZero: true)!.Value)],
                MaxDegreeOfParallelism = parse.GetValue(threads),
            };
            var result = SimulationRun.Run(network, options, context);
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
}
