using MathNet.Numerics;
using MathNet.Numerics.LinearAlgebra;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Variability;

/// <summary>
/// The index of dispersion for counts of a Markovian arrival process against flows whose counts have closed forms.
/// </summary>
public sealed class ArrivalCountsTests
{
    // A Poisson flow: Var N(t) = E N(t) = λt at every t (any probability textbook).
    [Theory]
    [InlineData(0.1)]
    [InlineData(3.0)]
    [InlineData(250.0)]
    public void A_poisson_flow_has_an_index_of_dispersion_of_1_at_every_window(double hours)
    {
        var counts = MarkovianArrivalProcess.Renewal(PhaseTypeDistribution.FitTwoMoments(0.5, 1.0)).Counts();

        Assert.Equal(2.0, counts.RatePerHour, 1e-12);
        Assert.Equal(1.0, counts.IndexOfDispersion(hours), 1e-9);
    }

    // Erlang-2 gaps at 1 patient per hour: the phase completions are Poisson at 2/h and every second one is an
    // arrival, the stationary phase being either with probability ½, so N(t) = ⌊(M + U)/2⌋ with M Poisson(2t) and U
    // 0 or 1 with probability ½ (worked out here by summing the Poisson probabilities, not by the code under test).
    // As t → ∞ the index tends to the gap SCV, ½ (D. R. Cox, Renewal Theory, Methuen, 1962, from memory).
    [Theory]
    [InlineData(0.3)]
    [InlineData(2.0)]
    [InlineData(15.0)]
    public void Erlang_gaps_give_the_dispersion_of_every_second_poisson_event(double hours)
    {
        var counts = MarkovianArrivalProcess.Renewal(PhaseTypeDistribution.FitTwoMoments(1.0, 0.5)).Counts();

        double mean = 0.0;
        double square = 0.0;
        for (int m = 0; m < 400; m++)
        {
            double probability = Math.Exp((m * Math.Log(2.0 * hours)) - (2.0 * hours) - SpecialFunctions.GammaLn(m + 1.0));
            foreach (int u in (int[])[0, 1])
            {
                int n = (m + u) / 2;
                mean += 0.5 * probability * n;
                square += 0.5 * probability * n * n;
            }
        }

        Assert.Equal(hours, mean, 1e-9);
        Assert.Equal((square - (mean * mean)) / mean, counts.IndexOfDispersion(hours), 1e-9);
        Assert.Equal(0.5, counts.AsymptoticDispersion, 1e-12);
    }

    // A renewal flow's long-run index of dispersion is the SCV of its gaps (Cox 1962, from memory); here
    // hyperexponential gaps of SCV 4.
    [Fact]
    public void A_renewal_flow_tends_to_the_scv_of_its_gaps()
    {
        var counts = MarkovianArrivalProcess.Renewal(PhaseTypeDistribution.FitTwoMoments(2.0, 4.0)).Counts();

        Assert.Equal(4.0, counts.AsymptoticDispersion, 1e-10);
        Assert.Equal(4.0, counts.IndexOfDispersion(1e5), 1e-3);
    }

    // A Poisson flow switched between rates λ₁ and λ₂ by a two-state chain with rates r₁ (1 → 2) and r₂ (2 → 1): a
    // doubly stochastic Poisson flow, Var N(t) = λ̄t + 2∫₀ᵗ(t − s)σ²e^{−as} ds with a = r₁ + r₂ and σ² the variance of
    // the rate, so I(t) = 1 + 2σ²/(aλ̄)·(1 − (1 − e^{−at})/(at)) (D. R. Cox and V. Isham, Point Processes, Chapman and
    // Hall, 1980, from memory; the integral by hand).
    [Theory]
    [InlineData(0.2)]
    [InlineData(4.0)]
    [InlineData(60.0)]
    public void A_markov_modulated_poisson_flow_takes_its_closed_form_dispersion(double hours)
    {
        const double First = 3.0;
        const double Second = 0.5;
        const double Leave = 0.2;
        const double Return = 0.6;
        var hidden = Matrix<double>.Build.DenseOfArray(new[,] { { -First - Leave, Leave }, { Return, -Second - Return } });
        var marked = Matrix<double>.Build.DenseOfArray(new[,] { { First, 0.0 }, { 0.0, Second } });
        var counts = new MarkovianArrivalProcess(hidden, marked).Counts();

        double a = Leave + Return;
        double inFirst = Return / a;
        double mean = (inFirst * First) + ((1.0 - inFirst) * Second);
        double rateVariance = inFirst * (1.0 - inFirst) * (First - Second) * (First - Second);
        double expected = 1.0 + (2.0 * rateVariance / (a * mean) * (1.0 - ((1.0 - Math.Exp(-a * hours)) / (a * hours))));

        Assert.Equal(mean, counts.RatePerHour, 1e-12);
        Assert.Equal(expected, counts.IndexOfDispersion(hours), 1e-9);
    }

    // Independent thinning keeps each arrival with probability p: Var N' = p² Var N + p(1 − p) E N, so I' = p·I + 1 − p
    // (any probability textbook); a thinned Poisson flow stays Poisson.
    [Fact]
    public void Thinning_scales_the_excess_dispersion_by_the_fraction_kept()
    {
        var bursty = MarkovianArrivalProcess.Renewal(PhaseTypeDistribution.FitTwoMoments(1.0, 3.0));
        var poisson = MarkovianArrivalProcess.Renewal(PhaseTypeDistribution.FitTwoMoments(1.0, 1.0));

        double whole = bursty.Counts().IndexOfDispersion(2.5);
        var thinned = bursty.Thinned(0.3).Counts();

        Assert.Equal(0.3, thinned.RatePerHour, 1e-12);
        Assert.Equal((0.3 * whole) + 0.7, thinned.IndexOfDispersion(2.5), 1e-9);
        Assert.Equal(1.0, poisson.Thinned(0.4).Counts().IndexOfDispersion(7.0), 1e-9);
    }
}
