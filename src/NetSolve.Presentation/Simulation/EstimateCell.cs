using NetSolve.Model;
using NetSolve.Presentation.Metrics;
using NetSolve.Simulation;

namespace NetSolve.Presentation.Simulation;

/// <summary>Cells of simulated estimates, shared by the registries of the simulation's result kinds.</summary>
public static class EstimateCell
{
    /// <summary>Added to a metric's contract name to name the half-width of its 95% interval (<c>mean_wait_ci</c>).</summary>
    public const string HalfWidthSuffix = "_ci";

    /// <summary>The cell people read for <paramref name="estimate"/>: the mean with ± its half-width; absent when there is no estimate.</summary>
    public static Cell Of(Estimate? estimate, MetricDimension dimension) =>
        Cell.WithHalfWidth(estimate?.Mean, estimate?.HalfWidth, dimension);

    /// <summary>The mean of <paramref name="estimate"/> alone, for programs.</summary>
    public static Cell Mean(Estimate? estimate, MetricDimension dimension) => Cell.Of(estimate?.Mean, dimension);

    /// <summary>The half-width of <paramref name="estimate"/> alone, for programs; absent with one replication.</summary>
    public static Cell HalfWidth(Estimate? estimate, MetricDimension dimension) => Cell.Of(estimate?.HalfWidth, dimension);
}
