using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>The solved network: one result per unit in file order, plus totals.</summary>
/// <param name="Network">The network that was solved.</param>
/// <param name="Units">Per-unit metrics in file order.</param>
/// <param name="Totals">Network totals.</param>
/// <param name="StrainThreshold">The utilisation threshold used for <see cref="UnitStatus.Strained"/>.</param>
public sealed record NetworkSolution(
    Network Network,
    ImmutableArray<UnitResult> Units,
    NetworkTotals Totals,
    double StrainThreshold)
{
    /// <summary>
    /// Per patient group: the default group (when it has arrivals) and the network's groups, in file order; empty when
    /// the network has no groups, or when the solution was built from given flows (<see cref="NetworkSolver.FromFlows"/>).
    /// </summary>
    public ImmutableArray<GroupResult> Groups { get; init; } = [];

    /// <summary>
    /// The hour-by-hour solution (docs/time-of-day.md), present only when arrivals vary by hour and the caller asked
    /// for it (<see cref="HourByHour.AddWhenArrivalsVary"/>); the steady-state <see cref="Units"/> are then the daily average.
    /// </summary>
    public TimeVaryingSolution? ByHour { get; init; }

    /// <summary>True exactly when no unit is unstable.</summary>
    public bool IsStable => Units.All(unit => unit.IsStable);
}
