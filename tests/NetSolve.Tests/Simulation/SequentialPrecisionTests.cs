using NetSolve.Simulation;

namespace NetSolve.Tests.Simulation;

public sealed class SequentialPrecisionTests
{
    /// <summary>An M/M/1 unit at utilisation 0.5 with one-hour service, four weeks a replication: fast, and noisy enough to need more replications for 3%.</summary>
    private static readonly SimulationOptions Short = new()
    {
        Replications = 5,
        WarmupHours = 24.0,
        DurationHours = 28 * 24,
        Precision = 0.03,
        MaxReplications = 400,
    };

    [Fact]
    public void A_run_asked_for_a_precision_adds_replications_until_every_key_mean_reaches_it()
    {
        var network = TestNetworks.Single(TestNetworks.Unit("clinic", 1, 1.0), 0.5);

        var result = Simulator.Run(network, Short, cancellation: TestContext.Current.CancellationToken);

        Assert.True(result.PrecisionReached);
        Assert.True(result.Options.Replications > Short.Replications, "no replication was added");
        Assert.Equal(result.Options.Replications, result.ReplicationsFinished);
        var unit = result.Units[0];

        // Source: Law, Simulation Modeling and Analysis, 5th ed., 2015, chapter 9: the procedure stops once the
        // half-width is at most γ / (1 + γ) of the mean.
        double target = 0.03 / 1.03;
        Assert.True(unit.MeanWaitHours.HalfWidth <= target * unit.MeanWaitHours.Mean, "mean wait");
        Assert.True(unit.MeanInUnit.HalfWidth <= target * unit.MeanInUnit.Mean, "mean in unit");
        Assert.True(result.WorstRelativeHalfWidth <= target);
    }

    [Fact]
    public void A_run_that_meets_its_bound_on_effort_first_says_the_precision_was_not_reached()
    {
        var network = TestNetworks.Single(TestNetworks.Unit("clinic", 1, 1.0), 0.5);

        var result = Simulator.Run(network, Short with { MaxReplications = 8 }, cancellation: TestContext.Current.CancellationToken);

        Assert.False(result.PrecisionReached);
        Assert.Equal(8, result.ReplicationsFinished);
        Assert.True(result.WorstRelativeHalfWidth > 0.03 / 1.03);
    }

    [Fact]
    public void The_count_a_precision_stops_at_does_not_depend_on_the_thread_count()
    {
        var network = TestNetworks.Single(TestNetworks.Unit("clinic", 1, 1.0), 0.5);
        var token = TestContext.Current.CancellationToken;

        var one = Simulator.Run(network, Short with { MaxDegreeOfParallelism = 1 }, cancellation: token);
        var all = Simulator.Run(network, Short, cancellation: token);

        Assert.Equal(one.ReplicationsFinished, all.ReplicationsFinished);
        Assert.Equal(TestNetworks.Flatten(one), TestNetworks.Flatten(all));
    }

    [Fact]
    public void Without_a_precision_the_run_makes_exactly_the_replications_asked()
    {
        var network = TestNetworks.Single(TestNetworks.Unit("clinic", 1, 1.0), 0.5);

        var result = Simulator.Run(network, Short with { Precision = null }, cancellation: TestContext.Current.CancellationToken);

        Assert.Equal(5, result.ReplicationsFinished);
        Assert.Null(result.PrecisionReached);
    }
}
