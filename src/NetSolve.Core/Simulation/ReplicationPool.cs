namespace NetSolve.Simulation;

/// <summary>
/// Pools the replications as they finish, so that a run's memory does not grow with its replications beyond a few
/// numbers each: every replication's row of metrics (what the intervals of the means and the precision check read),
/// while its histograms, counts and warm-up series are added into the pooled ones and let go. Thread-safe: workers hand
/// in replications in any order, and they are added in replication order (those that arrive early wait), so the
/// pooled sums, to the last bit, do not depend on the thread count or timing.
/// </summary>
internal sealed class ReplicationPool
{
    /// <summary>
    /// The replications' own histograms are kept, for intervals read straight from them, up to this many bytes in all
    /// (64 MB: the default 10 replications of a large network, a precision run of 200 of a small one); above it they
    /// are let go and the intervals come from the share moments, equal to rounding (<see cref="ShareMoments"/>).
    /// </summary>
    public const long DefaultKeptBytes = 64L * 1024 * 1024;

    private readonly Lock _gate = new();
    private readonly SortedDictionary<int, ReplicationOutput> _early = [];
    private readonly long _keptBytesLimit;
    private readonly List<double[]> _rows = [];
    private readonly long[] _starts;
    private readonly long[] _waitOver;
    private readonly double[] _seriesSum = new double[SimulationEngine.SeriesPoints];
    private long _keptBytes;
    private int _next;

    /// <param name="units">Units of the network.</param>
    /// <param name="namedGroups">Named patient groups of the network.</param>
    /// <param name="thresholds">Wait thresholds of P(wait &gt; t).</param>
    /// <param name="keptBytesLimit">Most bytes of replication histograms kept (<see cref="DefaultKeptBytes"/>); tests make it small.</param>
    public ReplicationPool(int units, int namedGroups, int thresholds, long keptBytesLimit = DefaultKeptBytes)
    {
        _keptBytesLimit = keptBytesLimit;
        _starts = new long[units];
        _waitOver = new long[units * thresholds];
        UnitTimes = NewPools(units);
        GroupTimes = NewPools(namedGroups + 1);
    }

    /// <summary>The rows of the replications added so far, in replication order.</summary>
    public IReadOnlyList<double[]> Rows => _rows;

    /// <summary>Per unit, the time in unit over every replication added.</summary>
    public IReadOnlyList<PercentilePool> UnitTimes { get; }

    /// <summary>Per group (0 the patients of no named group), the time in network.</summary>
    public IReadOnlyList<PercentilePool> GroupTimes { get; }

    /// <summary>Every patient's time in network.</summary>
    public PercentilePool AllTimes { get; } = new();

    /// <summary>Per unit, the patients who started service, in every replication added.</summary>
    public IReadOnlyList<long> Starts => _starts;

    /// <summary>Per unit and threshold (unit × thresholds + t), the starts that waited longer than t.</summary>
    public IReadOnlyList<long> WaitOver => _waitOver;

    /// <summary>Events simulated by the replications added.</summary>
    public long Events { get; private set; }

    /// <summary>The number in the network at each sampling moment, summed over the replications added.</summary>
    public IReadOnlyList<double> InNetworkSeriesSum => _seriesSum;

    /// <summary>Whether the replications' own histograms are still kept.</summary>
    public bool KeepsReplications => AllTimes.KeepsReplications;

    /// <summary>Hands in finished replication <paramref name="replication"/>; it is added once every replication before it has been.</summary>
    public void Finish(int replication, ReplicationOutput output)
    {
        ArgumentNullException.ThrowIfNull(output);
        lock (_gate)
        {
            _early.Add(replication, output);
            while (_early.Remove(_next, out var ready))
            {
                Add(ready);
                _next++;
            }
        }
    }

    /// <summary>
    /// Adds every replication handed in below <paramref name="end"/>, in order, skipping those that never finished (a
    /// cancelled run); the next batch starts at <paramref name="end"/>. Call when no replication is running.
    /// </summary>
    public void Flush(int end)
    {
        lock (_gate)
        {
            foreach (int replication in _early.Keys.Where(key => key < end).ToList())
            {
                _early.Remove(replication, out var ready);
                Add(ready!);
            }

            _next = Math.Max(_next, end);
        }
    }

    private void Add(ReplicationOutput output)
    {
        _rows.Add(output.Row);
        Events += output.Events;
        var tallies = output.Tallies;
        for (int u = 0; u < _starts.Length; u++)
        {
            _starts[u] += tallies.Starts[u];
            UnitTimes[u].Add(tallies.UnitTimes[u]);
        }

        for (int i = 0; i < _waitOver.Length; i++)
        {
            _waitOver[i] += tallies.WaitOver[i];
        }

        for (int g = 0; g < GroupTimes.Count; g++)
        {
            GroupTimes[g].Add(tallies.GroupTimes[g]);
        }

        var all = ReplicationTallies.Pool(tallies.GroupTimes);
        AllTimes.Add(all);
        for (int i = 0; i < _seriesSum.Length && i < output.InNetworkSeries.Count; i++)
        {
            _seriesSum[i] += output.InNetworkSeries[i];
        }

        if (KeepsReplications)
        {
            _keptBytes += all.Bytes + tallies.UnitTimes.Sum(histogram => histogram.Bytes) + tallies.GroupTimes.Sum(histogram => histogram.Bytes);
            if (_keptBytes > _keptBytesLimit)
            {
                foreach (var pool in UnitTimes.Concat(GroupTimes).Append(AllTimes))
                {
                    pool.StopKeeping();
                }
            }
        }
    }

    private static PercentilePool[] NewPools(int count)
    {
        var pools = new PercentilePool[count];
        for (int i = 0; i < count; i++)
        {
            pools[i] = new PercentilePool();
        }

        return pools;
    }
}
