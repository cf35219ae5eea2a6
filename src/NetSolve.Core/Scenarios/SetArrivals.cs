using NetSolve.Diagnostics;

namespace NetSolve.Scenarios;

/// <summary>Sets the external arrival rate at a unit (0 removes the stream).</summary>
/// <param name="Location">Where the change was written.</param>
/// <param name="UnitId">The unit.</param>
/// <param name="PerHour">Arrivals per hour; finite and not negative.</param>
public sealed record SetArrivals(SourceLocation Location, string UnitId, double PerHour) : NetworkChange(Location);
