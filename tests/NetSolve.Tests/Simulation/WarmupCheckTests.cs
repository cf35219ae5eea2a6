using System.Globalization;
using NetSolve.Simulation;

namespace NetSolve.Tests.Simulation;

public sealed class WarmupCheckTests
{
    private const double Day = 24.0;

    [Fact]
    public void A_slow_unit_started_empty_with_no_warm_up_is_flagged_by_mser()
    {
        // M/M/1 at 0.9 with 1-hour service relaxes in about 16 days (Abate and Whitt, Queueing Systems 2, 1987): with
        // no warm-up the first weeks of the run are the climb from empty.
        var network = TestNetworks.Single(TestNetworks.Unit("unit", 1, 1.0), 0.9);
        var options = new SimulationOptions { Seed = 3, WarmupHours = 0.0, DurationHours = 364 * Day };

        var result = Simulator.Run(network, options, cancellation: TestContext.Current.CancellationToken);

        Assert.True(result.IsWarmupShortByMser, string.Create(CultureInfo.InvariantCulture, $"MSER-5 cut at {result.MserTruncationHours} h"));
    }

    [Fact]
    public void The_planned_warm_up_of_the_same_unit_passes_the_mser_check()
    {
        // Five relaxation times of about 16 days, in whole weeks: 84 days (docs/simulation.md, Coverage table).
        var network = TestNetworks.Single(TestNetworks.Unit("unit", 1, 1.0), 0.9);
        var options = new SimulationOptions { Seed = 3, WarmupHours = 84 * Day, DurationHours = 364 * Day };

        var result = Simulator.Run(network, options, cancellation: TestContext.Current.CancellationToken);

        Assert.False(result.IsWarmupShortByMser, string.Create(CultureInfo.InvariantCulture, $"MSER-5 cut at {result.MserTruncationHours} h"));
    }

    [Fact]
    public void The_series_averaged_over_replications_is_cut_where_its_transient_ends()
    {
        // Exact by hand: 1,000 points, the first 100 at 10 and the rest alternating +1/-1 by batch of 5, the same in
        // both replications: MSER-5 discards the 20 batches of the transient, 100 of 1,000 points of a 1,000-hour run.
        var series = Enumerable.Range(0, 1000).Select(i => i < 100 ? 10.0 : ((i / 5) % 2 == 0 ? 1.0 : -1.0)).ToList();

        Assert.Equal(100.0, WarmupCheck.TruncationHours([series, series], 1000.0));
    }
}
