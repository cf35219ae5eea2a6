using System.Collections.Immutable;
using NetSolve.Solving;

namespace NetSolve.Presentation.ByHour;

/// <summary>
/// One unit's hour-by-hour values, gathered from the offered load, the unit's servers and its hourly waits, with the
/// hours a planner looks at first: the peak of arrivals and the hour of the longest wait.
/// </summary>
public sealed class ByHourUnit
{
    private ByHourUnit(string unitId, UnitLoadOverCycle load, int[]? servers, HourlyWaits waits)
    {
        UnitId = unitId;
        ArrivalsPerHourByHour = load.ArrivalsPerHourByHour;
        ServersByHour = servers;
        Waits = waits;
        CycleHours = load.ArrivalsPerHourByHour.Length;
    }

    /// <summary>The unit's id.</summary>
    public string UnitId { get; }

    /// <summary>24, or 168 with a day-of-week profile.</summary>
    public int CycleHours { get; }

    /// <summary>Mean arrivals per hour in each hour of the cycle.</summary>
    public ImmutableArray<double> ArrivalsPerHourByHour { get; }

    /// <summary>Servers in each hour; null for unlimited servers.</summary>
    public IReadOnlyList<int>? ServersByHour { get; }

    /// <summary>The hourly queue and waits and the method behind them.</summary>
    public HourlyWaits Waits { get; }

    /// <summary>Every unit of <paramref name="solution"/> in file order; empty without an hour-by-hour solution.</summary>
    public static IReadOnlyList<ByHourUnit> All(NetworkSolution solution)
    {
        ArgumentNullException.ThrowIfNull(solution);
        if (solution.ByHour is not TimeVaryingSolution byHour)
        {
            return [];
        }

        int cycleHours = byHour.Traffic.CycleHours;
        return [.. solution.Network.Units.Select((unit, j) =>
            new ByHourUnit(unit.Id, byHour.Traffic.Units[j], HourByHour.ServersByHour(unit, cycleHours), byHour.Units[j]))];
    }

    /// <summary>Servers in <paramref name="hour"/>; null for unlimited servers.</summary>
    public int? Servers(int hour) => ServersByHour?[hour];

    /// <summary>Busy servers ÷ servers in the hour; null for unlimited servers, an hour without servers or an unstable unit.</summary>
    public double? Utilisation(int hour) =>
        Waits.IsStable && Servers(hour) is int servers && servers > 0
            ? (Waits.MeanInUnitByHour[hour] - Waits.MeanQueueByHour[hour]) / servers
            : null;

    /// <summary>Mean patients waiting in the hour; null when unstable.</summary>
    public double? MeanQueue(int hour) => Waits.IsStable ? Waits.MeanQueueByHour[hour] : null;

    /// <summary>Mean wait of patients arriving in the hour, in hours; null when unstable.</summary>
    public double? MeanWaitHours(int hour) => Waits.IsStable ? Waits.MeanWaitHoursByHour[hour] : null;

    /// <summary>The hour with the most arrivals, the earliest on a tie.</summary>
    public int PeakHour => ArgMax(hour => ArrivalsPerHourByHour[hour]);

    /// <summary>The hour with the longest mean wait, the earliest on a tie; null when unstable.</summary>
    public int? WorstHour => Waits.IsStable ? ArgMax(hour => Waits.MeanWaitHoursByHour[hour]) : null;

    /// <summary>The highest utilisation in any hour; null when it has none.</summary>
    public double? WorstUtilisation => Enumerable.Range(0, CycleHours).Select(Utilisation).Max();

    /// <summary>True when the arrivals or servers change through the cycle, so the unit has something to show by hour.</summary>
    public bool Varies =>
        ArrivalsPerHourByHour.Max() - ArrivalsPerHourByHour.Min() > 1e-9 * Math.Max(1.0, ArrivalsPerHourByHour.Max())
        || (ServersByHour is { } servers && servers.Distinct().Skip(1).Any());

    private int ArgMax(Func<int, double> value)
    {
        int best = 0;
        for (int hour = 1; hour < CycleHours; hour++)
        {
            if (value(hour) > value(best))
            {
                best = hour;
            }
        }

        return best;
    }
}
