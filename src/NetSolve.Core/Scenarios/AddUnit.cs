using NetSolve.Diagnostics;
using NetSolve.Model;

namespace NetSolve.Scenarios;

/// <summary>Adds a new unit at the end of the network; its arrivals and routes are further changes.</summary>
/// <param name="Location">Where the change was written.</param>
/// <param name="Unit">The new unit; its id must not be taken.</param>
public sealed record AddUnit(SourceLocation Location, Unit Unit) : NetworkChange(Location);
