namespace NetSolve.Tests.Simulation;

public sealed class ExactMmcTests
{
    [Fact]
    public void The_95th_percentile_of_time_in_one_server_at_half_load_with_one_hour_service_is_ln_20_over_half_an_hour()
    {
        var exact = ExactMmc.Of(1, 0.5, 1.0);

        // Exact by hand: the M/M/1 time in unit is exponential with rate μ − λ = 0.5/h, so its 95th percentile is ln(20)/0.5.
        Assert.Equal(Math.Log(20.0) / 0.5, exact.TimeInUnitQuantileHours(0.95), 1e-9);
        Assert.Equal(1.0, exact.MeanWaitHours, 1e-12);
    }

    [Fact]
    public void Two_servers_at_utilisation_one_half_wait_with_probability_one_third()
    {
        var exact = ExactMmc.Of(2, 1.0, 1.0);

        // Exact by hand: Erlang C for c = 2, a = 1 is (1/2 · 2) / (1 + 1 + 1) = 1/3; the mean wait (1/3) / (2 − 1) h.
        Assert.Equal(1.0 / 3.0, exact.WaitProbability, 1e-12);
        Assert.Equal(1.0 / 3.0, exact.MeanWaitHours, 1e-12);

        // Exact by hand: θ = cμ − λ = 1 = μ, so given a wait the time in unit is Erlang-2: at t = 1 h,
        // P(T > 1) = (2/3)·e^(−1) + (1/3)·2·e^(−1) = (4/3)·e^(−1).
        Assert.Equal(4.0 / 3.0 * Math.Exp(-1.0), exact.TimeInUnitOver(1.0), 1e-12);
    }
}
