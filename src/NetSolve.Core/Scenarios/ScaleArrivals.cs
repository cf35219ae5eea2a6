using NetSolve.Diagnostics;

namespace NetSolve.Scenarios;

/// <summary>Multiplies one external arrival stream, or all of them, by a factor.</summary>
/// <param name="Location">Where the change was written.</param>
/// <param name="UnitId">The unit whose stream grows, or null for every stream.</param>
/// <param name="Factor">Finite and not negative.</param>
public sealed record ScaleArrivals(SourceLocation Location, string? UnitId, double Factor) : NetworkChange(Location);
