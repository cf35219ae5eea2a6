using System.Collections;

namespace NetSolve.Simulation;

/// <summary>
/// A unit's mean queue in each hour of the day, 00-01 first, each estimated from the replications' rows when read
/// rather than held: 24 estimates of 40 bytes for every unit were about 100 MB of a 100,000-unit result, whose
/// output reads each of them once or twice. The rows are the finished run's and do not change.
/// </summary>
internal sealed class HourlyQueueEstimates(IReadOnlyList<double[]> rows, int firstSlot) : IReadOnlyList<Estimate?>
{
    /// <summary>Hours in a day.</summary>
    public int Count => 24;

    /// <summary>The estimate for <paramref name="hour"/>; null when no replication covered that hour.</summary>
    public Estimate? this[int hour]
    {
        get
        {
            ArgumentOutOfRangeException.ThrowIfNegative(hour);
            ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(hour, Count);
            return Estimate.FromSlot(rows, firstSlot + hour);
        }
    }

    public IEnumerator<Estimate?> GetEnumerator()
    {
        for (int hour = 0; hour < Count; hour++)
        {
            yield return this[hour];
        }
    }

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();
}
