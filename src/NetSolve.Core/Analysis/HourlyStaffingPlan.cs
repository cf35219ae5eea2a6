using System.Collections.Immutable;

namespace NetSolve.Analysis;

/// <summary>Rosters for every unit with finite servers, from <see cref="HourlyStaffingSearch"/>. Immutable.</summary>
/// <param name="Targets">The targets each hour must meet.</param>
/// <param name="Options">How the rosters were shaped and checked.</param>
/// <param name="CycleHours">24, or 168 when arrivals vary by day of week.</param>
/// <param name="Units">One roster per unit with finite servers, in network order.</param>
public sealed record HourlyStaffingPlan(StaffingTargets Targets, HourlyStaffingOptions Options, int CycleHours, ImmutableArray<UnitHourlyStaffing> Units);
