using System.CommandLine;
using NetSolve.Analysis;
using NetSolve.Cli.Output;
using NetSolve.Cli.Settings;
using NetSolve.Presentation;
using NetSolve.Presentation.Scenarios;
using NetSolve.Solving;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve compare BASE SCENARIO...</c>: scenarios side by side with a base network.</summary>
/// <remarks>
/// Not a <see cref="NetworkCommand"/>: here <c>--set</c> does not change the base but adds one more scenario, and
/// every file, the base included, is already read as a network or scenario file.
/// </remarks>
internal static class CompareCommand
{
    public static Command Create(CliContext context)
    {
        var baseFile = new Argument<string>("BASE") { Description = "The base: a network file (or a scenario file)." };
        var scenarios = new Argument<string[]>("SCENARIO")
        {
            Description = "Scenario files (see docs/scenarios.md) or network files to compare with the base.",
            Arity = ArgumentArity.ZeroOrMore,
        };
        var format = CommonOptions.Format("Output: table (for people), json (one document) or csv (one row per scenario, unit and metric).");
        var strain = CommonOptions.Strain();
        var set = WhatIfOption.Create();
        set.Description = "Adds one more scenario: the base with these what-if changes. " + WhatIfOption.Description;
        var command = new Command("compare", "Compare scenarios with a base network: per-unit and total metrics of each, absolute and relative "
            + "change, units whose status changes and the new bottleneck.")
        {
            baseFile, scenarios, format, strain, set,
        };
        baseFile.CheckAfterOptions(result => result.GetResult(scenarios) is not { Tokens.Count: > 0 } && !result.IsGiven(set) ? [Messages.CompareNeedsScenario] : []);
        command.SetAction(parse =>
        {
            string[] sets = parse.GetValue(set) ?? [];
            double threshold = parse.GetValue(strain);
            var warnings = new WarningLog(context);
            var loader = new ScenarioLoader(warnings);
            string basePath = parse.GetValue(baseFile)!;
            var baseScenario = loader.Load(basePath);
            var compared = new List<(string Name, NetworkSolution Solution)>();
            foreach (string path in parse.GetValue(scenarios) ?? [])
            {
                var scenario = loader.Load(path);
                compared.Add((scenario.Name, NetworkSolver.Solve(scenario.Network, threshold)));
            }

            if (sets.Length > 0)
            {
                var changed = NetworkLoader.ApplyOverrides(baseScenario.Network, basePath, sets, warnings);
                compared.Add((Messages.WhatIfScenario(sets), NetworkSolver.Solve(changed, threshold)));
            }

            var result = NetworkComparison.Compare(baseScenario.Name, NetworkSolver.Solve(baseScenario.Network, threshold), compared);
            new ResultOutput(context.Out, CommonOptions.FormatOf(parse.GetValue(format)), Caution.Text).Write(
                json => ComparisonOutput.WriteJson(result, json),
                csv => ComparisonOutput.WriteCsv(result, csv),
                table => ComparisonOutput.WriteTable(result, table));
            return ExitCodes.Success;
        });
        return command;
    }
}
