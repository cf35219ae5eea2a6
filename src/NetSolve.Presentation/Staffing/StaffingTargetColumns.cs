using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Staffing;

/// <summary>The registry of the targets of a staffing search: ids as in the contract's <c>targets</c> object; absent when not set.</summary>
public static class StaffingTargetColumns
{
    /// <summary>Largest utilisation allowed.</summary>
    public static readonly Column<StaffingTargets> MaxUtilisation = Columns.Number<StaffingTargets>("max_utilisation", "utilisation", MetricDimension.Fraction, targets => targets.MaxUtilisation);

    /// <summary>Largest mean wait before service.</summary>
    public static readonly Column<StaffingTargets> MaxMeanWait = Columns.Number<StaffingTargets>("max_mean_wait", "mean wait", MetricDimension.Time, targets => targets.MaxMeanWaitHours);

    /// <summary>Largest mean time in the unit, wait plus service.</summary>
    public static readonly Column<StaffingTargets> MaxMeanTimeInUnit = Columns.Number<StaffingTargets>("max_mean_time_in_unit", "mean time in unit", MetricDimension.Time, targets => targets.MaxMeanTimeInUnitHours);

    /// <summary>The wait whose chance of being exceeded is limited.</summary>
    public static readonly Column<StaffingTargets> WaitOver = Columns.Number<StaffingTargets>("wait_over", "wait over", MetricDimension.Time, targets => targets.WaitTail?.WaitHours);

    /// <summary>The largest share of patients waiting longer than <see cref="WaitOver"/>: a share, read as a percentage.</summary>
    public static readonly Column<StaffingTargets> WaitOverAtMost = Columns.Number<StaffingTargets>("wait_over_at_most", "at most", MetricDimension.Fraction, targets => targets.WaitTail?.MaxProbability);

    /// <summary>The largest share of arriving patients who find a unit with a capacity full: a share, read as a percentage.</summary>
    public static readonly Column<StaffingTargets> MaxTurnedAway = Columns.Number<StaffingTargets>("max_turned_away", "turned away", MetricDimension.Fraction, targets => targets.MaxTurnedAway);

    /// <summary>Every target, in the contract's order.</summary>
    public static readonly ImmutableArray<Column<StaffingTargets>> All = [MaxUtilisation, MaxMeanWait, MaxMeanTimeInUnit, WaitOver, WaitOverAtMost, MaxTurnedAway];

    /// <summary>The one-row table of <paramref name="targets"/>.</summary>
    public static ResultTable Table(StaffingTargets targets, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(targets);
        return ResultTable.Build(All, [targets], timeUnit);
    }
}
