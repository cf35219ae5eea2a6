using System.CommandLine;
using NetSolve.Analysis;
using NetSolve.Cli.Settings;
using NetSolve.Presentation.ByHour;
using NetSolve.Presentation.Solution;
using NetSolve.Solving;

namespace NetSolve.Cli.Commands;

/// <summary>
/// <c>netsolve solve FILE</c>: solves the network as a Jackson network and reports every unit; when arrivals vary by
/// hour (an <c>arrival_profile</c>), or with <c>--by-hour</c>, also every unit hour by hour from the time-varying formulas.
/// </summary>
internal sealed class SolveCommand() : NetworkCommand(
    "solve", "Solve the network: load, utilisation, waits and headroom of every unit, bottleneck and network totals.")
{
    private readonly Option<string[]> _target = TargetOption.Create("A missed target is named beside the unit's status.");

    private readonly Option<bool> _byHour = new("--by-hour")
    {
        Description = "Solve hour by hour even without an arrival profile (servers may follow a roster); with --format csv, write one row per unit and hour instead of one per unit.",
    };

    protected override IEnumerable<Symbol> Symbols => [_target, _byHour];

    protected override int Execute(NetworkRequest request)
    {
        var solution = (request with { Network = TargetOption.Apply(request.Network, request.GetValue(_target)) }).Solve();
        foreach (var warning in ReturnLoops.Warnings(request.Network, request.File))
        {
            request.Warnings.Report(warning.ToString());
        }

        bool byHourAsked = request.GetValue(_byHour);
        solution = WithHours(solution, byHourAsked, request);
        request.Output.Write(
            json => SolutionJsonWriter.Write(solution, json),
            csv =>
            {
                if (byHourAsked && solution.ByHour is not null)
                {
                    ByHourCsvWriter.Write(solution, csv);
                }
                else
                {
                    SolutionCsvWriter.Write(solution, csv);
                }
            },
            table => SolutionTableWriter.Write(solution, table));
        return ExitCodes.Success;
    }

    /// <summary>Adds the hour-by-hour solution when arrivals vary by hour or it was asked for; warns and goes on without it if it does not settle.</summary>
    private static NetworkSolution WithHours(NetworkSolution solution, bool asked, NetworkRequest request)
    {
        try
        {
            return asked
                ? solution with { ByHour = TimeVaryingSolver.Solve(solution.Network) }
                : HourByHour.AddWhenArrivalsVary(solution);
        }
        catch (TimeVaryingConvergenceException problem)
        {
            request.Warnings.Report(Messages.SolveByHourNotSettled(request.File, problem.Message));
            return solution;
        }
    }
}
