using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>Assigns each unit its contract status: unstable, bottleneck, strained or ok.</summary>
public static class StatusRule
{
    /// <summary>
    /// Marks as bottleneck the stable unit(s) with finite servers and the smallest headroom (ties within a
    /// relative <see cref="Tolerances.HeadroomTie"/>), even when another unit is unstable; then strained where
    /// utilisation reaches <paramref name="strainThreshold"/>. Beside the status, each unit carries the targets it
    /// misses (<see cref="TargetCheck"/>): the status word keeps its meaning (headroom and strain), and a missed target
    /// is shown next to it, so a unit can be "ok" by load and still miss its wait target.
    /// </summary>
    public static ImmutableArray<UnitResult> Apply(IReadOnlyList<UnitResult> units, double strainThreshold)
    {
        ArgumentNullException.ThrowIfNull(units);
        double smallest = double.PositiveInfinity;
        foreach (var unit in units)
        {
            if (unit.IsStable && unit.Headroom is double headroom && double.IsFinite(headroom) && headroom < smallest)
            {
                smallest = headroom;
            }
        }

        var builder = ImmutableArray.CreateBuilder<UnitResult>(units.Count);
        foreach (var unit in units)
        {
            // Most units keep the status the formulas gave (ok or unstable): no copy of the result to say so again.
            var status = StatusOf(unit, smallest, strainThreshold);
            var ranked = status == unit.Status ? unit : unit with { Status = status };
            var breached = TargetCheck.Breached(ranked);

            // Most units have no targets: no second copy of a 200-byte result to say so (100,000 of them at a time).
            builder.Add(ranked.TargetsBreached == breached ? ranked : ranked with { TargetsBreached = breached });
        }

        return builder.MoveToImmutable();
    }

    private static UnitStatus StatusOf(UnitResult unit, double smallestHeadroom, double strainThreshold)
    {
        if (!unit.IsStable)
        {
            return UnitStatus.Unstable;
        }

        // An infinite headroom (a load too small to divide by) is never the first to saturate.
        if (unit.Headroom is double headroom && double.IsFinite(headroom)
            && headroom - smallestHeadroom <= Tolerances.HeadroomTie * Math.Max(headroom, smallestHeadroom))
        {
            return UnitStatus.Bottleneck;
        }

        return unit.Utilisation >= strainThreshold ? UnitStatus.Strained : UnitStatus.Ok;
    }
}
