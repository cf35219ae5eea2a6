using NetSolve.Fitting.Estimation;

namespace NetSolve.Tests.Fitting.Estimation;

public sealed class WaitComparisonTests
{
    [Fact]
    public void The_predicted_wait_is_set_beside_the_observed_mean_and_its_interval()
    {
        var unit = new UnitObservations("xray", [1.0, 1.0, 1.0, 1.0], [false, false, false, false], [], [0.0, 0.5, 1.0, 0.5], [], []);
        var evidence = FitEvidence.Summarise([unit], ExtractWindow.Of(24.0));

        var inside = WaitComparison.Compare(evidence, new Dictionary<string, double?>(StringComparer.Ordinal) { ["xray"] = 0.6 }).Single();
        var outside = WaitComparison.Compare(evidence, new Dictionary<string, double?>(StringComparer.Ordinal) { ["xray"] = 2.0 }).Single();
        var unsolved = WaitComparison.Compare(evidence, new Dictionary<string, double?>(StringComparer.Ordinal)).Single();

        // Exact by hand: mean 0.5 h, sample sd √(1/6), half-width 1.96·√(1/6)/2 = 0.40 h.
        Assert.Equal(0.5, inside.Observed!.Mean.Value);
        Assert.Equal(0.5 + (EvidenceThresholds.NormalQuantile * Math.Sqrt(1.0 / 6.0) / 2.0), inside.Observed.Mean.Interval.Upper, 1e-12);
        Assert.Equal(3, inside.Observed.Waited);
        Assert.True(inside.PredictedInside);
        Assert.False(outside.PredictedInside);
        Assert.Null(unsolved.PredictedInside);
    }
}
