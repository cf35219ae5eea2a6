using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>The multi-class traffic of a network: each group's flow and, per unit, the total flow and service mixture.</summary>
/// <remarks>Immutable and thread-safe. Rates per hour, times in hours; no value is NaN or infinite.</remarks>
/// <param name="Network">The network solved.</param>
/// <param name="Groups">The default group first, then <see cref="Network.Groups"/> in file order.</param>
/// <param name="Units">All groups together at each unit, by unit position.</param>
public sealed record GroupTrafficSolution(Network Network, ImmutableArray<GroupFlow> Groups, ImmutableArray<UnitTraffic> Units)
{
    /// <summary>The default group: the network's top-level arrivals and routes.</summary>
    public GroupFlow DefaultGroup => Groups[0];

    /// <summary>Total external arrivals per hour of every group: Σ_g Λ_g.</summary>
    public double ExternalArrivalsPerHour => Groups.Sum(group => group.ExternalArrivalsPerHour);

    /// <summary>The total flow into each unit per hour, λ_i, by unit position: the input of the per-unit formulas.</summary>
    public ImmutableArray<double> FlowsPerHour => [.. Units.Select(unit => unit.ArrivalsPerHour)];
}
