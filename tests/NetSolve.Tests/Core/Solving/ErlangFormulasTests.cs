using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving;

public partial class ErlangFormulasTests
{
    private const double Exact = 1e-12;

    // From memory: the standard Erlang B table at 1% blocking (traffic tables printed in teletraffic textbooks and
    // telephone-engineering handbooks), rows c = 1, 2, 5, 10, 20, 50, 100, loads rounded to three decimals.
    [Theory]
    [InlineData(1, 0.0101)]
    [InlineData(2, 0.153)]
    [InlineData(5, 1.361)]
    [InlineData(10, 4.461)]
    [InlineData(20, 12.031)]
    [InlineData(50, 37.901)]
    [InlineData(100, 84.064)]
    public void The_Erlang_B_table_load_at_one_percent_blocking_is_matched_to_table_precision(int servers, double tableLoad)
    {
        // The table rounds the load to its last printed digit: the true load lies within half of that digit.
        double halfDigit = servers == 1 ? 0.00005 : 0.0005;
        Assert.True(ErlangFormulas.BlockingProbability(servers, tableLoad - halfDigit) < 0.01);
        Assert.True(ErlangFormulas.BlockingProbability(servers, tableLoad + halfDigit) > 0.01);
        Assert.Equal(0.01, ErlangFormulas.BlockingProbability(servers, tableLoad), 0.0002);
    }

    // Exact by hand: B(1, a) = a / (1 + a); B(2, 1) = (1/2) / (1 + 1 + 1/2) = 1/5; B(3, 2) = (8/6) / (1 + 2 + 2 + 8/6) = 4/19.
    [Theory]
    [InlineData(1, 1.0, 0.5)]
    [InlineData(1, 3.0, 0.75)]
    [InlineData(2, 1.0, 1.0 / 5.0)]
    [InlineData(3, 2.0, 4.0 / 19.0)]
    public void Erlang_B_matches_hand_derived_values(int servers, double offeredLoad, double blocking)
    {
        Assert.Equal(blocking, ErlangFormulas.BlockingProbability(servers, offeredLoad), Exact);
    }

    // Exact by hand: for M/M/1, C = rho, Lq = rho^2 / (1 - rho), W = 1 / (mu - lambda).
    [Theory]
    [InlineData(0.1)]
    [InlineData(0.5)]
    [InlineData(0.9)]
    [InlineData(0.99)]
    public void A_single_server_waits_with_probability_rho_and_matches_the_M_M_1_closed_forms(double rho)
    {
        const double servicePerHour = 4.0;
        double arrivalsPerHour = rho * servicePerHour;
        var unit = new NetSolve.Model.Unit("desk", "desk", NetSolve.Model.Servers.Of(1), 1.0 / servicePerHour);
        var result = UnitMetrics.Compute(unit, arrivalsPerHour, arrivalsPerHour);

        Assert.Equal(rho, ErlangFormulas.WaitProbability(1, rho), Exact);
        Assert.Equal(rho * rho / (1.0 - rho), result.MeanQueue!.Value, 1e-9);
        Assert.Equal(1.0 / (servicePerHour - arrivalsPerHour), result.MeanTimeInUnitHours!.Value, 1e-9);
        Assert.Equal(rho / (1.0 - rho), result.MeanInUnit!.Value, 1e-9);
    }

    // Exact by hand: for M/M/2 with rho = a / 2, B = (a^2/2) / (1 + a + a^2/2) and C = B / (1 - rho(1 - B))
    // simplify to C = 2 rho^2 / (1 + rho); then Lq = C rho / (1 - rho) = 2 rho^3 / (1 - rho^2).
    [Theory]
    [InlineData(0.25)]
    [InlineData(0.5)]
    [InlineData(0.8)]
    [InlineData(0.95)]
    public void Two_servers_wait_with_probability_two_rho_squared_over_one_plus_rho(double rho)
    {
        var unit = new NetSolve.Model.Unit("pair", "pair", NetSolve.Model.Servers.Of(2), 1.0);
        var result = UnitMetrics.Compute(unit, 2.0 * rho, 2.0 * rho);

        Assert.Equal(2.0 * rho * rho / (1.0 + rho), ErlangFormulas.WaitProbability(2, 2.0 * rho), Exact);
        Assert.Equal(2.0 * rho * rho * rho / (1.0 - (rho * rho)), result.MeanQueue!.Value, 1e-9);
    }

    // Exact by hand: c = 3, a = 2 (rho = 2/3): B = 4/19, C = (4/19) / (1 - (2/3)(15/19)) = 4/9,
    // Lq = C rho / (1 - rho) = 8/9, Wq = Lq / lambda = 4/9 h at lambda = 2/h, mu = 1/h.
    [Fact]
    public void Three_servers_at_two_erlangs_wait_four_ninths_of_the_time()
    {
        var unit = new NetSolve.Model.Unit("bay", "bay", NetSolve.Model.Servers.Of(3), 1.0);
        var result = UnitMetrics.Compute(unit, 2.0, 2.0);

        Assert.Equal(4.0 / 9.0, result.WaitProbability, Exact);
        Assert.Equal(8.0 / 9.0, result.MeanQueue!.Value, Exact);
        Assert.Equal(4.0 / 9.0, result.MeanWaitHours!.Value, Exact);
        Assert.Equal(2.0 + (8.0 / 9.0), result.MeanInUnit!.Value, Exact);
    }

    // Exact by hand: P(Wq > t) = C exp(-(c mu - lambda) t); c = 3, a = 2, mu = 1/h, t = 0.5 h gives (4/9) e^(-1/2).
    [Fact]
    public void The_waiting_time_tail_decays_exponentially_at_the_spare_service_rate()
    {
        Assert.Equal(4.0 / 9.0 * Math.Exp(-0.5), ErlangFormulas.WaitLongerThan(3, 2.0, 1.0, 0.5), Exact);
        Assert.Equal(4.0 / 9.0, ErlangFormulas.WaitLongerThan(3, 2.0, 1.0, 0.0), Exact);
    }

    // Common practice: the design card asks for c = 100,000 at rho = 0.9999 without overflow or NaN.
    [Fact]
    public void One_hundred_thousand_servers_at_rho_0_9999_give_a_finite_probability()
    {
        double wait = ErlangFormulas.WaitProbability(100_000, 99_990.0);
        double blocking = ErlangFormulas.BlockingProbability(100_000, 99_990.0);

        Assert.True(double.IsFinite(wait) && wait is > 0.0 and <= 1.0, FormattableString.Invariant($"P(wait) = {wait}"));
        Assert.True(double.IsFinite(blocking) && blocking is > 0.0 and < 1.0, FormattableString.Invariant($"B = {blocking}"));
        Assert.True(wait > blocking);
    }

    [Fact]
    public void An_overloaded_unit_makes_every_patient_wait()
    {
        Assert.Equal(1.0, ErlangFormulas.WaitProbability(4, 4.0));
        Assert.Equal(1.0, ErlangFormulas.WaitProbability(4, 9.5));
    }

    [Fact]
    public void Bad_arguments_are_refused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => ErlangFormulas.BlockingProbability(0, 1.0));
        Assert.Throws<ArgumentOutOfRangeException>(() => ErlangFormulas.BlockingProbability(2, double.NaN));
        Assert.Throws<ArgumentOutOfRangeException>(() => ErlangFormulas.WaitProbability(2, -1.0));
        Assert.Throws<ArgumentOutOfRangeException>(() => ErlangFormulas.WaitProbability(2, double.NaN));
        Assert.Throws<ArgumentOutOfRangeException>(() => ErlangFormulas.WaitLongerThan(2, 1.0, 1.0, -1.0));
    }

    // Common practice (laws of the M/M/c queue): probabilities lie in [0, 1]; one more server never raises the
    // chance of waiting nor the mean wait Wq = C / (c mu - lambda) at the same offered load.
    [Property(MaxTest = 300)]
    public Property Probabilities_lie_between_zero_and_one() =>
        Prop.ForAll(ServersAndUtilisation().ToArbitrary(), pair =>
        {
            (int servers, double rho) = pair;
            double load = servers * rho;
            double blocking = ErlangFormulas.BlockingProbability(servers, load);
            double wait = ErlangFormulas.WaitProbability(servers, load);
            return blocking is >= 0.0 and <= 1.0 && wait is >= 0.0 and <= 1.0 && wait >= blocking - 1e-15;
        });

    [Property(MaxTest = 300)]
    public Property One_more_server_never_raises_the_chance_of_waiting_or_the_mean_wait() =>
        Prop.ForAll(ServersAndUtilisation().ToArbitrary(), pair =>
        {
            (int servers, double rho) = pair;
            double load = servers * rho;
            double wait = ErlangFormulas.WaitProbability(servers, load);
            double waitWithOneMore = ErlangFormulas.WaitProbability(servers + 1, load);
            double meanWait = wait / (servers - load);
            double meanWaitWithOneMore = waitWithOneMore / (servers + 1 - load);
            return waitWithOneMore <= wait * (1 + 1e-12) && meanWaitWithOneMore <= meanWait * (1 + 1e-12);
        });

    private static Gen<(int Servers, double Rho)> ServersAndUtilisation() =>
        from servers in Gen.OneOf(Gen.Choose(1, 50), Gen.Choose(51, 2_000), Gen.Choose(2_001, 100_000))
        from tenThousandths in Gen.Choose(0, 9_999)
        select (servers, tenThousandths / 10_000.0);
}
