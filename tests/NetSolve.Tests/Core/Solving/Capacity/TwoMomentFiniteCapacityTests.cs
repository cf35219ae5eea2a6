using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Capacity;

public sealed class TwoMomentFiniteCapacityTests
{
    // Exact M/D/1/K by the embedded chain (EmbeddedChainOneServer). Source: Gross, Shortle, Thompson and Harris,
    // Fundamentals of Queueing Theory, 4th ed., 2008, section on M/G/1/K. Measured errors of the approximation
    // (docs/methods.md, "Bed limits"): P(full) +4.9%, +10.2%, +1.1%, 0.0%; wait −4.9%, −4.0%, −3.0%, −1.2%
    // (M/M/1/K: P(full) +24% to +242%, wait −5% to +54%). Bounds: those errors rounded up.
    [Theory]
    [InlineData(0.5, 3)]
    [InlineData(0.7, 5)]
    [InlineData(0.9, 8)]
    [InlineData(1.2, 6)]
    public void Fixed_service_on_one_server_is_close_to_the_exact_embedded_chain(double load, int capacity)
    {
        var exact = EmbeddedChainOneServer.Solve(capacity, load, 1.0, k => Poisson(load, k));

        var result = FiniteCapacityFormulas.Solve(1, capacity, load, 1.0, 0.0, ServiceDistribution.Deterministic(1.0));

        Assert.Equal(FiniteCapacityFormulas.TwoMomentMethod, result.Method);
        Assert.InRange(result.FullProbability / exact.Full, 0.95, 1.12);
        Assert.InRange(result.MeanWaitHours / exact.MeanWaitHours, 0.94, 1.02);
    }

    // Exact M/E2/1/K by the embedded chain: arrivals during an Erlang-2 service of mean 1 are negative binomial,
    // P(k) = (k + 1)·q²·(1 − q)^k with q = 2/(2 + λ). Source as above. Measured: P(full) +1.4%, −0.8%; wait −1.9%,
    // −1.6% (M/M/1/K: P(full) +52%, +33%; wait +17%, +6.7%).
    [Theory]
    [InlineData(0.6, 4)]
    [InlineData(0.9, 6)]
    public void Erlang_two_service_on_one_server_is_close_to_the_exact_embedded_chain(double load, int capacity)
    {
        double q = 2.0 / (2.0 + load);
        var exact = EmbeddedChainOneServer.Solve(capacity, load, 1.0, k => (k + 1) * q * q * Math.Pow(1.0 - q, k));

        var result = FiniteCapacityFormulas.Solve(1, capacity, load, 1.0, 0.5, ServiceDistribution.Gamma(1.0, Math.Sqrt(0.5)));

        Assert.InRange(result.FullProbability / exact.Full, 0.98, 1.03);
        Assert.InRange(result.MeanWaitHours / exact.MeanWaitHours, 0.97, 1.0);
    }

    // Exact by hand: with cs² = 1 the truncated chain is the M/M/c/K birth–death chain, so a service SCV a hair away
    // from 1 lands on the closed form of the M/M/c/K path.
    [Theory]
    [InlineData(1, 4, 0.8)]
    [InlineData(4, 9, 3.2)]
    [InlineData(24, 30, 20.0)]
    [InlineData(3, 7, 4.5)]
    public void A_service_cv_next_to_one_gives_the_exponential_results(int servers, int capacity, double arrivalsPerHour)
    {
        var exponential = FiniteCapacityFormulas.Solve(servers, capacity, arrivalsPerHour, 1.0);
        var nearly = FiniteCapacityFormulas.Solve(servers, capacity, arrivalsPerHour, 1.0, 1.0 + 1e-9, null);

        Assert.Equal(exponential.FullProbability, nearly.FullProbability, 1e-7);
        Assert.Equal(exponential.MeanQueue, nearly.MeanQueue, 1e-6);
        Assert.Equal(exponential.MeanWaitHours, nearly.MeanWaitHours, 1e-6);
        Assert.Equal(exponential.Utilisation, nearly.Utilisation, 1e-7);
        Assert.Equal(exponential.WaitProbability, nearly.WaitProbability, 1e-7);
    }

    // Exact by hand: the Erlang loss formula is insensitive to the length-of-stay distribution, so K = c ignores cs².
    [Fact]
    public void Capacity_equal_to_servers_ignores_the_service_variability()
    {
        var exponential = FiniteCapacityFormulas.Solve(5, 5, 4.0, 1.0);
        var fixedService = FiniteCapacityFormulas.Solve(5, 5, 4.0, 1.0, 0.0, null);

        Assert.Equal(exponential, fixedService);
    }

    // Common practice: every admitted patient keeps a server busy for E[S], so the utilisation is a(1 − p_K)/c, and
    // more regular service never blocks more patients than exponential service at the same load.
    [Theory]
    [InlineData(2, 4, 1.5, 0.25)]
    [InlineData(6, 10, 7.0, 0.36)]
    [InlineData(3, 5, 6.0, 0.5)]
    [InlineData(3, 5, 6.0, 4.0)]
    [InlineData(24, 30, 18.5, 0.64)]
    public void Utilisation_follows_the_admitted_work_and_values_stay_finite(int servers, int capacity, double arrivalsPerHour, double serviceScv)
    {
        var result = FiniteCapacityFormulas.Solve(servers, capacity, arrivalsPerHour, 1.0, serviceScv, null);

        Assert.Equal(arrivalsPerHour * (1.0 - result.FullProbability) / servers, result.Utilisation, 1e-12);
        Assert.Equal(arrivalsPerHour * (1.0 - result.FullProbability), result.AdmittedPerHour, 1e-12);
        Assert.InRange(result.MeanQueue, 0.0, capacity - servers);
        Assert.True(double.IsFinite(result.MeanWaitHours));
        var exponential = FiniteCapacityFormulas.Solve(servers, capacity, arrivalsPerHour, 1.0);
        Assert.Equal(serviceScv < 1.0, result.FullProbability < exponential.FullProbability);
    }

    // Exact by hand: a huge load keeps the unit full nearly always, admitting about c/E[S] patients per hour.
    [Fact]
    public void A_huge_load_on_a_large_unit_stays_finite()
    {
        var result = FiniteCapacityFormulas.Solve(50, 100_000, 1e6, 1.0, 0.3, null);

        Assert.InRange(result.FullProbability, 0.99, 1.0);
        Assert.Equal(50.0, result.AdmittedPerHour, 1e-3);
    }

    private static double Poisson(double mean, int k)
    {
        double p = Math.Exp(-mean);
        for (int i = 1; i <= k; i++)
        {
            p *= mean / i;
        }

        return p;
    }
}
