using System.CommandLine;
using NetSolve.Model;

namespace NetSolve.Cli;

/// <summary>
/// The network a command reads: the FILE argument and the <c>--set</c> what-if changes, declared and loaded the
/// same way by every command that takes a network, so none of them can forget the changes.
/// </summary>
internal sealed class NetworkInput
{
    /// <summary>The network file argument.</summary>
    public Argument<string> File { get; } = CommonOptions.NetworkFile();

    /// <summary>The repeatable <c>--set</c> option.</summary>
    public Option<string[]> Set { get; } = WhatIfOption.Create();

    /// <summary>Reads the file, prints its warnings and applies the changes; bad input is an <see cref="InputException"/>.</summary>
    /// <param name="parse">The parsed command line.</param>
    /// <param name="context">Where warnings go.</param>
    /// <param name="forSimulation">True for the simulator, which uses the keys the formulas ignore.</param>
    public Network Load(ParseResult parse, CliContext context, bool forSimulation = false) =>
        NetworkLoader.Load(parse.GetValue(File)!, context, parse.GetValue(Set), forSimulation);
}
