using System.Collections.Immutable;

namespace NetSolve.Simulation;

/// <summary>
/// One time metric (a unit's time in unit, a group's or every patient's time in network) pooled over the replications
/// as each finishes: the pooled histogram gives the percentiles, and the replications' shares below them give the
/// intervals (<see cref="QuantileInterval"/>). The replications' own histograms are kept only while the run's budget
/// for them lasts (<see cref="ReplicationPool"/>); after that the intervals come from <see cref="ShareMoments"/>, which
/// give the same intervals to rounding from memory that does not grow with the replications.
/// </summary>
internal sealed class PercentilePool
{
    private readonly DurationHistogram _pooled = new();
    private readonly ShareMoments _shares = new();
    private List<DurationHistogram>? _kept = [];

    /// <summary>Whether each replication's histogram is still kept (the intervals then read them directly).</summary>
    public bool KeepsReplications => _kept is not null;

    /// <summary>Adds one finished replication's histogram of this metric.</summary>
    public void Add(DurationHistogram replication)
    {
        _pooled.Add(replication);
        _shares.Add(replication);
        _kept?.Add(replication);
    }

    /// <summary>Lets the replications' histograms go: from now on the intervals come from the share moments.</summary>
    public void StopKeeping() => _kept = null;

    /// <summary>The percentiles of <see cref="MetricLayout.Percentiles"/>, each with its interval.</summary>
    public ImmutableArray<PercentileEstimate> Percentiles()
    {
        var builder = ImmutableArray.CreateBuilder<PercentileEstimate>(MetricLayout.Percentiles.Length);
        foreach (double fraction in MetricLayout.Percentiles)
        {
            var estimate = _kept is null ? QuantileInterval.Of(fraction, _pooled, _shares) : QuantileInterval.Of(fraction, _pooled, _kept);
            builder.Add(new PercentileEstimate(fraction * 100.0, estimate));
        }

        return builder.MoveToImmutable();
    }
}
