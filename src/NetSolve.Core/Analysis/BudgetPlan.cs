using System.Collections.Immutable;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>Where a budget of extra servers cuts the mean time in the network most.</summary>
/// <param name="Budget">Extra servers to place.</param>
/// <param name="Units">Units that can take servers (finite servers, positive flow), in file order, with what they received.</param>
/// <param name="Before">The network as given, solved.</param>
/// <param name="After">The network with the servers placed, solved; null when the budget cannot make every unit stable.</param>
/// <param name="Impossible">Why the budget is not enough, or null.</param>
public sealed record BudgetPlan(int Budget, ImmutableArray<UnitAllocation> Units, NetworkSolution Before, NetworkSolution? After, string? Impossible)
{
    /// <summary>With costs per server: the cost of the servers placed (at most <see cref="Budget"/>); null when every server costs 1.</summary>
    public double? Spent { get; init; }

    /// <summary>Servers placed (the whole budget when feasible and every server costs 1).</summary>
    public int Placed => Units.Sum(unit => unit.Added);
}
