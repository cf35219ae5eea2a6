using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Variability;

public partial class GgcFormulasTests
{
    private static readonly double[] Scvs = [0.0, 0.1, 0.5, 0.9, 1.0, 1.1, 2.0, 4.0, 16.0];

    // Common practice: more variable arrivals or service never shorten the mean wait (Kingman's law of congestion).
    [Theory]
    [InlineData(1, 0.05)]
    [InlineData(1, 0.6)]
    [InlineData(1, 0.99)]
    [InlineData(2, 0.6)]
    [InlineData(20, 0.95)]
    public void More_variable_arrivals_or_service_never_shorten_the_wait(int servers, double utilisation)
    {
        double arrivalsPerHour = utilisation * servers;
        foreach (double fixedScv in Scvs)
        {
            double previousByArrivals = 0.0;
            double previousByService = 0.0;
            foreach (double scv in Scvs)
            {
                double byArrivals = GgcFormulas.Estimate(servers, arrivalsPerHour, 1.0, scv, fixedScv).MeanWaitHours!.Value;
                double byService = GgcFormulas.Estimate(servers, arrivalsPerHour, 1.0, fixedScv, scv).MeanWaitHours!.Value;
                Assert.True(byArrivals >= previousByArrivals, FormattableString.Invariant($"ca² {scv}, cs² {fixedScv}"));
                Assert.True(byService >= previousByService, FormattableString.Invariant($"ca² {fixedScv}, cs² {scv}"));
                previousByArrivals = byArrivals;
                previousByService = byService;
            }
        }
    }

    // Exact by hand: P(Wq > t) = C exp(−t C / E[Wq]). M/D/1 at ρ = 0.5, E[S] = 1 h: C = 0.5, E[Wq] = 0.5 h, so the
    // conditional mean is 1 h and P(Wq > 1 h) = 0.5 e^(−1); at t = 0 it is C. Its integral over t is E[Wq].
    [Fact]
    public void The_wait_tail_starts_at_the_wait_probability_and_integrates_to_the_mean_wait()
    {
        Assert.Equal(0.5, GgcFormulas.WaitLongerThan(1, 0.5, 1.0, 1.0, 0.0, 0.0), Exact);
        Assert.Equal(0.5 * Math.Exp(-1.0), GgcFormulas.WaitLongerThan(1, 0.5, 1.0, 1.0, 0.0, 1.0), Exact);

        // Several servers (c = 4, cs² = 1.8: light-heavy traffic interpolation): the tail is C e^(−rt); r from two
        // points, and C / r must be the mean wait.
        GgcWaitEstimate estimate = GgcFormulas.Estimate(4, 3.0, 1.0, 0.4, 1.8);
        double atZero = GgcFormulas.WaitLongerThan(4, 3.0, 1.0, 0.4, 1.8, 0.0);
        double atOne = GgcFormulas.WaitLongerThan(4, 3.0, 1.0, 0.4, 1.8, 1.0);
        Assert.Equal(estimate.WaitProbability, atZero, Exact);
        Assert.Equal(estimate.MeanWaitHours!.Value, atZero / Math.Log(atZero / atOne), 1e-9);
    }

    // Exact by hand: fixed arrivals and fixed service below capacity never wait (D/D/c); no arrivals, no queue.
    [Theory]
    [InlineData(1, 0.9)]
    [InlineData(3, 2.5)]
    [InlineData(3, 0.0)]
    public void Fixed_arrivals_and_fixed_service_or_no_arrivals_never_wait(int servers, double arrivalsPerHour)
    {
        double scv = arrivalsPerHour == 0.0 ? 1.0 : 0.0;
        GgcWaitEstimate estimate = GgcFormulas.Estimate(servers, arrivalsPerHour, 1.0, scv, scv);

        Assert.True(estimate.IsStable);
        Assert.Equal(0.0, estimate.WaitProbability);
        Assert.Equal(0.0, estimate.MeanQueue);
        Assert.Equal(0.0, estimate.MeanWaitHours);
        Assert.Equal(arrivalsPerHour, estimate.MeanInUnit);
        Assert.Equal(1.0, estimate.MeanTimeInUnitHours);
        Assert.Equal(0.0, GgcFormulas.WaitLongerThan(servers, arrivalsPerHour, 1.0, scv, scv, 0.0));
    }

    // Source: the network file contract (p_wait is 1 and the waits are absent for an unstable unit).
    [Theory]
    [InlineData(1, 1.0)]
    [InlineData(2, 2.5)]
    [InlineData(100_000, 100_000.0)]
    public void An_overloaded_unit_is_unstable_with_no_waits(int servers, double arrivalsPerHour)
    {
        GgcWaitEstimate estimate = GgcFormulas.Estimate(servers, arrivalsPerHour, 1.0, 0.5, 2.0);

        Assert.False(estimate.IsStable);
        Assert.Equal(1.0, estimate.WaitProbability);
        Assert.Null(estimate.MeanQueue);
        Assert.Null(estimate.MeanWaitHours);
        Assert.Null(estimate.MeanInUnit);
        Assert.Null(estimate.MeanTimeInUnitHours);
        Assert.Null(estimate.VariabilityFactor);
        Assert.Equal(1.0, GgcFormulas.WaitLongerThan(servers, arrivalsPerHour, 1.0, 0.5, 2.0, 5.0));
    }

    // Common practice: the stability requirement of the Core issue: finite, non-negative results at the edges
    // (ρ → 1, ρ → 0, c = 100,000, cs² = 0, the largest accepted cv).
    [Theory]
    [InlineData(1, 1.0 - 1e-12, 0.0, 0.0001)]
    [InlineData(1, 1e-300, 0.0, 1.0)]
    [InlineData(1, 1e-12, 0.5, 0.0)]
    [InlineData(1, 0.999999, 1e6, 1e6)]
    [InlineData(100_000, 0.9999, 0.5, 0.0)]
    [InlineData(100_000, 0.9999, 1e6, 1e6)]
    [InlineData(100_000, 0.2, 2.0, 0.0)]
    public void Results_stay_finite_at_the_edges(int servers, double utilisation, double arrivalScv, double serviceScv)
    {
        double arrivalsPerHour = utilisation * servers;
        GgcWaitEstimate estimate = GgcFormulas.Estimate(servers, arrivalsPerHour, 1.0, arrivalScv, serviceScv);

        Assert.True(estimate.IsStable);
        foreach (double value in new[] { estimate.WaitProbability, estimate.MeanQueue!.Value, estimate.MeanWaitHours!.Value, estimate.MeanInUnit!.Value, estimate.MeanTimeInUnitHours!.Value })
        {
            Assert.True(double.IsFinite(value) && value >= 0.0, FormattableString.Invariant($"{value}"));
        }

        Assert.InRange(estimate.WaitProbability, 0.0, 1.0);
        Assert.InRange(GgcFormulas.WaitLongerThan(servers, arrivalsPerHour, 1.0, arrivalScv, serviceScv, 1.0), 0.0, 1.0);
        Assert.Equal(0.0, GgcFormulas.WaitLongerThan(servers, arrivalsPerHour, 1.0, arrivalScv, serviceScv, double.PositiveInfinity));
    }

    // Common practice: library misuse throws from the guard clauses.
    [Fact]
    public void Misuse_is_refused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => GgcFormulas.Estimate(0, 1.0, 1.0, 1.0, 1.0));
        Assert.Throws<ArgumentOutOfRangeException>(() => GgcFormulas.Estimate(1, -1.0, 1.0, 1.0, 1.0));
        Assert.Throws<ArgumentOutOfRangeException>(() => GgcFormulas.Estimate(1, double.NaN, 1.0, 1.0, 1.0));
        Assert.Throws<ArgumentOutOfRangeException>(() => GgcFormulas.Estimate(1, 1.0, 0.0, 1.0, 1.0));
        Assert.Throws<ArgumentOutOfRangeException>(() => GgcFormulas.Estimate(1, 1.0, 1.0, -0.1, 1.0));
        Assert.Throws<ArgumentOutOfRangeException>(() => GgcFormulas.Estimate(1, 1.0, 1.0, 1.0, double.NaN));
        Assert.Throws<ArgumentOutOfRangeException>(() => GgcFormulas.Estimate(1, 1.0, 1.0, 1.0, double.PositiveInfinity));
        Assert.Throws<ArgumentOutOfRangeException>(() => GgcFormulas.WaitLongerThan(1, 0.5, 1.0, 1.0, 1.0, -1.0));
        Assert.Throws<ArgumentOutOfRangeException>(() => GgcFormulas.MethodFor(1, 1.0, 2e6));
    }
}
