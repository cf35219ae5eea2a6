using System.Collections.Immutable;
using NetSolve.Diagnostics;
using NetSolve.Model;

namespace NetSolve.Parsing;

/// <summary>What reading a network file gave: the network when valid, and every diagnostic in file order.</summary>
/// <param name="Network">The network; null when any diagnostic is an error.</param>
/// <param name="Diagnostics">Errors and warnings, sorted by position.</param>
public sealed record ReadResult(Network? Network, ImmutableArray<Diagnostic> Diagnostics)
{
    /// <summary>True when the file is invalid.</summary>
    public bool HasErrors => Diagnostics.Any(diagnostic => diagnostic.IsError);
}
