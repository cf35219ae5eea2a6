using System.CommandLine;
using NetSolve.Analysis;
using NetSolve.Cli.Settings;
using NetSolve.Presentation.Solution;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve solve FILE</c>: solves the network as a Jackson network and reports every unit.</summary>
internal sealed class SolveCommand() : NetworkCommand(
    "solve", "Solve the network: load, utilisation, waits and headroom of every unit, bottleneck and network totals.")
{
    private readonly Option<string[]> _target = TargetOption.Create("A missed target is named beside the unit's status.");

    protected override IEnumerable<Symbol> Symbols => [_target];

    protected override int Execute(NetworkRequest request)
    {
        var solution = (request with { Network = TargetOption.Apply(request.Network, request.GetValue(_target)) }).Solve();
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
