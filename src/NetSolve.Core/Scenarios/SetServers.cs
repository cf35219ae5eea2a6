using NetSolve.Diagnostics;
using NetSolve.Model;

namespace NetSolve.Scenarios;

/// <summary>Gives a unit a new number of servers (or unlimited).</summary>
/// <param name="Location">Where the change was written.</param>
/// <param name="UnitId">The unit.</param>
/// <param name="Servers">Its new servers.</param>
public sealed record SetServers(SourceLocation Location, string UnitId, Servers Servers) : NetworkChange(Location);
