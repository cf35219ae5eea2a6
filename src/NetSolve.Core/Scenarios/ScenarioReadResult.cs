using System.Collections.Immutable;
using NetSolve.Diagnostics;

namespace NetSolve.Scenarios;

/// <summary>What reading a scenario file gave: the scenario when valid, and every diagnostic.</summary>
/// <param name="Scenario">The scenario; null when any diagnostic is an error.</param>
/// <param name="Diagnostics">Errors and warnings of the scenario file, its base network and the changed network.</param>
public sealed record ScenarioReadResult(Scenario? Scenario, ImmutableArray<Diagnostic> Diagnostics)
{
    /// <summary>True when the scenario cannot be used.</summary>
    public bool HasErrors => Diagnostics.Any(diagnostic => diagnostic.IsError);
}
