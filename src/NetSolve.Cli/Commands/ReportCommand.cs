using System.CommandLine;
using System.CommandLine.Parsing;
using System.Globalization;
using System.Text;
using NetSolve.Model;
using NetSolve.Rendering.Report;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve report FILE [SCENARIO ...] -o report.html [--simulate]</c>: the self-contained leadership report.</summary>
/// <remarks>
/// Like <c>compare</c>: FILE and each SCENARIO may be a network file or a scenario file (docs/scenarios.md).
/// <c>--simulate</c> also simulates FILE and adds the time-of-day and formula-against-simulation sections.
/// </remarks>
internal static class ReportCommand
{
    /// <summary>Replications for a report: fewer than <c>simulate</c>'s 10 so a report stays quick; still 4 degrees of freedom.</summary>
    public const int DefaultReplications = 5;

    /// <summary>Measured time per replication for a report: 13 whole weeks (a quarter), so every hour and weekday counts equally.</summary>
    public const string DefaultDuration = "91d";

    /// <summary>Warm-up for a report: as <c>simulate</c>'s, since wards with stays of days need it whatever the run length.</summary>
    public const string DefaultWarmup = "28d";

    private static readonly string[] Extensions = [".html", ".htm"];

    public static Command Create(CliContext context)
    {
        var file = CommonOptions.NetworkFile();
        var scenarios = new Argument<string[]>("SCENARIO")
        {
            Description = "Scenario files (see docs/scenarios.md) or network files, each solved and compared with FILE.",
            Arity = ArgumentArity.ZeroOrMore,
        };
        var output = MapCommand.OutputOption("Write the report here (.html): one file with everything inline, to open in any browser, e-mail or print.", Extensions);
        var strain = CommonOptions.Strain();
        var set = WhatIfOption.Create();
        var simulate = new Option<bool>("--simulate")
        {
            Description = "Also simulate FILE and add the mean queue by hour of day (chart and table) and the formula against the simulation per unit.",
        };
        var seed = SimulationCliOptions.Seed();
        var replications = SimulationCliOptions.Replications(DefaultReplications);
        var warmup = SimulationCliOptions.Duration("--warmup", "With --simulate: simulated time discarded at the start of each replication.", DefaultWarmup, allowZero: true);
        var duration = SimulationCliOptions.Duration("--duration", "With --simulate: simulated time measured in each replication, at least a day.", DefaultDuration, allowZero: false);
        var command = new Command("report", "Write the leadership report: finding, bottleneck map, unit table, waits as demand grows, scenarios, assumptions; with --simulate, queues by hour of day.")
        {
            file, scenarios, output, strain, set, simulate, seed, replications, warmup, duration,
        };
        command.Validators.Add(result =>
        {
            if (result.GetValue(simulate))
            {
                return;
            }

            foreach (Option option in new Option[] { seed, replications, warmup, duration })
            {
                if (result.GetResult(option) is OptionResult given && !given.Implicit)
                {
                    result.AddError($"{option.Name} applies only with --simulate");
                }
            }
        });
        command.SetAction(parse =>
        {
            double threshold = parse.GetValue(strain);
            var loader = new ScenarioLoader(context);
            string path = parse.GetValue(file)!;
            var network = loader.Load(path).Network;
            if (parse.GetValue(set) is { Length: > 0 } changes)
            {
                network = NetworkLoader.ApplyOverrides(network, path, changes, context);
            }

            var baseline = NetworkSolver.Solve(network, threshold);
            var alternatives = (parse.GetValue(scenarios) ?? [])
                .Select(loader.Load)
                .Select(scenario => new ReportScenario(scenario.Name, NetworkSolver.Solve(scenario.Network, threshold)))
                .ToList();
            SimulationResult? simulation = null;
            if (parse.GetValue(simulate))
            {
                var timeUnit = baseline.Network.TimeUnit;
                var options = new SimulationOptions
                {
                    Seed = parse.GetValue(seed),
                    Replications = parse.GetValue(replications),
                    WarmupHours = SimulationCliOptions.ParseDuration(parse.GetValue(warmup)!, timeUnit, allowZero: true)!.Value,
                    DurationHours = SimulationCliOptions.ParseDuration(parse.GetValue(duration)!, timeUnit, allowZero: false)!.Value,
                };
                if (options.DurationHours < TimeConstants.HoursPerDay)
                {
                    context.Report($"netsolve: --duration '{parse.GetValue(duration)}' is shorter than a day; the time-of-day section needs every hour measured");
                    return ExitCodes.Usage;
                }

                simulation = SimulationRun.Run(baseline.Network, options, context);
                if (simulation.ReplicationsFinished == 0)
                {
                    context.Report("netsolve: stopped before any replication finished; no report written");
                    return ExitCodes.InvalidInput;
                }

                if (!simulation.IsComplete)
                {
                    context.Report(string.Create(CultureInfo.InvariantCulture,
                        $"netsolve: stopped: {simulation.ReplicationsFinished} of {options.Replications} replications finished; the report uses those"));
                }
            }

            string html = HtmlReport.Write(baseline, alternatives, simulation);
            string target = parse.GetValue(output)!;
            AtomicFile.Write(target, stream => stream.Write(new UTF8Encoding(false).GetBytes(html)));
            context.Out.Write($"report written to {target}\n");
            return ExitCodes.Success;
        });
        return command;
    }
}
