namespace NetSolve.Model;

/// <summary>A patient group's own service-time distribution at one unit, replacing the unit's.</summary>
/// <param name="UnitId">The unit.</param>
/// <param name="Service">The distribution for this group's patients there.</param>
public sealed record GroupService(string UnitId, ServiceDistribution Service);
