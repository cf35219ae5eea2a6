using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Cli;

/// <summary>
/// The network a command works on and what was changed to make it: a scenario file's changes, then the
/// <c>--set</c> changes, each as a planner's phrase, so every output can list them under its title.
/// </summary>
/// <param name="Network">The network with every change applied, validated.</param>
/// <param name="Changes">The changes in the order they applied; empty for a plain network file without <c>--set</c>.</param>
internal sealed record LoadedNetwork(Network Network, ImmutableArray<string> Changes);
