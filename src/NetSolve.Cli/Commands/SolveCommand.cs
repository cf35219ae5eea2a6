using NetSolve.Analysis;
using NetSolve.Presentation.Solution;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve solve FILE</c>: solves the network as a Jackson network and reports every unit.</summary>
internal sealed class SolveCommand() : NetworkCommand(
    "solve", "Solve the network: load, utilisation, waits and headroom of every unit, bottleneck and network totals.")
{
    protected override int Execute(NetworkRequest request)
    {
        var solution = request.Solve();
        foreach (var warning in ReturnLoops.Warnings(request.Network, request.File))
        {
            request.Warnings.Report(warning.ToString());
        }

        request.Output.Write(
            json => SolutionJsonWriter.Write(solution, json),
            csv => SolutionCsvWriter.Write(solution, csv),
            table => SolutionTableWriter.Write(solution, table));
        return ExitCodes.Success;
    }
}
