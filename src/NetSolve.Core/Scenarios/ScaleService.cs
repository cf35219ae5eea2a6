using NetSolve.Diagnostics;

namespace NetSolve.Scenarios;

/// <summary>Multiplies a unit's mean service time by a factor (0.9 is ten per cent faster).</summary>
/// <param name="Location">Where the change was written.</param>
/// <param name="UnitId">The unit.</param>
/// <param name="Factor">Positive and finite.</param>
public sealed record ScaleService(SourceLocation Location, string UnitId, double Factor) : NetworkChange(Location);
