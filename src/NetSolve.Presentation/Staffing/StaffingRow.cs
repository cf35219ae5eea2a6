using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Presentation.Staffing;

/// <summary>One unit of a targets search, with what the staffing columns read beside its answer.</summary>
/// <param name="Unit">The unit's answer.</param>
/// <param name="Before">The unit solved as given.</param>
/// <param name="After">The unit solved with the required servers; null when some unit cannot meet the targets.</param>
/// <param name="Targets">The targets searched for: the wait-tail target decides the long-wait share.</param>
/// <param name="TimeUnit">The network's time unit, named in every CSV row.</param>
public sealed record StaffingRow(UnitStaffing Unit, UnitResult Before, UnitResult? After, StaffingTargets Targets, TimeUnit TimeUnit);
