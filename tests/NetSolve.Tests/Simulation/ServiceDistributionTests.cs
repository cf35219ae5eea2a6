using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Simulation;

namespace NetSolve.Tests.Simulation;

public sealed class ServiceDistributionTests
{
    private static readonly SimulationOptions LongRun = new() { Seed = 11, Replications = 10, WarmupHours = 500, DurationHours = 50_000 };

    /// <summary>Pollaczek–Khinchine mean wait of M/G/1: Wq = λ·E[S²] / (2(1 − ρ)) (Gross and Harris, Fundamentals of Queueing Theory, ch. 5).</summary>
    private static double PollaczekKhinchineWait(double arrivalsPerHour, double meanService, double secondMoment) =>
        arrivalsPerHour * secondMoment / (2.0 * (1.0 - (arrivalsPerHour * meanService)));

    [Fact]
    public void Deterministic_single_server_waits_as_Pollaczek_Khinchine_says_for_MD1()
    {
        // Source: Pollaczek–Khinchine for M/D/1, Wq = ρ/(2μ(1 − ρ)); exact by hand: λ = 0.8, service 1 h gives 2 h.
        var unit = TestNetworks.Unit("scanner", 1, 1.0) with { Service = ServiceDistribution.Deterministic(1.0) };

        var result = Simulator.Run(TestNetworks.Single(unit, 0.8), LongRun, cancellation: TestContext.Current.CancellationToken);

        var wait = result.Units[0].MeanWaitHours;
        Assert.True(wait.Contains(2.0), FormattableString.Invariant($"simulated {wait.Mean} ± {wait.HalfWidth}"));
        // Source: exact by hand. M/M/1 at the same load waits ρ/(μ(1 − ρ)) = 4 h: the interval must exclude it.
        Assert.False(wait.Contains(4.0));
    }

    // Source: exact by hand from each distribution's moments, E[S²] = mean²(1 + cv²); the empirical list 0.5, 1, 1.5
    // has mean 1 and E[S²] = (0.25 + 1 + 2.25)/3 = 7/6.
    [Theory]
    [InlineData(ServiceKind.Lognormal, 0.5, 1.25)]
    [InlineData(ServiceKind.Gamma, 2.0, 5.0)]
    [InlineData(ServiceKind.Gamma, 0.5, 1.25)]
    [InlineData(ServiceKind.Exponential, 1.0, 2.0)]
    [InlineData(ServiceKind.Empirical, double.NaN, 7.0 / 6.0)]
    public void Each_service_distribution_gives_the_Pollaczek_Khinchine_wait(ServiceKind kind, double cv, double secondMoment)
    {
        var service = kind switch
        {
            ServiceKind.Lognormal => ServiceDistribution.Lognormal(1.0, cv),
            ServiceKind.Gamma => ServiceDistribution.Gamma(1.0, cv),
            ServiceKind.Empirical => ServiceDistribution.Empirical([0.5, 1.0, 1.5]),
            _ => ServiceDistribution.Exponential(1.0),
        };
        var unit = TestNetworks.Unit("theatre", 1, 1.0) with { Service = service };
        double arrivals = 0.6;

        var result = Simulator.Run(TestNetworks.Single(unit, arrivals), LongRun, cancellation: TestContext.Current.CancellationToken);

        double expected = PollaczekKhinchineWait(arrivals, 1.0, secondMoment);
        Bonferroni.AssertAllInside(
        [
            ("mean wait", result.Units[0].MeanWaitHours, expected),
            ("mean time in unit", result.Units[0].MeanTimeInUnitHours, expected + 1.0),
            ("utilisation", result.Units[0].Utilisation, arrivals),
        ]);
    }

    [Fact]
    public void A_group_with_its_own_service_time_mixes_into_the_Pollaczek_Khinchine_wait()
    {
        // Source: exact by hand. Default patients 0.3/h with exponential 1 h, a group 0.1/h with exponential 4 h: the
        // unit sees M/G/1 with λ = 0.4, ρ = 0.7 and E[S²] = (0.3·2·1 + 0.1·2·16)/0.4 = 9.5, so Wq = 0.4·9.5/0.6.
        var unit = TestNetworks.Unit("clinic", 1, 1.0);
        var group = new PatientGroup("complex", "Complex cases", [new Arrival("clinic", 0.1)])
        {
            Services = [new GroupService("clinic", ServiceDistribution.Exponential(4.0))],
        };
        var network = TestNetworks.Single(unit, 0.3) with { Groups = [group] };
        var options = LongRun with { DurationHours = 100_000 };

        var result = Simulator.Run(network, options, cancellation: TestContext.Current.CancellationToken);

        double wait = 0.4 * 9.5 / 0.6;
        Bonferroni.AssertAllInside(
        [
            ("mean wait", result.Units[0].MeanWaitHours, wait),
            ("utilisation", result.Units[0].Utilisation, 0.7),
            ("group throughput", result.Groups[0].ThroughputPerHour, 0.1),
            ("group time in network", result.Groups[0].MeanTimeInSystemHours!.Value, wait + 4.0),
        ]);
    }

    [Fact]
    public void A_v1_service_cv_other_than_1_means_gamma_and_0_means_deterministic()
    {
        // Source: the network file contract gives service_cv its full meaning in simulation; the choice of gamma is ours.
        Assert.Equal(ServiceKind.Gamma, new Unit("a", "a", Servers.Of(1), 2.0, 0.5).EffectiveService.Kind);
        Assert.Equal(ServiceKind.Deterministic, new Unit("a", "a", Servers.Of(1), 2.0, 0.0).EffectiveService.Kind);
        Assert.Equal(ServiceKind.Exponential, new Unit("a", "a", Servers.Of(1), 2.0).EffectiveService.Kind);
    }

    [Fact]
    public void An_empirical_distribution_takes_the_mean_and_population_cv_of_its_samples()
    {
        // Source: exact by hand. 1, 2, 3 has mean 2 and population standard deviation √(2/3).
        var service = ServiceDistribution.Empirical(ImmutableArray.Create(1.0, 2.0, 3.0));

        Assert.Equal(2.0, service.MeanHours, 12);
        Assert.Equal(Math.Sqrt(2.0 / 3.0) / 2.0, service.Cv, 12);
    }
}
