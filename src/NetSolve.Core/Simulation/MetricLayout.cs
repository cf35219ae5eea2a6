namespace NetSolve.Simulation;

/// <summary>
/// Where each metric of one replication sits in its flat row of doubles: a block per unit, then the totals, then a
/// block per named patient group. Replications fill rows; the aggregation reads them slot by slot.
/// </summary>
internal sealed class MetricLayout
{
    public const int ArrivalsPerHour = 0;
    public const int Utilisation = 1;
    public const int WaitProbability = 2;
    public const int MeanQueue = 3;
    public const int MeanWaitHours = 4;
    public const int MeanInUnit = 5;
    public const int MeanTimeInUnitHours = 6;
    public const int FullProbability = 7;
    public const int TurnedAwayPerHour = 8;
    public const int DivertedPerHour = 9;
    public const int UnitPercentiles = 10;

    public const int TotalEnteredPerHour = 0;
    public const int TotalThroughputPerHour = 1;
    public const int TotalMeanInSystem = 2;
    public const int TotalMeanTimeInSystemHours = 3;
    public const int TotalTurnedAwayPerHour = 4;
    public const int TotalPercentiles = 5;

    public const int GroupThroughputPerHour = 0;
    public const int GroupMeanTimeInSystemHours = 1;
    public const int GroupPercentiles = 2;

    /// <summary>The percentiles reported for times in unit and in network, as fractions.</summary>
    public static readonly double[] Percentiles = [0.50, 0.90, 0.95, 0.99];

    public MetricLayout(int units, int waitThresholds, int namedGroups)
    {
        Units = units;
        WaitThresholds = waitThresholds;
        NamedGroups = namedGroups;
        WaitOverOffset = UnitPercentiles + Percentiles.Length;
        QueueByHourOffset = WaitOverOffset + waitThresholds;
        UnitStride = QueueByHourOffset + 24;
        TotalsOffset = units * UnitStride;
        GroupsOffset = TotalsOffset + TotalPercentiles + Percentiles.Length;
        GroupStride = GroupPercentiles + Percentiles.Length;
        Length = GroupsOffset + (namedGroups * GroupStride);
    }

    public int Units { get; }

    public int WaitThresholds { get; }

    public int NamedGroups { get; }

    /// <summary>Within a unit block: the first P(wait &gt; t) slot.</summary>
    public int WaitOverOffset { get; }

    /// <summary>Within a unit block: the mean queue in hour 00-01, followed by the other 23 hours.</summary>
    public int QueueByHourOffset { get; }

    public int UnitStride { get; }

    public int TotalsOffset { get; }

    public int GroupsOffset { get; }

    public int GroupStride { get; }

    /// <summary>Doubles in one row.</summary>
    public int Length { get; }

    public int Unit(int unit, int metric) => (unit * UnitStride) + metric;

    public int Total(int metric) => TotalsOffset + metric;

    public int Group(int namedGroup, int metric) => GroupsOffset + (namedGroup * GroupStride) + metric;
}
