using NetSolve.Model;
using NetSolve.Simulation;

namespace NetSolve.Tests.Simulation;

public sealed class ArrivalProfileTests
{
    [Fact]
    public void Multipliers_are_normalised_to_average_one_and_combine_hour_and_day()
    {
        // Source: exact by hand. Hour multipliers 2 for 12 hours and 0 for 12 average 1 already; day multipliers 1..7
        // average 4, so Monday (first) becomes 0.25 and Sunday 1.75.
        var hours = Enumerable.Range(0, 24).Select(h => h < 12 ? 2.0 : 0.0);
        var profile = ArrivalProfile.Create(hours, [1, 2, 3, 4, 5, 6, 7]);

        Assert.Equal(2.0 * 0.25, profile.MultiplierAt(3.5), 12);
        Assert.Equal(0.0, profile.MultiplierAt(13.0), 12);
        Assert.Equal(2.0 * 1.75, profile.MultiplierAt((6 * 24) + 0.5), 12);
        Assert.Equal(2.0 * 1.75, profile.MaxMultiplier, 12);
    }

    [Fact]
    public void A_profile_needs_24_hour_values_not_all_zero()
    {
        Assert.Throws<ArgumentException>("hourOfDay", () => ArrivalProfile.Create(new double[23]));
        Assert.Throws<ArgumentException>("hourOfDay", () => ArrivalProfile.Create(new double[24]));
        Assert.Throws<ArgumentException>("dayOfWeek", () => ArrivalProfile.Create(Enumerable.Repeat(1.0, 24), [1, 1]));
    }

    [Fact]
    public void Thinned_arrivals_keep_the_mean_rate_and_arrive_only_in_open_hours()
    {
        // Source: exact by hand. Arrivals only from 08:00 to 20:00 at twice the mean keep the daily mean of 2/h;
        // a deterministic 30 min service in an unlimited unit means nobody is present from 20:30 to 08:00, and
        // the mean number present over the day is λ·E[S] = 1 (Little's law).
        var hours = Enumerable.Range(0, 24).Select(h => h is >= 8 and < 20 ? 1.0 : 0.0);
        var unit = new Unit("clinic", "clinic", Servers.Unlimited, 0.5) { Service = ServiceDistribution.Deterministic(0.5) };
        var network = TestNetworks.Single(unit, 2.0) with { ArrivalProfile = ArrivalProfile.Create(hours) };
        var options = new SimulationOptions { Seed = 8, Replications = 8, WarmupHours = 24, DurationHours = 24 * 200 };

        var result = Simulator.Run(network, options, cancellation: TestContext.Current.CancellationToken);

        Bonferroni.AssertAllInside(
        [
            ("entered per hour", result.Totals!.EnteredPerHour, 2.0),
            ("mean in unit", result.Units[0].MeanInUnit, 1.0),
        ]);
    }

    [Fact]
    public void Queues_by_hour_follow_the_arrival_peak()
    {
        // Source: by reasoning from the model, no formula. A single server at mean load 0.5 that gets all its patients
        // from 08:00 to 20:00 runs at load 1 while open, so its queue builds through the day; with no arrivals after
        // 20:00 and 4 services an hour it clears 28 patients by 03:00, so a queue is left then only on the rare days
        // when more were waiting at 20:00 (at load 1 the queue after 12 hours has a spread of about 10 patients).
        var hours = Enumerable.Range(0, 24).Select(h => h is >= 8 and < 20 ? 1.0 : 0.0);
        var unit = TestNetworks.Unit("minor_injuries", 1, 0.25);
        var network = TestNetworks.Single(unit, 2.0) with { ArrivalProfile = ArrivalProfile.Create(hours) };
        var options = new SimulationOptions { Seed = 8, Replications = 4, WarmupHours = 24, DurationHours = 24 * 100 };

        var result = Simulator.Run(network, options, cancellation: TestContext.Current.CancellationToken).Units[0];
        var byHour = result.MeanQueueByHour;

        // Source: exact by hand. Over whole days each hour of the day is covered equally, so the mean of the 24
        // hourly means is the overall mean queue, replication by replication and so also on average.
        Assert.Equal(result.MeanQueue.Mean, byHour.Average(hour => hour!.Value.Mean), 9);
        Assert.True(byHour[17]!.Value.Mean > 1.0);
        Assert.InRange(byHour[3]!.Value.Mean, 0.0, 0.05);
        Assert.True(byHour[17]!.Value.Mean > byHour[9]!.Value.Mean);
    }
}
