using System.Collections.Immutable;

namespace NetSolve.Solving;

/// <summary>The hour-by-hour solution of a network: the offered loads and each unit's hourly waits. Immutable.</summary>
/// <param name="Traffic">Arrival rates and offered loads by hour.</param>
/// <param name="Units">Hourly waits per unit, in network order; <see cref="HourlyWaits.Method"/> says how each was found.</param>
public sealed record TimeVaryingSolution(TimeVaryingTrafficSolution Traffic, ImmutableArray<HourlyWaits> Units);
