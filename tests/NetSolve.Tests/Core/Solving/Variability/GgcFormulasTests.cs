using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Variability;

public partial class GgcFormulasTests
{
    private const double Exact = 1e-12;

    // Exact by hand: with ca² = cs² = 1 the variability factor is exactly 1.0, so every metric must equal the M/M/c
    // metrics of UnitMetrics (Erlang C) to the last bit, and the tail must equal ErlangFormulas.WaitLongerThan.
    [Theory]
    [InlineData(1, 0.5)]
    [InlineData(1, 0.99)]
    [InlineData(2, 0.8)]
    [InlineData(3, 2.0 / 3.0)]
    [InlineData(5, 0.3)]
    [InlineData(50, 0.95)]
    [InlineData(100_000, 0.9999)]
    public void Poisson_arrivals_and_exponential_service_give_Erlang_C_to_the_last_bit(int servers, double utilisation)
    {
        const double serviceHours = 1.7;
        double arrivalsPerHour = utilisation * servers / serviceHours;
        var unit = new Unit("unit", "unit", Servers.Of(servers), serviceHours);
        UnitResult jackson = UnitMetrics.Compute(unit, arrivalsPerHour, arrivalsPerHour);

        GgcWaitEstimate estimate = GgcFormulas.Estimate(servers, arrivalsPerHour, serviceHours, 1.0, 1.0);

        Assert.Equal(GgcMethodNames.ErlangC, estimate.Method);
        Assert.Equal(1.0, estimate.VariabilityFactor);
        Assert.Equal(jackson.WaitProbability, estimate.WaitProbability);
        Assert.Equal(jackson.MeanQueue, estimate.MeanQueue);
        Assert.Equal(jackson.MeanWaitHours, estimate.MeanWaitHours);
        Assert.Equal(jackson.MeanInUnit, estimate.MeanInUnit);
        Assert.Equal(jackson.MeanTimeInUnitHours, estimate.MeanTimeInUnitHours);
        foreach (double t in new[] { 0.0, 0.1, 1.0, 10.0 })
        {
            Assert.Equal(
                ErlangFormulas.WaitLongerThan(servers, jackson.OfferedLoad, serviceHours, t),
                GgcFormulas.WaitLongerThan(servers, arrivalsPerHour, serviceHours, 1.0, 1.0, t));
        }
    }

    // Source: the Pollaczek–Khinchine mean-value formula for M/G/1, Wq = λ E[S²] / (2(1 − ρ)) with E[S²] = (1 + cs²) E[S]²
    // (From memory: Gross, Shortle, Thompson & Harris, Fundamentals of Queueing Theory, 4th ed., Wiley 2008, section 5.1).
    // M/D/1: cs² = 0, Wq = ρ E[S] / (2(1 − ρ)). M/E_k/1: cs² = 1/k, Wq = ρ E[S] (1 + 1/k) / (2(1 − ρ)).
    [Theory]
    [InlineData(0.1, 0.0)]
    [InlineData(0.5, 0.0)]
    [InlineData(0.9, 0.0)]
    [InlineData(0.99, 0.0)]
    [InlineData(0.5, 0.5)]
    [InlineData(0.8, 1.0 / 3.0)]
    [InlineData(0.95, 0.25)]
    [InlineData(0.7, 2.5)]
    public void One_server_with_Poisson_arrivals_is_Pollaczek_Khinchine_exactly(double utilisation, double serviceScv)
    {
        const double serviceHours = 0.4;
        double arrivalsPerHour = utilisation / serviceHours;
        double secondMoment = (1.0 + serviceScv) * serviceHours * serviceHours;
        double expected = arrivalsPerHour * secondMoment / (2.0 * (1.0 - utilisation));

        GgcWaitEstimate estimate = GgcFormulas.Estimate(1, arrivalsPerHour, serviceHours, 1.0, serviceScv);

        Assert.Equal(GgcMethodNames.PollaczekKhinchine, estimate.Method);
        Assert.Equal(expected, estimate.MeanWaitHours!.Value, expected * Exact);
        Assert.Equal(utilisation, estimate.WaitProbability, Exact);
    }

    // Exact by hand: M/D/1 with E[S] = 1 h at λ = 0.5/h: Wq = 0.5 · 1 / (2 · 0.5) = 0.5 h, Lq = 0.25, L = 0.75, W = 1.5 h.
    [Fact]
    public void A_fixed_one_hour_service_at_half_load_waits_half_an_hour()
    {
        GgcWaitEstimate estimate = GgcFormulas.Estimate(1, 0.5, 1.0, 1.0, 0.0);

        Assert.Equal(0.5, estimate.MeanWaitHours!.Value, Exact);
        Assert.Equal(0.25, estimate.MeanQueue!.Value, Exact);
        Assert.Equal(0.75, estimate.MeanInUnit!.Value, Exact);
        Assert.Equal(1.5, estimate.MeanTimeInUnitHours!.Value, Exact);
    }

    // Exact by hand from Cosmetatos' M/D/c ratio: M/D/2 at a = 1 (λ = 1/h, E[S] = 1 h, ρ = 0.5): C(2, 1) = 1/3,
    // Wq(M/M/2) = C E[S]/(c − a) = 1/3 h; R_D = ½(1 + 0.5 · 1 · (√14 − 2)/(16 · 0.5 · 2)) and Wq = R_D/3 h.
    [Fact]
    public void Two_fixed_one_hour_servers_at_one_erlang_wait_by_Cosmetatos_ratio()
    {
        GgcWaitEstimate estimate = GgcFormulas.Estimate(2, 1.0, 1.0, 1.0, 0.0);

        double ratio = 0.5 * (1.0 + (0.5 * (Math.Sqrt(14.0) - 2.0) / 16.0));
        Assert.Equal(GgcMethodNames.Cosmetatos, estimate.Method);
        Assert.Equal(ratio / 3.0, estimate.MeanWaitHours!.Value, Exact);
        Assert.Equal(1.0 / 3.0, estimate.WaitProbability, Exact);
    }

    // Exact by hand from Kraemer–Langenbach-Belz: ca² = 0.5, cs² = 1, ρ = 0.5, E[S] = 1 h: Wq(M/M/1) = 1 h,
    // g = exp(−2 · 0.5 · 0.25 / (3 · 0.5 · 1.5)) = exp(−1/9), Wq = 0.75 · exp(−1/9) h.
    // ca² = 4, cs² = 1, ρ = 0.5: g = exp(−0.5 · 3 / (4 + 4)) = exp(−3/16), Wq = 2.5 · exp(−3/16) h.
    [Theory]
    [InlineData(0.5, 0.75, -1.0 / 9.0)]
    [InlineData(4.0, 2.5, -3.0 / 16.0)]
    public void One_server_with_non_Poisson_arrivals_follows_Kraemer_Langenbach_Belz(double arrivalScv, double twoMoment, double exponent)
    {
        GgcWaitEstimate estimate = GgcFormulas.Estimate(1, 0.5, 1.0, arrivalScv, 1.0);

        Assert.Equal(GgcMethodNames.KraemerLangenbachBelz, estimate.Method);
        Assert.Equal(twoMoment * Math.Exp(exponent), estimate.MeanWaitHours!.Value, Exact);
    }

    // Exact by hand: Little's law Lq = λ Wq and L = λ W, L = Lq + a, for every method.
    [Theory]
    [InlineData(1, 0.3, 0.2, 0.6)]
    [InlineData(1, 0.9, 2.0, 0.0)]
    [InlineData(4, 0.85, 0.5, 1.5)]
    [InlineData(30, 0.7, 1.0, 0.3)]
    public void Little_s_law_holds_for_every_method(int servers, double utilisation, double arrivalScv, double serviceScv)
    {
        const double serviceHours = 3.0;
        double arrivalsPerHour = utilisation * servers / serviceHours;
        GgcWaitEstimate estimate = GgcFormulas.Estimate(servers, arrivalsPerHour, serviceHours, arrivalScv, serviceScv);

        double queue = estimate.MeanQueue!.Value;
        Assert.Equal(queue, arrivalsPerHour * estimate.MeanWaitHours!.Value, queue * Exact);
        Assert.Equal(estimate.MeanInUnit!.Value, arrivalsPerHour * estimate.MeanTimeInUnitHours!.Value, estimate.MeanInUnit.Value * Exact);
        Assert.Equal(queue + estimate.OfferedLoad, estimate.MeanInUnit.Value, Exact);
    }

    // Exact by hand: the documented method for each case.
    [Theory]
    [InlineData(1, 1.0, 1.0, GgcMethodNames.ErlangC)]
    [InlineData(7, 1.0, 1.0, GgcMethodNames.ErlangC)]
    [InlineData(1, 1.0, 0.36, GgcMethodNames.PollaczekKhinchine)]
    [InlineData(1, 0.5, 1.0, GgcMethodNames.KraemerLangenbachBelz)]
    [InlineData(1, 2.0, 0.0, GgcMethodNames.KraemerLangenbachBelz)]
    [InlineData(2, 1.0, 0.36, GgcMethodNames.Cosmetatos)]
    [InlineData(3, 0.5, 0.0, GgcMethodNames.Cosmetatos)]
    [InlineData(2, 1.0, 4.0, GgcMethodNames.LightHeavyTraffic)]
    [InlineData(2, 0.5, 1.0, GgcMethodNames.AllenCunneen)]
    public void The_method_is_named_for_the_servers_and_variability(int servers, double arrivalScv, double serviceScv, string method)
    {
        Assert.Equal(method, GgcFormulas.MethodFor(servers, arrivalScv, serviceScv));
        Assert.Equal(method, GgcFormulas.Estimate(servers, 0.1, 1.0, arrivalScv, serviceScv).Method);
    }
}
