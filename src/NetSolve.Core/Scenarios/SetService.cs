using NetSolve.Diagnostics;

namespace NetSolve.Scenarios;

/// <summary>Gives a unit a new mean service time.</summary>
/// <param name="Location">Where the change was written.</param>
/// <param name="UnitId">The unit.</param>
/// <param name="MeanServiceHours">The new mean service time in hours; positive and finite.</param>
public sealed record SetService(SourceLocation Location, string UnitId, double MeanServiceHours) : NetworkChange(Location);
