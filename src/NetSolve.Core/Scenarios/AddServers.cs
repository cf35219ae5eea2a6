using NetSolve.Diagnostics;

namespace NetSolve.Scenarios;

/// <summary>Adds servers to a unit with finite servers (a negative count removes them; at least one must remain).</summary>
/// <param name="Location">Where the change was written.</param>
/// <param name="UnitId">The unit.</param>
/// <param name="Count">Servers to add.</param>
public sealed record AddServers(SourceLocation Location, string UnitId, int Count) : NetworkChange(Location);
