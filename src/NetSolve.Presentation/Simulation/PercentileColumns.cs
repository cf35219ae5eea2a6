using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;
using NetSolve.Simulation;

namespace NetSolve.Presentation.Simulation;

/// <summary>
/// The registry of simulated time percentiles: ids as the keys of the contract's <c>..._percentiles</c> objects
/// (<c>p50</c>, <c>p50_ci</c>, ...), each a time with the half-width of its 95% interval.
/// </summary>
public static class PercentileColumns
{
    /// <summary>What the row is the time of, for people.</summary>
    public static readonly Column<PercentileRow> Name = Columns.Words<PercentileRow>("name", "unit", row => row.Name, Audience.People);

    /// <summary>The <paramref name="index"/>-th percentile, <paramref name="percent"/> per cent.</summary>
    public static EstimateMetric<PercentileRow> Percentile(int index, double percent) =>
        new(SimulatedUnitColumns.PercentileKey(percent), SimulatedUnitColumns.PercentileKey(percent), MetricDimension.Time, row => row.Percentiles[index].Hours);

    /// <summary>The columns of <paramref name="percentiles"/>: the name for people, then per percentile the mean and half-width for programs and both together for people.</summary>
    public static ImmutableArray<Column<PercentileRow>> Of(ImmutableArray<PercentileEstimate> percentiles) =>
    [
        Name,
        .. percentiles.SelectMany((percentile, i) =>
        {
            var metric = Percentile(i, percentile.Percent);
            return new[] { metric.Mean, metric.HalfWidth, metric.ForPeople };
        }),
    ];

    /// <summary>A one-row table of <paramref name="percentiles"/>, for a JSON object.</summary>
    public static ResultTable Table(string name, ImmutableArray<PercentileEstimate> percentiles, TimeUnit timeUnit) =>
        ResultTable.Build(Of(percentiles), [new PercentileRow(name, percentiles)], timeUnit);
}
