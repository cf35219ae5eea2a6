namespace NetSolve.Solving;

/// <summary>
/// Patients that units with a capacity send away, hour by hour, for the offered load of the units below them: only
/// the admitted share of a full unit's arrivals moves on along its routes, and diverted patients arrive at the unit
/// they are diverted to. Without it the infinite-server load downstream of a unit that is often full counts patients
/// who never get there.
/// </summary>
/// <param name="AdmittedShareByHour">Per unit, the share of its arrivals admitted in each hour of the cycle; null for all.</param>
/// <param name="DivertedInByHour">Per unit, patients per hour diverted to it from full units in each hour; null for none.</param>
internal sealed record TurnedAwayFlows(double[]?[] AdmittedShareByHour, double[]?[] DivertedInByHour);
