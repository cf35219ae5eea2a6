using System.Collections.Immutable;

namespace NetSolve.Solving;

/// <summary>
/// A unit's queue and waits in each hour of the cycle (hour 00–01, Monday for a week, first). Immutable. Every array
/// is empty when the unit has no periodic steady state (<see cref="TimeVaryingMethodNames.Unstable"/>).
/// </summary>
/// <param name="Method">How the values were found: one of <see cref="TimeVaryingMethodNames"/>.</param>
/// <param name="MeanQueueByHour">Mean patients waiting, averaged over the hour.</param>
/// <param name="MeanInUnitByHour">Mean patients waiting or in service, averaged over the hour.</param>
/// <param name="WaitProbabilityByHour">Chance that a patient arriving in the hour finds every server busy (0 to 1).</param>
/// <param name="MeanWaitHoursByHour">
/// Mean wait in hours of patients arriving in the hour, by Little's law over the hour (mean queue ÷ arrival rate);
/// 0 in an hour without arrivals.
/// </param>
public sealed record HourlyWaits(
    string Method,
    ImmutableArray<double> MeanQueueByHour,
    ImmutableArray<double> MeanInUnitByHour,
    ImmutableArray<double> WaitProbabilityByHour,
    ImmutableArray<double> MeanWaitHoursByHour)
{
    /// <summary>No periodic steady state: the arrays are empty.</summary>
    public static HourlyWaits Unstable { get; } = new(TimeVaryingMethodNames.Unstable, [], [], [], []);

    /// <summary>
    /// Chance that a patient arriving in the hour finds the unit full and is turned away or diverted (0 to 1); empty
    /// for a unit without a capacity. Fed back into the load of the units downstream (<see cref="TimeVaryingSolver"/>).
    /// </summary>
    public ImmutableArray<double> TurnedAwayShareByHour { get; init; } = [];

    /// <summary>True when the values exist (the unit keeps up over the cycle).</summary>
    public bool IsStable => !MeanQueueByHour.IsEmpty;
}
