using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Overflow;

public sealed class OverflowQueueTests
{
    [Theory]
    [InlineData(1, 0.7)]
    [InlineData(4, 3.0)]
    [InlineData(30, 25.0)]
    public void Poisson_arrivals_alone_give_the_erlang_c_wait(int servers, double arrivalsPerHour)
    {
        // Source: Erlang C, M/M/c (Gross & Harris, Fundamentals of Queueing Theory): Wq = C(c, a)/(cμ − λ), μ = 1.
        var result = OverflowQueue.Solve(servers, 1.0, arrivalsPerHour, []);
        Assert.NotNull(result);
        double c = ErlangFormulas.WaitProbability(servers, arrivalsPerHour);
        Assert.Equal(c / (servers - arrivalsPerHour), result.MeanWaitHours, 1e-9);
        Assert.Equal(c, result.WaitProbability, 1e-9);
    }

    [Fact]
    public void A_stream_that_never_switches_off_is_a_poisson_stream()
    {
        // Exact by hand: with ω₁ = 0 the stream is on for ever, so the unit is M/M/4 at 1.5 + 2 = 3.5 per hour.
        var result = OverflowQueue.Solve(4, 1.0, 1.5, [new InterruptedPoisson(2.0, 0.0, 1.0)]);
        Assert.NotNull(result);
        double c = ErlangFormulas.WaitProbability(4, 3.5);
        Assert.Equal(c / 0.5, result.MeanWaitHours, 1e-8);
    }

    [Fact]
    public void The_queue_fed_by_an_interrupted_stream_matches_its_joint_chain_solved_directly()
    {
        // Exact by hand: the same chain (level = patients present, phase = stream on or off) truncated at 120 levels and
        // solved by Gauss-Seidel in the test; the truncated mass is negligible at this load.
        var stream = new InterruptedPoisson(7.5, 4.0, 0.04);
        var result = OverflowQueue.Solve(4, 1.2, 1.5, [stream]);
        Assert.NotNull(result);
        var (wait, waitProbability) = DirectChain.Solve(4, 1.2, 1.5, stream, 120);
        Assert.Equal(wait, result.MeanWaitHours, 1e-8);
        Assert.Equal(waitProbability, result.WaitProbability, 1e-8);
        // From memory: bursts lengthen waits against Poisson arrivals at the same mean rate (Wilkinson 1956).
        double c = ErlangFormulas.WaitProbability(4, (1.5 + stream.MeanPerHour) / 1.2);
        Assert.True(result.MeanWaitHours > 1.3 * c / ((4 * 1.2) - 1.5 - stream.MeanPerHour));
    }

    [Fact]
    public void Two_streams_are_solved_on_the_product_of_their_phases()
    {
        // Exact by hand: two identical streams with ω₁ = 0 are always on: M/M/3 at 0.5 + 2 × 0.8 = 2.1 per hour.
        var on = new InterruptedPoisson(0.8, 0.0, 2.0);
        var result = OverflowQueue.Solve(3, 1.0, 0.5, [on, on]);
        Assert.NotNull(result);
        Assert.Equal(ErlangFormulas.WaitProbability(3, 2.1) / 0.9, result.MeanWaitHours, 1e-8);
    }

    [Fact]
    public void An_overloaded_unit_has_no_result()
    {
        // Exact by hand: mean arrivals 3 + 7.5·0.5 ≥ 4 servers × 1 per hour.
        Assert.Null(OverflowQueue.Solve(4, 1.0, 3.0, [new InterruptedPoisson(7.5, 1.0, 1.0)]));
    }
}
