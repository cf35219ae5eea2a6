using NetSolve.Model;
using NetSolve.Simulation;

namespace NetSolve.Tests.Simulation;

public sealed class FiniteCapacityTests
{
    private static readonly SimulationOptions LongRun = new() { Seed = 5, Replications = 10, WarmupHours = 100, DurationHours = 20_000 };

    /// <summary>
    /// Steady-state probabilities of M/M/c/K (Gross, Shortle, Thompson and Harris, Fundamentals of Queueing Theory,
    /// 4th ed., section 2.5): p_n = a^n/n! · p0 for n &lt; c and a^n/(c!·c^(n−c)) · p0 for c ≤ n ≤ K, with a = λ/μ.
    /// </summary>
    /// <remarks>The loop forms each p_n from p_(n−1) by the ratio a/min(n, c), which is the same closed form without powers.</remarks>
    private static double[] MmckProbabilities(int servers, int capacity, double offeredLoad)
    {
        var p = new double[capacity + 1];
        p[0] = 1.0;
        for (int n = 1; n <= capacity; n++)
        {
            p[n] = p[n - 1] * offeredLoad / Math.Min(n, servers);
        }

        double total = p.Sum();
        return [.. p.Select(value => value / total)];
    }

    [Theory]
    [InlineData(2, 5, 3.0)]
    [InlineData(1, 3, 0.8)]
    [InlineData(4, 4, 3.0)]
    public void Blocking_and_occupancy_match_the_MMcK_closed_form(int servers, int capacity, double arrivalsPerHour)
    {
        var unit = TestNetworks.Unit("resus", servers, 1.0) with { Capacity = capacity };
        var network = TestNetworks.Single(unit, arrivalsPerHour);
        double[] p = MmckProbabilities(servers, capacity, arrivalsPerHour * 1.0);
        double blocking = p[capacity];
        double inUnit = p.Select((probability, n) => n * probability).Sum();
        double queue = p.Select((probability, n) => Math.Max(0, n - servers) * probability).Sum();

        var result = Simulator.Run(network, LongRun, cancellation: TestContext.Current.CancellationToken);

        var resus = result.Units[0];
        Bonferroni.AssertAllInside(
        [
            ("P(full)", resus.FullProbability, blocking),
            ("turned away per hour", resus.TurnedAwayPerHour, arrivalsPerHour * blocking),
            ("mean in unit", resus.MeanInUnit, inUnit),
            ("mean queue", resus.MeanQueue, queue),
        ]);
    }

    [Fact]
    public void A_full_unit_diverts_at_the_Erlang_B_rate_and_nobody_is_lost()
    {
        // Source: exact by hand. One cubicle with capacity 1 is M/M/1/1, an Erlang loss system: a = 0.5 gives
        // B = a/(1 + a) = 1/3, so 0.5 · 1/3 patients per hour are diverted to the unlimited overflow unit.
        var cubicle = TestNetworks.Unit("cubicle", 1, 1.0) with { Capacity = 1, WhenFull = WhenFull.DivertTo("overflow") };
        var overflow = new Unit("overflow", "overflow", Servers.Unlimited, 1.0);
        var network = TestNetworks.Build([cubicle, overflow], [new Arrival("cubicle", 0.5)]);

        var result = Simulator.Run(network, LongRun, cancellation: TestContext.Current.CancellationToken);

        Bonferroni.AssertAllInside(
        [
            ("P(full)", result.Units[0].FullProbability, 1.0 / 3.0),
            ("diverted per hour", result.Units[0].DivertedPerHour, 0.5 / 3.0),
            ("overflow arrivals", result.Units[1].ArrivalsPerHour, 0.5 / 3.0),
            ("throughput", result.Totals!.ThroughputPerHour, 0.5),
        ]);
        Assert.Equal(0.0, result.Totals.TurnedAwayPerHour.Mean);
    }
}
