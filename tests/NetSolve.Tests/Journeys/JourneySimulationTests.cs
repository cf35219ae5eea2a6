using NetSolve.Simulation;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Journeys;

public sealed class JourneySimulationTests
{
    private static readonly SimulationOptions Options = new() { Seed = 20261202, Replications = 8, WarmupHours = 50, DurationHours = 4_000 };

    // From memory: Kleinrock, Queueing Systems, Volume 1: Theory, Wiley, 1975, section 3.2: the time in an M/M/1
    // system is exponential with rate μ − λ = 1 here (λ = 2, μ = 3): mean 1 h, P(T > 2 h) = e^(−2), median ln 2.
    [Fact]
    public void Simulated_journeys_through_one_MM1_unit_match_the_exponential_time_in_system()
    {
        var journey = Single(Run("""
            units:
              clinic: { servers: 1, service: 20min }
            arrivals:
              clinic: 2
            journeys:
              visit: { units: [clinic], over: [2h] }
            """));

        Assert.True(journey.MeanHours!.Value.Contains(1.0), $"mean {journey.MeanHours}");
        Assert.True(journey.Over[0].Probability.Contains(Math.Exp(-2.0)), $"P(T > 2h) {journey.Over[0].Probability}");
        Assert.True(journey.Percentiles[0].Hours!.Value.Contains(Math.Log(2.0)), $"median {journey.Percentiles[0].Hours}");
        Assert.True(journey.PerHour.Contains(2.0), $"per hour {journey.PerHour}");
    }

    // From memory: Burke, "The output of a queuing system", Operations Research 4(6), 1956, 699-704: in a tandem of
    // M/M/1 units the sojourns are independent exponentials (rates 1 and 2 here), P(T > 3 h) = 2e^(−3) − e^(−6).
    [Fact]
    public void Simulated_journeys_through_a_tandem_match_the_sum_of_independent_exponentials()
    {
        var journey = Single(Run("""
            units:
              triage: { servers: 1, service: 30min }
              treatment: { servers: 1, service: 20min }
            arrivals:
              triage: 1
            routes:
              triage: { treatment: 1.0 }
            journeys:
              stay: { units: [triage, treatment], over: [3h] }
            """));

        Assert.True(journey.MeanHours!.Value.Contains(1.5), $"mean {journey.MeanHours}");
        Assert.True(journey.Over[0].Probability.Contains((2.0 * Math.Exp(-3.0)) - Math.Exp(-6.0)), $"P(T > 3h) {journey.Over[0].Probability}");
    }

    // Exact by hand: every patient visits 'assessment', goes to the ward, and half come back to 'assessment'; a return
    // after leaving the set starts a new journey, so journeys per hour are the visits, 1 / (1 − 0.5) × 2 = 4 per hour, and each
    // journey is one visit of exactly 1 h (fixed service, unlimited servers: no wait).
    [Fact]
    public void A_patient_who_comes_back_into_the_set_starts_a_new_journey()
    {
        var journey = Single(Run("""
            units:
              assessment: { servers: unlimited, service: 1h, service_distribution: deterministic }
              ward: { servers: unlimited, service: 5h }
            arrivals:
              assessment: 2
            routes:
              assessment: { ward: 1.0 }
              ward: { assessment: 0.5 }
            journeys:
              stay: { units: [assessment] }
            """));

        Assert.True(journey.PerHour.Contains(4.0), $"per hour {journey.PerHour}");
        Assert.Equal(1.0, journey.MeanHours!.Value.Mean, 1e-9);
    }

    [Fact]
    public void A_network_without_journeys_reports_none()
    {
        var result = Simulator.Run(TestNetworks.Parse("units:\n  clinic: { servers: 1, service: 20min }\narrivals:\n  clinic: 2\n"), Options with { DurationHours = 100 }, cancellation: TestContext.Current.CancellationToken);

        Assert.Empty(result.Journeys);
    }

    [Fact]
    public void Each_patient_group_gets_its_own_journey_figures_after_those_for_every_patient()
    {
        var result = Run("""
            units:
              emergency: { servers: unlimited, service: 1h, service_distribution: deterministic }
              lab: { servers: unlimited, service: 30min, service_distribution: deterministic }
            arrivals:
              emergency: 1
            routes:
              emergency: { lab: 1.0 }
            groups:
              walk_in:
                arrivals: { emergency: 1 }
                routes: {}
            journeys:
              stay: { units: [emergency, lab] }
            """);

        Assert.Equal(2, result.Journeys.Length);
        Assert.Null(result.Journeys[0].Group);
        Assert.Equal("walk_in", result.Journeys[1].Group!.Id);
        Assert.Equal(1.0, result.Journeys[1].MeanHours!.Value.Mean, 1e-9);
        Assert.Equal(1.25, result.Journeys[0].MeanHours!.Value.Mean, 0.05);
    }

    private static SimulationResult Run(string yaml) =>
        Simulator.Run(TestNetworks.Parse(yaml), Options, cancellation: TestContext.Current.CancellationToken);

    private static SimulatedJourney Single(SimulationResult result) => Assert.Single(result.Journeys);
}
