using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Variability;

public sealed class LightTrafficRatioTests
{
    private const double Quadrature = 1e-6;

    // Exact by hand: with one server the mean equilibrium excess is E[S²]/(2E[S]), so R₀ = (1 + cs²)/2 for every
    // distribution (the Pollaczek–Khinchine ratio), whatever its shape.
    [Theory]
    [InlineData(ServiceKind.Gamma, 0.5)]
    [InlineData(ServiceKind.Gamma, 2.0)]
    [InlineData(ServiceKind.Lognormal, 0.5)]
    [InlineData(ServiceKind.Lognormal, 1.5)]
    [InlineData(ServiceKind.Lognormal, 2.0)]
    public void One_server_gives_the_Pollaczek_Khinchine_ratio_for_any_shape(ServiceKind kind, double cv)
    {
        var service = kind == ServiceKind.Gamma ? ServiceDistribution.Gamma(3.0, cv) : ServiceDistribution.Lognormal(3.0, cv);

        Assert.Equal((1.0 + (cv * cv)) / 2.0, LightTrafficRatio.For(1, service), Quadrature);
    }

    // Exact by hand: a gamma with cv 1 is exponential, whose equilibrium excess is exponential again; the minimum of c
    // of them has mean E[S]/c, so R₀ = 1. Fixed service: the excess is uniform on [0, D], min of c has mean D/(c + 1).
    [Theory]
    [InlineData(2)]
    [InlineData(5)]
    [InlineData(20)]
    public void Exponential_and_fixed_service_give_their_closed_forms(int servers)
    {
        Assert.Equal(1.0, LightTrafficRatio.For(servers, ServiceDistribution.Gamma(1.0, 1.0)), Quadrature);
        Assert.Equal(1.0, LightTrafficRatio.For(servers, ServiceDistribution.Exponential(1.0)));
        Assert.Equal(servers / (servers + 1.0), LightTrafficRatio.For(servers, ServiceDistribution.Deterministic(1.0)));
        Assert.Equal(servers / (servers + 1.0), LightTrafficRatio.For(servers, ServiceDistribution.Empirical([2.0, 2.0, 2.0])), Quadrature);
        Assert.Equal(servers / (servers + 1.0), LightTrafficRatio.For(servers, ServiceDistribution.Gamma(1.0, 0.01)), 0.01);
    }

    // Exact by hand: observed stays 0.5 h and 1.5 h (mean 1 h); the excess is 1 − t below 0.5 and (1.5 − t)/2 up to
    // 1.5, so with c = 2: R₀ = 2(∫₀^½ (1 − t)² dt + ∫_½^1.5 ((1.5 − t)/2)² dt) = 2(7/24 + 1/12) = 3/4. The
    // quadrature crosses the excess's kinks, hence 1e-4.
    [Fact]
    public void Two_servers_with_two_observed_stays_give_three_quarters()
    {
        Assert.Equal(0.75, LightTrafficRatio.For(2, ServiceDistribution.Empirical([0.5, 1.5])), 1e-4);
    }

    // Common practice: an independent midpoint-rule integration (4,000 points in u, t = u/(1 − u)) of the same integral,
    // from the closed-form excess of each family. The lognormal's light-traffic ratio is far below the gamma's at the
    // same cv, which is why the two-moment factor (1 + cs²)/2 = 2.5 overstated lognormal waits at light load.
    [Theory]
    [InlineData(ServiceKind.Lognormal, 2.0, 5, 1.1500)]
    [InlineData(ServiceKind.Lognormal, 1.5, 2, 1.1952)]
    [InlineData(ServiceKind.Gamma, 2.0, 5, 1.8753)]
    [InlineData(ServiceKind.Gamma, 1.5, 3, 1.4265)]
    public void Several_servers_match_an_independent_integration(ServiceKind kind, double cv, int servers, double expected)
    {
        var service = kind == ServiceKind.Gamma ? ServiceDistribution.Gamma(0.5, cv) : ServiceDistribution.Lognormal(0.5, cv);

        Assert.Equal(expected, LightTrafficRatio.For(servers, service), 1e-3);
    }
}
