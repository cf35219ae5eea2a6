namespace NetSolve.Analysis;

/// <summary>One unit's answer in a staffing search.</summary>
/// <param name="UnitId">The unit.</param>
/// <param name="CurrentServers">Servers today; null for unlimited.</param>
/// <param name="RequiredServers">The fewest servers, at least today's, that meet every target; null for unlimited or when impossible.</param>
/// <param name="CostPerServer">The weight of one added server here (1 unless given).</param>
/// <param name="Impossible">Why no number of servers meets the targets, or null.</param>
public sealed record UnitStaffing(string UnitId, int? CurrentServers, int? RequiredServers, double CostPerServer, string? Impossible)
{
    /// <summary>Servers to add: required minus current; 0 for unlimited or impossible.</summary>
    public int Added => RequiredServers is int required && CurrentServers is int current ? required - current : 0;

    /// <summary><see cref="Added"/> times <see cref="CostPerServer"/>.</summary>
    public double Cost => Added * CostPerServer;
}
