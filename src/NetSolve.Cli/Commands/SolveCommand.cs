using System.CommandLine;
using NetSolve.Solving;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve solve FILE</c>: solves the network as a Jackson network and reports every unit.</summary>
internal static class SolveCommand
{
    public static Command Create(CliContext context)
    {
        var input = new NetworkInput();
        var format = CommonOptions.Format();
        var strain = CommonOptions.Strain();
        var command = new Command("solve", "Solve the network: load, utilisation, waits and headroom of every unit, bottleneck and network totals.")
        {
            input.File, format, strain, input.Set,
        };
        command.SetAction(parse =>
        {
            var network = input.Load(parse, context);
            var solution = NetworkSolver.Solve(network, parse.GetValue(strain));
            SolutionOutput.Write(solution, parse.GetValue(format)!, context);
            return ExitCodes.Success;
        });
        return command;
    }
}
