using MathNet.Numerics.LinearAlgebra;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Variability;

/// <summary>The two-moment phase-type fits in matrix form (H. C. Tijms, A First Course in Stochastic Models, Wiley, 2003, section 5.9).</summary>
public sealed class PhaseTypeDistributionTests
{
    // A phase-type distribution (α, T) has mean α(−T)⁻¹1 and second moment 2α T⁻² 1 (M. F. Neuts, Matrix-Geometric
    // Solutions in Stochastic Models, 1981, from memory): each fit must give back the mean and SCV it was made for,
    // with the number of phases the fit prescribes (k with 1/k ≤ c² ≤ 1/(k − 1) below 1, two above).
    [Theory]
    [InlineData(2.0, 0.2, 5)]
    [InlineData(2.0, 0.3, 4)]
    [InlineData(0.5, 0.5, 2)]
    [InlineData(0.5, 0.7, 2)]
    [InlineData(3.0, 1.0, 1)]
    [InlineData(3.0, 2.5, 2)]
    [InlineData(1.0, 16.0, 2)]
    public void A_fit_has_the_mean_and_scv_it_was_made_for(double meanHours, double scv, int phases)
    {
        var fit = PhaseTypeDistribution.FitTwoMoments(meanHours, scv);

        var initial = Vector<double>.Build.DenseOfEnumerable(fit.Initial);
        var inverse = (-Matrix<double>.Build.DenseOfArray(fit.Generator)).Inverse();
        var ones = Vector<double>.Build.Dense(fit.Phases, 1.0);
        double mean = initial * inverse * ones;
        double second = 2.0 * (initial * inverse * inverse * ones);

        Assert.Equal(phases, fit.Phases);
        Assert.Equal(meanHours, mean, 1e-12);
        Assert.Equal(scv, (second - (mean * mean)) / (mean * mean), 1e-10);
    }

    // Below the smoothest fit an SCV is taken as 1/5: deterministic service becomes an Erlang of 5 phases.
    [Fact]
    public void A_scv_below_the_smoothest_fit_is_raised_to_it()
    {
        Assert.Equal(PhaseTypeDistribution.MaxPhases, PhaseTypeDistribution.FitTwoMoments(1.0, 0.0).Phases);
    }
}
