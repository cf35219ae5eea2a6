using System.CommandLine;
using System.Text;
using NetSolve.Rendering.Report;
using NetSolve.Solving;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve report FILE [SCENARIO ...] -o report.html</c>: the self-contained leadership report.</summary>
/// <remarks>Like <c>compare</c>: FILE and each SCENARIO may be a network file or a scenario file (docs/scenarios.md).</remarks>
internal static class ReportCommand
{
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
        var command = new Command("report", "Write the leadership report: finding, bottleneck map, unit table, waits as demand grows, scenarios, assumptions.")
        {
            file, scenarios, output, strain,
        };
        command.SetAction(parse =>
        {
            double threshold = parse.GetValue(strain);
            var loader = new ScenarioLoader(context);
            var baseline = NetworkSolver.Solve(loader.Load(parse.GetValue(file)!).Network, threshold);
            var alternatives = (parse.GetValue(scenarios) ?? [])
                .Select(loader.Load)
                .Select(scenario => new ReportScenario(scenario.Name, NetworkSolver.Solve(scenario.Network, threshold)))
                .ToList();
            string html = HtmlReport.Write(baseline, alternatives);
            string target = parse.GetValue(output)!;
            AtomicFile.Write(target, stream => stream.Write(new UTF8Encoding(false).GetBytes(html)));
            context.Out.Write($"report written to {target}\n");
            return ExitCodes.Success;
        });
        return command;
    }
}
