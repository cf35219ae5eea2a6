using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Variability;

public sealed class MultiServerFactorTests
{
    // Exact by hand: Poisson arrivals and exponential service give exactly 1.0 (Erlang C unchanged, bit for bit).
    [Theory]
    [InlineData(2, 0.1)]
    [InlineData(40, 0.95)]
    public void Poisson_arrivals_and_exponential_service_give_exactly_one(int servers, double utilisation)
    {
        Assert.Equal(1.0, MultiServerFactor.For(servers, utilisation, 1.0, 1.0, ServiceDistribution.Lognormal(1.0, 1.0)));
    }

    // Exact by hand from the interpolation: 1/R = (1 − ρ)/R₀ + ρ/((1 + cs²)/2) tends to R₀ as ρ → 0 and to the
    // heavy-traffic ratio (1 + cs²)/2 as ρ → 1 (the M/G/c heavy-traffic limit, From memory: Köllerström, Journal of
    // Applied Probability 11, 1974).
    [Theory]
    [InlineData(ServiceKind.Lognormal)]
    [InlineData(ServiceKind.Gamma)]
    public void Variable_service_runs_from_the_light_traffic_ratio_to_the_heavy_traffic_ratio(ServiceKind kind)
    {
        var service = kind == ServiceKind.Gamma ? ServiceDistribution.Gamma(1.0, 2.0) : ServiceDistribution.Lognormal(1.0, 2.0);
        double lightTraffic = LightTrafficRatio.For(4, service);

        Assert.Equal(lightTraffic, MultiServerFactor.For(4, 0.0, 1.0, 4.0, service), 1e-12);
        Assert.Equal(2.5, MultiServerFactor.For(4, 1.0 - 1e-9, 1.0, 4.0, service), 1e-6);
        double half = MultiServerFactor.For(4, 0.5, 1.0, 4.0, service);
        Assert.Equal(1.0 / ((0.5 / lightTraffic) + (0.5 / 2.5)), half, 1e-12);
    }

    // Exact by hand: a service shape whose cv² is not cs² (for example the groups' mixture) is replaced by a gamma with cs².
    [Fact]
    public void A_shape_with_another_cv_falls_back_to_a_gamma()
    {
        double gamma = MultiServerFactor.For(3, 0.4, 1.0, 2.25, ServiceDistribution.Gamma(1.0, 1.5));

        Assert.Equal(gamma, MultiServerFactor.For(3, 0.4, 1.0, 2.25, ServiceDistribution.Lognormal(1.0, 1.2)), 1e-12);
        Assert.Equal(gamma, MultiServerFactor.For(3, 0.4, 1.0, 2.25), 1e-12);
        Assert.NotEqual(gamma, MultiServerFactor.For(3, 0.4, 1.0, 2.25, ServiceDistribution.Lognormal(1.0, 1.5)), 1e-3);
    }

    // Exact by hand: regular arrivals scale the M/G/c ratio by (ca² + cs²)/(1 + cs²); bursty ones add (ca² − 1)/2;
    // with cs² = 1 both are Allen–Cunneen's (ca² + 1)/2.
    [Theory]
    [InlineData(0.25)]
    [InlineData(2.25)]
    public void Arrival_variability_adjusts_the_ratio(double serviceScv)
    {
        double poisson = MultiServerFactor.For(3, 0.6, 1.0, serviceScv);

        Assert.Equal(poisson * (0.5 + serviceScv) / (1.0 + serviceScv), MultiServerFactor.For(3, 0.6, 0.5, serviceScv), 1e-12);
        Assert.Equal(poisson + 0.5, MultiServerFactor.For(3, 0.6, 2.0, serviceScv), 1e-12);
        Assert.Equal(1.5, MultiServerFactor.For(3, 0.6, 2.0, 1.0));
        Assert.Equal(0.75, MultiServerFactor.For(3, 0.6, 0.5, 1.0));
    }

    // Exact by hand: Cosmetatos' correction (1 − ρ)(c − 1)(√(4 + 5c) − 2)/(16ρc) grows without bound as ρ → 0; the
    // ratio is capped at the M/D/c light-traffic limit c/(c + 1) (Burman and Smith 1983), never infinite or NaN.
    [Theory]
    [InlineData(3, 0.0)]
    [InlineData(3, 1e-300)]
    [InlineData(10, 0.05)]
    public void The_fixed_service_ratio_is_capped_at_its_light_traffic_limit(int servers, double utilisation)
    {
        Assert.Equal(servers / (servers + 1.0), MultiServerFactor.FixedServiceRatio(servers, utilisation));
        Assert.Equal(0.5, MultiServerFactor.FixedServiceRatio(1, utilisation));
    }
}
