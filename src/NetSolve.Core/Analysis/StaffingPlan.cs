using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>The result of a staffing search: servers per unit, and the network solved with them.</summary>
/// <param name="Targets">The targets searched for.</param>
/// <param name="Units">One answer per unit, in file order.</param>
/// <param name="Before">The network as given, solved.</param>
/// <param name="After">The network with the required servers, solved; null when some unit cannot meet the targets.</param>
public sealed record StaffingPlan(StaffingTargets Targets, ImmutableArray<UnitStaffing> Units, NetworkSolution Before, NetworkSolution? After)
{
    /// <summary>True when every unit can meet the targets.</summary>
    public bool IsFeasible => Units.All(unit => unit.Impossible is null);

    /// <summary>Servers added over all units.</summary>
    public int TotalAdded => Units.Sum(unit => unit.Added);

    /// <summary>Cost of the added servers over all units.</summary>
    public double TotalCost => Units.Sum(unit => unit.Cost);

    /// <summary>The network with the required servers (the given network when some unit cannot meet the targets).</summary>
    public Network Network => After?.Network ?? Before.Network;
}
