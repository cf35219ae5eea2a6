using System.Collections.Immutable;

namespace NetSolve.Solving;

/// <summary>The effective flows of a network with bed limits, from <see cref="CapacityFlows.Solve(NetSolve.Model.Network)"/>.</summary>
/// <remarks>Immutable. Units in the network's order; groups as <see cref="OfferedByGroup"/> describes.</remarks>
/// <param name="Units">One row per unit, in file order.</param>
/// <param name="OfferedByGroup">
/// Offered rate per hour at each unit (inner index) for each traffic class (outer index): the default group (the
/// network's own arrivals and routes) first, then the network's patient groups in order. They add up to the offered rates.
/// </param>
/// <param name="Iterations">Substitution steps taken.</param>
public sealed record CapacityFlowSolution(
    ImmutableArray<UnitCapacityFlow> Units,
    ImmutableArray<ImmutableArray<double>> OfferedByGroup,
    int Iterations)
{
    /// <summary>Patients per hour turned away anywhere in the network (they leave it).</summary>
    public double TurnedAwayPerHour => Units.Sum(unit => unit.TurnedAwayPerHour);

    /// <summary>Diversions per hour anywhere in the network; a patient diverted twice counts twice.</summary>
    public double DivertedPerHour => Units.Sum(unit => unit.DivertedPerHour);
}
