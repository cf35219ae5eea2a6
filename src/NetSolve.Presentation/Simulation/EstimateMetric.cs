using NetSolve.Model;
using NetSolve.Presentation.Metrics;
using NetSolve.Simulation;

namespace NetSolve.Presentation.Simulation;

/// <summary>
/// A simulated metric: a mean over replications with the half-width of its 95% interval. Programs read it as two
/// columns, <c>x</c> and <c>x_ci</c>; people read one, <c>x ± half-width</c>, both in the same unit.
/// </summary>
/// <typeparam name="TRow">The result row the estimate is read from.</typeparam>
/// <param name="Id">The contract's name of the mean; the half-width's is the same with <c>_ci</c> added.</param>
/// <param name="Header">The header of tables for people.</param>
/// <param name="Dimension">What the values measure.</param>
/// <param name="Read">The estimate of one row; null when there is none (no patient finished).</param>
public sealed record EstimateMetric<TRow>(string Id, string Header, MetricDimension Dimension, Func<TRow, Estimate?> Read)
{
    /// <summary>The mean, for programs.</summary>
    public Column<TRow> Mean => new(Id, Header, Dimension, row => EstimateCell.Mean(Read(row), Dimension), Audience.Machines);

    /// <summary>The half-width, for programs; absent with one replication.</summary>
    public Column<TRow> HalfWidth => new(Id + EstimateCell.HalfWidthSuffix, Header, Dimension, row => EstimateCell.HalfWidth(Read(row), Dimension), Audience.Machines);

    /// <summary>The mean with ± its half-width, for people.</summary>
    public Column<TRow> ForPeople => new(Id, Header, Dimension, row => EstimateCell.Of(Read(row), Dimension), Audience.People);

    /// <summary>The mean and the half-width, in the contract's order.</summary>
    public IEnumerable<Column<TRow>> ForMachines => [Mean, HalfWidth];
}
