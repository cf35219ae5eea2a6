using NetSolve.Analysis;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Journeys;

public sealed class JourneyFormulaTests
{
    private const double Tolerance = 1e-3;

    // From memory: Kleinrock, Queueing Systems, Volume 1: Theory, Wiley, 1975, section 3.2: the time in an
    // M/M/1 system is exponential with rate μ − λ. Here λ = 2, μ = 3, so P(T > t) = e^(−t) and the p-quantile is −ln(1 − p).
    [Fact]
    public void A_journey_through_one_MM1_unit_is_exponential_with_rate_mu_minus_lambda()
    {
        var estimate = Single(Solve("""
            units:
              clinic: { servers: 1, service: 20min }
            arrivals:
              clinic: 2
            journeys:
              visit: { units: [clinic], over: [1h, 4h] }
            """));

        Assert.Equal(1.0, estimate.MeanHours!.Value, Tolerance);
        Assert.Equal(Math.Exp(-1.0), estimate.Over[0].Probability, 1e-9);
        Assert.Equal(Math.Exp(-4.0), estimate.Over[1].Probability, 1e-9);
        Assert.Equal(Math.Log(2.0), estimate.Percentiles[0].Hours, Tolerance);
        Assert.Equal(Math.Log(10.0), estimate.Percentiles[1].Hours, Tolerance);
        Assert.Equal(Math.Log(100.0), estimate.Percentiles[3].Hours, Tolerance);
        Assert.Equal(2.0, estimate.PerHour, 1e-12);
    }

    // From memory: Burke, "The output of a queuing system", Operations Research 4(6), 1956, 699-704, with Reich (1957):
    // in a tandem of M/M/1 units a patient's sojourns are independent exponentials with rates μ_i − λ. Here λ = 1,
    // μ = 2 and 3: rates 1 and 2, a hypoexponential with P(T > t) = 2e^(−t) − e^(−2t) (Exact by hand) and mean 1.5.
    [Fact]
    public void A_journey_through_a_tandem_of_MM1_units_is_the_sum_of_independent_exponentials()
    {
        var estimate = Single(Solve("""
            units:
              triage: { servers: 1, service: 30min }
              treatment: { servers: 1, service: 20min }
            arrivals:
              triage: 1
            routes:
              triage: { treatment: 1.0 }
            journeys:
              stay: { units: [triage, treatment], over: [4h] }
            """));

        static double Survival(double t) => (2.0 * Math.Exp(-t)) - Math.Exp(-2.0 * t);
        Assert.Equal(1.5, estimate.MeanHours!.Value, 1e-9);
        Assert.Equal(Survival(4.0), estimate.Over[0].Probability, 1e-9);
        Assert.All(estimate.Percentiles, percentile => Assert.Equal(1.0 - (percentile.Percent / 100.0), Survival(percentile.Hours), Tolerance));
    }

    // From memory: Takács, "A single-server queue with feedback", Bell System Technical Journal 42(2), 1963, 505-519: with
    // Bernoulli feedback p the total time of a patient has mean 1 / (μ(1 − p) − λ). Here λ = 1, μ = 4, p = 0.5: mean 1.
    // The formula takes the visits as independent, which gets this mean exactly; the spread is measured in docs/methods.md.
    [Fact]
    public void A_journey_through_an_MM1_unit_with_feedback_has_the_mean_of_Takacs()
    {
        var estimate = Single(Solve("""
            units:
              clinic: { servers: 1, service: 15min }
            arrivals:
              clinic: 1
            routes:
              clinic: { clinic: 0.5 }
            journeys:
              stay: { units: [clinic] }
            """));

        Assert.Equal(1.0, estimate.MeanHours!.Value, 1e-9);
    }

    // Exact by hand: the journey starts where patients enter the set from outside it (2/h from outside at the
    // assessment unit and 0.5 × 2 = 1/h from the outside unit 'ward' into 'review'), and its mean is the visits times
    // the mean time per visit; with unlimited servers there is no wait, so every visit is its service time.
    [Fact]
    public void A_journey_starts_where_patients_enter_the_set_and_adds_up_the_visits_inside_it()
    {
        var estimate = Single(Solve("""
            units:
              assessment: { servers: unlimited, service: 1h }
              review: { servers: unlimited, service: 30min }
              ward: { servers: unlimited, service: 1d }
            arrivals:
              assessment: 2
            routes:
              assessment: { ward: 1.0 }
              ward: { review: 0.5 }
            journeys:
              stay: { units: [assessment, review] }
            """));

        Assert.Equal(3.0, estimate.PerHour, 1e-12);
        Assert.Equal((2.0 / 3.0 * 1.0) + (1.0 / 3.0 * 0.5), estimate.MeanHours!.Value, 1e-9);
    }

    // Exact by hand: the visit is Erlang or hyperexponential by its SCV, and the mean of the fit is the service mean.
    [Theory]
    [InlineData(0.0)]
    [InlineData(0.3)]
    [InlineData(0.6)]
    [InlineData(2.0)]
    public void The_fitted_visit_keeps_the_mean_of_the_service_whatever_its_variability(double cv)
    {
        var estimate = Single(Solve(string.Create(System.Globalization.CultureInfo.InvariantCulture, $$"""
            units:
              scanner: { servers: unlimited, service: 2h, service_cv: {{cv}} }
            arrivals:
              scanner: 1
            journeys:
              scan: { units: [scanner] }
            """)));

        Assert.Equal(2.0, estimate.MeanHours!.Value, 1e-9);
    }

    [Fact]
    public void A_journey_through_an_unstable_unit_has_no_figures()
    {
        var estimate = Single(Solve("""
            units:
              clinic: { servers: 1, service: 2h }
            arrivals:
              clinic: 1
            journeys:
              stay: { units: [clinic], over: [4h] }
            """));

        Assert.Null(estimate.MeanHours);
        Assert.Empty(estimate.Over);
    }

    private static NetworkSolution Solve(string yaml) => NetworkSolver.Solve(TestNetworks.Parse(yaml));

    private static JourneyEstimate Single(NetworkSolution solution) => Assert.Single(JourneyFormula.Estimate(solution));
}
