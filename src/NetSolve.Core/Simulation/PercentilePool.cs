using System.Collections.Immutable;

namespace NetSolve.Simulation;

/// <summary>
/// One time metric (a unit's time in unit, a group's or every patient's time in network) pooled over the replications
/// as each finishes: the pooled histogram gives the percentiles, and the replications' shares below them give the
/// intervals (<see cref="QuantileInterval"/>). The replications' own histograms are kept only while the run's budget
/// for them lasts (<see cref="ReplicationPool"/>); after that the intervals come from <see cref="ShareMoments"/>, which
/// give the same intervals to rounding from memory that does not grow with the replications.
/// </summary>
/// <remarks>
/// A lone first replication is never turned into share moments: its interval has no half-width either way, and its
/// histogram is far smaller than its moments (8 bytes a bucket against five sums), which at 100,000 units was 2 GB
/// of a one-replication run. The moments are made when a second replication comes, from the first and then the
/// second, in replication order: the very sums they would have had if made at once. Likewise the pooled histogram is
/// the first replication's own until a second is added to a copy of it.
/// </remarks>
internal sealed class PercentilePool
{
    private readonly List<DurationHistogram> _unfolded = [];
    private DurationHistogram? _pooled;
    private bool _pooledIsShared;
    private ShareMoments? _shares;
    private bool _keeping = true;

    /// <summary>Whether each replication's histogram is still kept (the intervals then read them directly).</summary>
    public bool KeepsReplications => _keeping;

    /// <summary>Adds one finished replication's histogram of this metric; the pool reads it from now on, and nothing may change it.</summary>
    public void Add(DurationHistogram replication)
    {
        ArgumentNullException.ThrowIfNull(replication);
        if (_pooled is null)
        {
            _pooled = replication;
            _pooledIsShared = true;
        }
        else
        {
            if (_pooledIsShared)
            {
                var copy = new DurationHistogram();
                copy.Add(_pooled);
                _pooled = copy;
                _pooledIsShared = false;
            }

            _pooled.Add(replication);
        }

        _unfolded.Add(replication);
        if (!_keeping)
        {
            Fold();
        }
    }

    /// <summary>Lets the replications' histograms go: from now on the intervals come from the share moments.</summary>
    public void StopKeeping()
    {
        _keeping = false;
        Fold();
    }

    /// <summary>The percentiles of <see cref="MetricLayout.Percentiles"/>, each with its interval.</summary>
    public ImmutableArray<PercentileEstimate> Percentiles()
    {
        var pooled = _pooled ?? new DurationHistogram();
        var fractions = MetricLayout.Percentiles;
        Span<double> points = stackalloc double[fractions.Length];
        pooled.Quantiles(fractions, points);
        var builder = ImmutableArray.CreateBuilder<PercentileEstimate>(fractions.Length);
        for (int i = 0; i < fractions.Length; i++)
        {
            // Without moments the unfolded histograms are every replication: all of them while kept, else at most one.
            var estimate = _shares is null ? QuantileInterval.At(points[i], pooled, _unfolded) : QuantileInterval.At(points[i], pooled, _shares);
            builder.Add(new PercentileEstimate(fractions[i] * 100.0, estimate));
        }

        return builder.MoveToImmutable();
    }

    /// <summary>Adds the replications not yet in the share moments to them, in order, once there are two or more.</summary>
    private void Fold()
    {
        if (_shares is null && _unfolded.Count < 2)
        {
            return;
        }

        _shares ??= new ShareMoments();
        foreach (var replication in _unfolded)
        {
            _shares.Add(replication);
        }

        _unfolded.Clear();
    }
}
