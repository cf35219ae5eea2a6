namespace NetSolve.Analysis;

/// <summary>Where extra servers went in one unit.</summary>
/// <param name="UnitId">The unit.</param>
/// <param name="CurrentServers">Servers today.</param>
/// <param name="Added">Servers added in all.</param>
/// <param name="NeededForStability">Of <paramref name="Added"/>, how many were needed only to make the unit stable.</param>
public sealed record UnitAllocation(string UnitId, int CurrentServers, int Added, int NeededForStability);
