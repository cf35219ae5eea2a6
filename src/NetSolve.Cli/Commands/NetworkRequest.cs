using System.Collections.Immutable;
using System.CommandLine;
using NetSolve.Analysis;
using NetSolve.Cli.Output;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Cli.Commands;

/// <summary>
/// What a network command's handler gets: the network loaded from FILE (a network or scenario file) with the
/// <c>--set</c> changes applied, the strain threshold, where and how to write, and the parsed command line for the
/// command's own options, every one already valid in form.
/// </summary>
/// <param name="File">FILE as given.</param>
/// <param name="Network">The network to work on, validated.</param>
/// <param name="StrainThreshold">From <c>--strain</c> (the default when the command does not take it).</param>
/// <param name="Output">Stdout in the format of <c>--format</c> (table when the command does not take it).</param>
/// <param name="Context">Stdout and stderr.</param>
/// <param name="Warnings">Warnings printed so far; files the command reads later share it, so none is printed twice.</param>
/// <param name="Parse">The parsed command line.</param>
internal sealed record NetworkRequest(
    string File,
    Network Network,
    double StrainThreshold,
    ResultOutput Output,
    CliContext Context,
    WarningLog Warnings,
    ParseResult Parse)
{
    /// <summary>
    /// What the scenario file and <c>--set</c> changed, in planner's words and in the order they applied; empty for a
    /// plain network file. <see cref="Output"/> already lists them under a table's title and in JSON; a command that
    /// writes a file of its own (the map) shows them itself.
    /// </summary>
    public ImmutableArray<string> Changes { get; init; } = [];

    /// <summary>Solves <see cref="Network"/> with <see cref="StrainThreshold"/>.</summary>
    public NetworkSolution Solve()
    {
        var solution = NetworkSolver.Solve(Network, StrainThreshold);
        foreach (var warning in LoadPlausibility.Warnings(solution, File))
        {
            Warnings.Report(warning.ToString());
        }

        return solution;
    }

    /// <summary>The value of one of the command's options (its default when not given).</summary>
    public T? GetValue<T>(Option<T> option) => Parse.GetValue(option);

    /// <summary>The value of one of the command's arguments.</summary>
    public T? GetValue<T>(Argument<T> argument) => Parse.GetValue(argument);
}
