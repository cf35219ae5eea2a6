using System.Collections.Immutable;

namespace NetSolve.Solving;

/// <summary>The offered load of every unit through a daily or weekly cycle. Immutable.</summary>
/// <param name="CycleHours">24, or 168 when some arrival profile varies by day of week.</param>
/// <param name="StepsPerHour">Time steps per hour of the grid the equations were solved on.</param>
/// <param name="Units">One entry per unit, in network order.</param>
public sealed record TimeVaryingTrafficSolution(int CycleHours, int StepsPerHour, ImmutableArray<UnitLoadOverCycle> Units);
