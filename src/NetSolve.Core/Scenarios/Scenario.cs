using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Scenarios;

/// <summary>A named what-if: a base network, the changes made to it and the changed network.</summary>
/// <remarks>A plain network file read as a scenario has no changes and <see cref="Network"/> equals <see cref="Base"/>.</remarks>
/// <param name="Name">Shown in outputs: the scenario's <c>scenario</c> key, else its file name without extension.</param>
/// <param name="File">The scenario (or network) file as given.</param>
/// <param name="Base">The base network as read.</param>
/// <param name="Changes">The changes in the order they apply.</param>
/// <param name="Network">The base with the changes applied, validated.</param>
public sealed record Scenario(string Name, string File, Network Base, ImmutableArray<NetworkChange> Changes, Network Network);
