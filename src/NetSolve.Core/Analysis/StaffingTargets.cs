using NetSolve.Model;

namespace NetSolve.Analysis;

/// <summary>What every unit must meet; a null target is not checked. Every unit must also be stable (utilisation below 1).</summary>
/// <param name="MaxUtilisation">Largest utilisation allowed, in (0, 1].</param>
/// <param name="MaxMeanWaitHours">Largest mean wait before service (Wq), in hours, not negative.</param>
/// <param name="MaxMeanTimeInUnitHours">Largest mean time in the unit including service (W), in hours, not negative.</param>
/// <param name="WaitTail">Largest share of patients waiting longer than a time.</param>
/// <param name="MaxTurnedAway">
/// Largest P(full), in [0, 1]: the share of arriving patients who find a unit with a capacity full (turned away or
/// diverted). Units without a capacity are not affected by it.
/// </param>
public sealed record StaffingTargets(
    double? MaxUtilisation = null,
    double? MaxMeanWaitHours = null,
    double? MaxMeanTimeInUnitHours = null,
    WaitTailTarget? WaitTail = null,
    double? MaxTurnedAway = null)
{
    /// <summary>True when no target is set (then only stability is required).</summary>
    public bool IsEmpty => MaxUtilisation is null && MaxMeanWaitHours is null && MaxMeanTimeInUnitHours is null && WaitTail is null && MaxTurnedAway is null;

    /// <summary>
    /// What <paramref name="unit"/> must meet: these targets (for every unit) and the unit's own
    /// (<see cref="Unit.Targets"/>, from the file or <c>--target</c>) together, so where both set one the stricter holds.
    /// Two wait-over targets with different times cannot merge into one; the unit's own is kept then.
    /// </summary>
    public StaffingTargets For(Unit unit)
    {
        ArgumentNullException.ThrowIfNull(unit);
        if (unit.Targets is not UnitTargets own || own.IsEmpty)
        {
            return this;
        }

        var ownTail = own.WaitOver is WaitOverTarget over ? new WaitTailTarget(over.WaitHours, over.AtMost) : null;
        var tail = (WaitTail, ownTail) switch
        {
            (null, var t) => t,
            (var t, null) => t,
            ({ } a, { } b) when a.WaitHours == b.WaitHours => a with { MaxProbability = Math.Min(a.MaxProbability, b.MaxProbability) },
            (_, var t) => t,
        };
        return new StaffingTargets(MaxUtilisation, Stricter(MaxMeanWaitHours, own.MaxMeanWaitHours), Stricter(MaxMeanTimeInUnitHours, own.MaxMeanTimeInUnitHours),
            tail, Stricter(MaxTurnedAway, own.MaxTurnedAway));
    }

    private static double? Stricter(double? a, double? b) => a is double x && b is double y ? Math.Min(x, y) : a ?? b;
}
