namespace NetSolve.Presentation.ByHour;

/// <summary>One unit in one hour of the cycle, from the hour-by-hour formulas (docs/time-of-day.md).</summary>
/// <param name="Unit">The unit's hour-by-hour values.</param>
/// <param name="Hour">Hour of the cycle, 0 for 00:00–01:00 (Monday in a week-long cycle).</param>
public sealed record ByHourRow(ByHourUnit Unit, int Hour);
