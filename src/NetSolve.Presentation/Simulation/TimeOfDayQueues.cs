using NetSolve.Model;
using NetSolve.Simulation;

namespace NetSolve.Presentation.Simulation;

/// <summary>
/// Which units the time-of-day views show: the mean queue by hour of day, for the units whose queue peaks highest.
/// Shared by the <c>simulate</c> table and the report so both pick the same units in the same order.
/// </summary>
public static class TimeOfDayQueues
{
    /// <summary>Hours in a day: the length of <see cref="SimulatedUnit.MeanQueueByHour"/>.</summary>
    public const int HoursOfDay = 24;

    /// <summary>At most this many units are shown: as many as the chart has distinct line styles.</summary>
    public const int MaxUnitsShown = 8;

    /// <summary>
    /// True when external arrivals vary by hour or weekday (a top-level or group <c>arrival_profile</c>). Without one,
    /// every hour has the same expected queue and the hourly numbers differ only by chance.
    /// </summary>
    public static bool HasArrivalProfile(Network network)
    {
        ArgumentNullException.ThrowIfNull(network);
        return network.ArrivalProfile is not null || network.Groups.Any(group => group.ArrivalProfile is not null);
    }

    /// <summary>The highest hourly mean queue of <paramref name="unit"/>; 0 when no hour was measured.</summary>
    public static double Peak(SimulatedUnit unit)
    {
        ArgumentNullException.ThrowIfNull(unit);
        return unit.MeanQueueByHour.Max(hour => hour?.Mean ?? 0.0);
    }

    /// <summary>The hour of day (0 for 00:00–01:00) with the highest mean queue, the earliest on a tie; null when none was measured.</summary>
    public static int? PeakHour(SimulatedUnit unit)
    {
        ArgumentNullException.ThrowIfNull(unit);
        int? best = null;
        for (int hour = 0; hour < unit.MeanQueueByHour.Count; hour++)
        {
            if (unit.MeanQueueByHour[hour] is Estimate estimate && (best is null || estimate.Mean > unit.MeanQueueByHour[best.Value]!.Value.Mean))
            {
                best = hour;
            }
        }

        return best;
    }

    /// <summary>
    /// The units with a queue in some hour, highest peak first (file order on a tie), at most <paramref name="maxUnits"/>.
    /// Units nobody ever waited at are left out: a row of zeros says nothing a planner needs.
    /// </summary>
    public static IReadOnlyList<SimulatedUnit> Shown(SimulationResult result, int maxUnits = MaxUnitsShown)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentOutOfRangeException.ThrowIfLessThan(maxUnits, 1);
        return result.Units
            .Where(unit => Peak(unit) > 0.0)
            .OrderByDescending(Peak)
            .Take(maxUnits)
            .ToList();
    }
}
