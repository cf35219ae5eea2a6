using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Variability;

public partial class GgcFormulasTests
{
    // Exact by hand: the GI/M/1 reference with Poisson arrivals has σ = ρ and gives the M/M/1 wait ρ / (μ − λ); the
    // M/D/c reference with one server gives the Pollaczek–Khinchine M/D/1 wait ρ D / (2(1 − ρ)). Checks the references.
    [Theory]
    [InlineData(0.3)]
    [InlineData(0.5)]
    [InlineData(0.7)]
    public void The_exact_references_reproduce_M_M_1_and_M_D_1(double utilisation)
    {
        Assert.Equal(utilisation / (1.0 - utilisation), SingleServerExponentialReference.MeanWait(SingleServerExponentialReference.Poisson(utilisation), 1.0), 1e-9);
        Assert.Equal(utilisation / (2.0 * (1.0 - utilisation)), FixedServiceReference.MeanWait(1, utilisation, 1.0), 1e-9);
    }

    // Source: exact GI/M/1 waits (From memory: Gross, Shortle, Thompson & Harris, Fundamentals of Queueing Theory, 4th ed.,
    // section 5.3; computed by SingleServerExponentialReference). Kraemer–Langenbach-Belz must be within 15% of exact
    // (measured worst case 14.5%, E2/M/1 at ρ = 0.3). It is closer than the plain two-moment factor (ca² + cs²)/2
    // (Kingman) for every ca² < 1 and, for ca² > 1, at ρ ≤ 0.5 (Kingman +32% for H2/M/1, ca² = 4, ρ = 0.3, against +1.6%);
    // for ca² > 1 at heavy load Kingman is slightly closer (ρ = 0.9: +0.4% against −3.3%), as docs/methods.md says.
    [Theory]
    [InlineData("fixed", 0.0, 0.3)]
    [InlineData("fixed", 0.0, 0.5)]
    [InlineData("fixed", 0.0, 0.9)]
    [InlineData("erlang2", 0.5, 0.3)]
    [InlineData("erlang2", 0.5, 0.7)]
    [InlineData("erlang4", 0.25, 0.5)]
    [InlineData("hyper", 2.0, 0.3)]
    [InlineData("hyper", 4.0, 0.3)]
    [InlineData("hyper", 4.0, 0.7)]
    [InlineData("hyper", 4.0, 0.9)]
    public void One_server_with_exponential_service_is_close_to_the_exact_GI_M_1_wait(string arrivals, double arrivalScv, double utilisation)
    {
        Func<double, double> transform = arrivals switch
        {
            "fixed" => SingleServerExponentialReference.Fixed(utilisation),
            "erlang2" => SingleServerExponentialReference.Erlang(2, utilisation),
            "erlang4" => SingleServerExponentialReference.Erlang(4, utilisation),
            _ => SingleServerExponentialReference.Hyperexponential(arrivalScv, utilisation),
        };
        double exact = SingleServerExponentialReference.MeanWait(transform, 1.0);
        double kingman = utilisation / (1.0 - utilisation) * (arrivalScv + 1.0) / 2.0;

        double estimate = GgcFormulas.Estimate(1, utilisation, 1.0, arrivalScv, 1.0).MeanWaitHours!.Value;

        Assert.InRange(Math.Abs(estimate - exact) / exact, 0.0, 0.15);
        Assert.True(arrivalScv > 1.0 && utilisation > 0.5 || Math.Abs(estimate - exact) <= Math.Abs(kingman - exact) + 1e-12, FormattableString.Invariant($"KLB {estimate}, Kingman {kingman}, exact {exact}"));
    }

    // Source: exact M/D/c waits (From memory: Crommelin 1932; computed by FixedServiceReference). Cosmetatos' ratio
    // (From memory: G. P. Cosmetatos, Operational Research Quarterly 27(3), 1976, pp. 615–620) is within about 1% from
    // ρ = 0.5 up, and overstates the wait at light load (measured: +0.9% for c = 2, +4.6% for c = 5, +8.9% for c = 10
    // at ρ = 0.3). The bounds below are the documented accuracy in docs/methods.md.
    [Theory]
    [InlineData(2, 0.3, 0.02)]
    [InlineData(2, 0.5, 0.02)]
    [InlineData(2, 0.9, 0.02)]
    [InlineData(5, 0.3, 0.06)]
    [InlineData(5, 0.5, 0.02)]
    [InlineData(5, 0.7, 0.02)]
    [InlineData(5, 0.9, 0.02)]
    [InlineData(10, 0.3, 0.10)]
    [InlineData(10, 0.5, 0.02)]
    [InlineData(10, 0.9, 0.02)]
    [InlineData(20, 0.5, 0.02)]
    public void Cosmetatos_ratio_is_close_to_the_exact_fixed_service_wait(int servers, double utilisation, double worstRelativeError)
    {
        const double serviceHours = 2.0;
        double exact = FixedServiceReference.MeanWait(servers, utilisation, serviceHours);
        double arrivalsPerHour = utilisation * servers / serviceHours;

        double estimate = GgcFormulas.Estimate(servers, arrivalsPerHour, serviceHours, 1.0, 0.0).MeanWaitHours!.Value;

        Assert.InRange(Math.Abs(estimate - exact) / exact, 0.0, worstRelativeError);
    }
}
