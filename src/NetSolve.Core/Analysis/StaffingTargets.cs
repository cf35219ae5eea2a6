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
}
