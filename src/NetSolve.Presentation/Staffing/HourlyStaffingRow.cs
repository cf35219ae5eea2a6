using NetSolve.Analysis;

namespace NetSolve.Presentation.Staffing;

/// <summary>One hour of one unit's roster: a row of the by-hour staffing table.</summary>
/// <param name="Unit">The unit's roster.</param>
/// <param name="Hour">The hour of the cycle, 0-based (from Monday 00:00 for a week).</param>
public sealed record HourlyStaffingRow(UnitHourlyStaffing Unit, int Hour);
