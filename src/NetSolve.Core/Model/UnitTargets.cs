namespace NetSolve.Model;

/// <summary>
/// What a unit is expected to meet (the file's <c>targets</c> section or <c>--target</c>); a null target is not checked.
/// A solved unit that misses one is marked with the target named beside its status.
/// </summary>
/// <param name="MaxMeanWaitHours">Largest mean wait before service (Wq), in hours; positive.</param>
/// <param name="MaxMeanTimeInUnitHours">Largest mean time in the unit, wait plus service (W), in hours; positive.</param>
/// <param name="WaitOver">Largest share of patients who wait longer than a time.</param>
/// <param name="MaxTurnedAway">
/// Largest share of arriving patients who find the unit full (P(full), turned away or diverted), in [0, 1]. A unit
/// without a capacity is never full, so it always meets this target.
/// </param>
public sealed record UnitTargets(
    double? MaxMeanWaitHours = null,
    double? MaxMeanTimeInUnitHours = null,
    WaitOverTarget? WaitOver = null,
    double? MaxTurnedAway = null)
{
    /// <summary>True when no target is set.</summary>
    public bool IsEmpty => MaxMeanWaitHours is null && MaxMeanTimeInUnitHours is null && WaitOver is null && MaxTurnedAway is null;

    /// <summary>
    /// These targets with every one left unset taken from <paramref name="fallback"/>: a unit's own target wins over
    /// the one set for all units, target by target.
    /// </summary>
    public UnitTargets Over(UnitTargets? fallback) => fallback is null
        ? this
        : new UnitTargets(
            MaxMeanWaitHours ?? fallback.MaxMeanWaitHours,
            MaxMeanTimeInUnitHours ?? fallback.MaxMeanTimeInUnitHours,
            WaitOver ?? fallback.WaitOver,
            MaxTurnedAway ?? fallback.MaxTurnedAway);
}
