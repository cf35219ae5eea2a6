using System.CommandLine;
using NetSolve.Analysis;
using NetSolve.Presentation;
using NetSolve.Presentation.Scenarios;
using NetSolve.Solving;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve compare BASE SCENARIO...</c>: scenarios side by side with a base network.</summary>
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
        var format = CommonOptions.Format();
        format.Description = "Output: table (for people), json (one document) or csv (one row per scenario, unit and metric).";
        var strain = CommonOptions.Strain();
        var set = WhatIfOption.Create();
        set.Description = "Adds one more scenario: the base with these what-if changes. " + WhatIfOption.Description;
        var command = new Command("compare", "Compare scenarios with a base network: per-unit and total metrics of each, absolute and relative "
            + "change, units whose status changes and the new bottleneck.")
        {
            baseFile, scenarios, format, strain, set,
        };
        command.SetAction(parse =>
        {
            string[] paths = parse.GetValue(scenarios) ?? [];
            string[] sets = parse.GetValue(set) ?? [];
            if (paths.Length == 0 && sets.Length == 0)
            {
                throw new InputException("netsolve: compare: give at least one SCENARIO file, or --set changes, to compare with the base");
            }

            double threshold = parse.GetValue(strain);
            var loader = new ScenarioLoader(context);
            string basePath = parse.GetValue(baseFile)!;
            var baseScenario = loader.Load(basePath);
            var compared = new List<(string Name, NetworkSolution Solution)>();
            foreach (string path in paths)
            {
                var scenario = loader.Load(path);
                compared.Add((scenario.Name, NetworkSolver.Solve(scenario.Network, threshold)));
            }

            if (sets.Length > 0)
            {
                var changed = NetworkLoader.ApplyOverrides(baseScenario.Network, basePath, sets, context);
                compared.Add(("what-if: " + string.Join(", ", sets), NetworkSolver.Solve(changed, threshold)));
            }

            var result = NetworkComparison.Compare(baseScenario.Name, NetworkSolver.Solve(baseScenario.Network, threshold), compared);
            Write(result, parse.GetValue(format)!, context);
            return ExitCodes.Success;
        });
        return command;
    }

    private static void Write(ComparisonResult result, string format, CliContext context)
    {
        switch (format)
        {
            case "json":
                using (var buffer = new MemoryStream())
                {
                    ComparisonOutput.WriteJson(result, buffer);
                    context.Out.Write(System.Text.Encoding.UTF8.GetString(buffer.ToArray()) + "\n");
                }

                break;
            case "csv":
                ComparisonOutput.WriteCsv(result, context.Out);
                break;
            default:
                ComparisonOutput.WriteTable(result, context.Out);
                context.Out.Write("\n" + Caution.Text + "\n");
                break;
        }
    }
}
