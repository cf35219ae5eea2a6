using NetSolve.Simulation;

namespace NetSolve.Tests.Simulation;

public sealed class DeterminismTests
{
    private static readonly SimulationOptions Short = new() { Seed = 99, Replications = 6, WarmupHours = 50, DurationHours = 2_000 };

    [Fact]
    public void The_same_seed_gives_identical_results_whatever_the_number_of_threads()
    {
        var network = TestNetworks.SmallJackson();
        var token = TestContext.Current.CancellationToken;

        var one = TestNetworks.Flatten(Simulator.Run(network, Short with { MaxDegreeOfParallelism = 1 }, cancellation: token));
        var two = TestNetworks.Flatten(Simulator.Run(network, Short with { MaxDegreeOfParallelism = 2 }, cancellation: token));
        var all = TestNetworks.Flatten(Simulator.Run(network, Short, cancellation: token));

        Assert.Equal(one, two);
        Assert.Equal(one, all);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(50.0)]
    public void Taking_each_event_out_before_handling_it_simulates_the_same_patients_as_replacing_it_in_place(double warmupHours)
    {
        // Source: exact by construction. Large networks take each event out of the queue before handling it (so that
        // the next one can be hinted ahead) and small ones keep it queued until the first event it schedules takes its
        // slot; both leave every event in the same slot, so they must simulate the same patients, bit for bit.
        var network = TestNetworks.SmallJackson();
        var compiled = CompiledNetwork.Compile(network);
        var layout = new MetricLayout(network.Units.Length, 0, network.Groups.Length);
        var inPlace = new SimulationEngine(compiled, layout, [], warmupHours, 3_000.0, 7, 0, hintMemory: false);
        var takenOut = new SimulationEngine(compiled, layout, [], warmupHours, 3_000.0, 7, 0, hintMemory: true);
        Assert.True(inPlace.Run(null, TestContext.Current.CancellationToken));
        Assert.True(takenOut.Run(null, TestContext.Current.CancellationToken));

        Assert.True(inPlace.EventCount > 10_000);
        Assert.Equal(inPlace.EventCount, takenOut.EventCount);
        Assert.Equal(inPlace.ResultRow(), takenOut.ResultRow());
    }

    [Fact]
    public void A_different_seed_gives_different_results()
    {
        var network = TestNetworks.SmallJackson();
        var token = TestContext.Current.CancellationToken;

        var first = TestNetworks.Flatten(Simulator.Run(network, Short, cancellation: token));
        var second = TestNetworks.Flatten(Simulator.Run(network, Short with { Seed = 100 }, cancellation: token));

        Assert.NotEqual(first, second);
    }

    [Fact]
    public void A_single_replication_replays_exactly_and_has_no_interval()
    {
        var network = TestNetworks.SmallJackson();
        var token = TestContext.Current.CancellationToken;

        var single = Simulator.Run(network, Short with { Replications = 1 }, cancellation: token);
        var again = Simulator.Run(network, Short with { Replications = 1, MaxDegreeOfParallelism = 1 }, cancellation: token);

        Assert.Equal(single.Events, again.Events);
        Assert.Equal(single.Units[0].Utilisation.Mean, again.Units[0].Utilisation.Mean);
        Assert.Null(single.Units[0].Utilisation.HalfWidth);
    }

    [Fact]
    public void A_run_cancelled_before_it_starts_reports_no_finished_replication()
    {
        using var cancelled = new CancellationTokenSource();
        cancelled.Cancel();

        var result = Simulator.Run(TestNetworks.SmallJackson(), Short, cancellation: cancelled.Token);

        Assert.Equal(0, result.ReplicationsFinished);
        Assert.False(result.IsComplete);
        Assert.Null(result.Totals);
        Assert.Empty(result.Units);
    }

    [Fact]
    public void Progress_reaches_one_when_every_replication_finishes()
    {
        var reports = new List<double>();
        var progress = new SynchronousProgress(reports);

        Simulator.Run(TestNetworks.SmallJackson(), Short with { MaxDegreeOfParallelism = 1 }, progress, TestContext.Current.CancellationToken);

        Assert.NotEmpty(reports);
        Assert.Equal(1.0, reports[^1], 12);
        Assert.All(reports, fraction => Assert.InRange(fraction, 0.0, 1.0));
    }

    [Fact]
    public void Options_out_of_range_are_refused_with_their_name()
    {
        var network = TestNetworks.SmallJackson();

        Assert.Throws<ArgumentException>("Replications", () => Simulator.Run(network, Short with { Replications = 0 }, cancellation: TestContext.Current.CancellationToken));
        Assert.Throws<ArgumentException>("DurationHours", () => Simulator.Run(network, Short with { DurationHours = 0 }, cancellation: TestContext.Current.CancellationToken));
        Assert.Throws<ArgumentException>("WarmupHours", () => Simulator.Run(network, Short with { WarmupHours = double.NaN }, cancellation: TestContext.Current.CancellationToken));
        Assert.Throws<ArgumentException>("WaitThresholdsHours", () => Simulator.Run(network, Short with { WaitThresholdsHours = [-1.0] }, cancellation: TestContext.Current.CancellationToken));
    }

    private sealed class SynchronousProgress(List<double> reports) : IProgress<double>
    {
        public void Report(double value)
        {
            lock (reports)
            {
                reports.Add(value);
            }
        }
    }
}
