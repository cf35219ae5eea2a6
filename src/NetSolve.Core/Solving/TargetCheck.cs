using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>Which of a unit's targets its solved metrics miss.</summary>
/// <remarks>
/// A measure within a relative <see cref="Tolerance"/> of its target meets it, so that a target met exactly on paper is
/// not missed by the last bit of a quotient. An unstable unit has no finite wait, so it misses every target it has
/// except <c>turned_away</c> (a unit without a capacity is never full; one with a capacity is never unstable).
/// Thread-safe.
/// </remarks>
public static class TargetCheck
{
    /// <summary>Relative slack below which a measure still meets its target.</summary>
    public const double Tolerance = 1e-12;

    /// <summary>The targets of <paramref name="result"/>'s unit that it misses, in <see cref="TargetKind"/> order.</summary>
    public static ImmutableArray<TargetKind> Breached(UnitResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        if (result.Unit.Targets is not UnitTargets targets || targets.IsEmpty)
        {
            return [];
        }

        var breached = ImmutableArray.CreateBuilder<TargetKind>();
        if (targets.MaxMeanWaitHours is double wait && !Meets(result.MeanWaitHours, wait))
        {
            breached.Add(TargetKind.MeanWait);
        }

        if (targets.MaxMeanTimeInUnitHours is double time && !Meets(result.MeanTimeInUnitHours, time))
        {
            breached.Add(TargetKind.MeanTimeInUnit);
        }

        if (targets.WaitOver is WaitOverTarget over && !Meets(ShareWaitingLonger(result, over.WaitHours), over.AtMost))
        {
            breached.Add(TargetKind.WaitOver);
        }

        if (targets.MaxTurnedAway is double full && !Meets(result.PFull, full))
        {
            breached.Add(TargetKind.TurnedAway);
        }

        return breached.ToImmutable();
    }

    /// <summary>True when <paramref name="value"/> exists and is at most <paramref name="target"/> within <see cref="Tolerance"/>.</summary>
    public static bool Meets(double? value, double target) => value is double v && v <= target + (Tolerance * Math.Abs(target));

    /// <summary>
    /// P(wait &gt; <paramref name="waitHours"/>) at the unit by its own method: <see cref="GgcFormulas.WaitLongerThan"/> with the
    /// result's SCVs (the exact M/M/c tail when both are 1); for a unit with a capacity, C · exp(−t·C/Wq) over admitted
    /// patients. 0 where nobody waits; null for an unstable unit.
    /// </summary>
    public static double? ShareWaitingLonger(UnitResult result, double waitHours)
    {
        ArgumentNullException.ThrowIfNull(result);
        if (!result.IsStable)
        {
            return null;
        }

        var unit = result.Unit;
        if (unit.Capacity is not null)
        {
            double meanWait = result.MeanWaitHours ?? 0.0;
            return meanWait > 0.0 && result.WaitProbability > 0.0 ? result.WaitProbability * Math.Exp(-waitHours * result.WaitProbability / meanWait) : 0.0;
        }

        if (unit.Servers.IsUnlimited || !(result.ArrivalsPerHour > 0.0))
        {
            return 0.0;
        }

        // The mean service the solver used: the unit's own, or the patient groups' mixture (then a = λ·E[S] differs).
        double meanServiceHours = result.ArrivalsPerHour * unit.MeanServiceHours == result.OfferedLoad
            ? unit.MeanServiceHours
            : result.OfferedLoad / result.ArrivalsPerHour;
        return GgcFormulas.WaitLongerThan(unit.Servers.Count, result.ArrivalsPerHour, meanServiceHours, result.ArrivalScv, result.ServiceScv, waitHours);
    }
}
