using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Simulation;

namespace NetSolve.Tests.Analysis;

public sealed class ComparedMetricTests
{
    [Fact]
    public void Relative_error_is_the_formula_minus_the_simulated_mean_over_the_simulated_mean()
    {
        // Exact by hand: issue 11's Harbourside imaging numbers, (0.217 − 0.160) / 0.160 = 0.35625 (36% high).
        var metric = new ComparedMetric("mean_wait", 0.217, new Estimate(0.160, 0.005, 10), MetricDimension.Time);

        Assert.Equal(0.35625, metric.RelativeError!.Value, 1e-12);
    }

    [Fact]
    public void Relative_error_is_absent_without_a_formula_value_or_with_a_simulated_mean_of_zero()
    {
        // Exact by hand: there is nothing to divide by, or nothing to compare.
        Assert.Null(new ComparedMetric("mean_wait", null, new Estimate(0.2, 0.01, 10), MetricDimension.Time).RelativeError);
        Assert.Null(new ComparedMetric("mean_wait", 0.0, new Estimate(0.0, 0.0, 10), MetricDimension.Time).RelativeError);
    }
}
