using System.Collections.Immutable;
using NetSolve.Diagnostics;
using NetSolve.Model;

namespace NetSolve.Scenarios;

/// <summary>What applying changes to a network gave: the changed network when valid, and every diagnostic.</summary>
/// <param name="Network">The changed network; null when any diagnostic is an error.</param>
/// <param name="Diagnostics">Errors and warnings in the order the changes were written.</param>
public sealed record EditResult(Network? Network, ImmutableArray<Diagnostic> Diagnostics)
{
    /// <summary>True when a change could not be applied or the result breaks a network rule.</summary>
    public bool HasErrors => Diagnostics.Any(diagnostic => diagnostic.IsError);
}
