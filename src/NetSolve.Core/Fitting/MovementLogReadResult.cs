using System.Collections.Immutable;
using NetSolve.Diagnostics;

namespace NetSolve.Fitting;

/// <summary>A movement log read, or null when an error stopped it, with every problem found as a located diagnostic.</summary>
/// <param name="Log">The log; null when any diagnostic is an error.</param>
/// <param name="Diagnostics">Errors, and warnings such as an unknown column ignored.</param>
public sealed record MovementLogReadResult(MovementLog? Log, ImmutableArray<Diagnostic> Diagnostics);
