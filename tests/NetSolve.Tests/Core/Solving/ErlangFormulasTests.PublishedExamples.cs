using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving;

/// <summary>
/// Erlang B, Erlang C and M/M/c against worked examples published outside the project, each checked to the precision
/// its source prints (half of the last printed digit). docs/reference-values.md lists the sources.
/// </summary>
public partial class ErlangFormulasTests
{
    /// <summary>Half of the last printed digit of a value printed to three decimals.</summary>
    private const double HalfOfThirdDecimal = 0.0005;

    /// <summary>Half of the last printed digit of a value printed to one decimal.</summary>
    private const double HalfOfFirstDecimal = 0.05;

    // Source: "Erlang C" calculator help page, worked example; personal.telefonica.terra.es/web/vr/erlang/eng/mcerlc.htm
    // (the page names no author). Published: 600 calls an hour of 120 s are "a traffic of 20 erlangs"; for a target
    // delay probability of 15% "the number of circuits needed are 26"; the average delay is "3 seconds per call"
    // (the page also prints 2.5 s per CCS and 1800 s in total, both worked from the rounded 3 s: 3/120 x 100 and 600 x 3);
    // with 30 circuits "delay is reduced to 2.5%"; and 30 circuits at 15% delay "could attend a traffic of 23.6 erlangs".
    private const double ExampleCallsPerHour = 600.0;
    private const double ExampleCallSeconds = 120.0;

    [Fact]
    public void Twenty_erlangs_need_26_servers_for_at_most_a_15_percent_chance_of_waiting()
    {
        double load = ExampleCallsPerHour * ExampleCallSeconds / TimeConstants.SecondsPerHour;

        Assert.Equal(20.0, load, Exact);
        Assert.True(ErlangFormulas.WaitProbability(26, load) <= 0.15, FormattableString.Invariant($"C(26, 20) = {ErlangFormulas.WaitProbability(26, load)}"));
        Assert.True(ErlangFormulas.WaitProbability(25, load) > 0.15, FormattableString.Invariant($"C(25, 20) = {ErlangFormulas.WaitProbability(25, load)}"));
    }

    [Fact]
    public void The_staffing_search_finds_the_26_servers_of_the_published_example()
    {
        var waitAtAll = new StaffingTargets(WaitTail: new WaitTailTarget(WaitHours: 0.0, MaxProbability: 0.15));

        int? servers = StaffingSearch.MinimumServers(ExampleCallsPerHour, ExampleCallSeconds / TimeConstants.SecondsPerHour, atLeast: 1, waitAtAll, out string? impossible);

        Assert.Null(impossible);
        Assert.Equal(26, servers);
    }

    [Fact]
    public void Twenty_erlangs_on_26_servers_wait_three_seconds_per_call_on_average()
    {
        var unit = new Unit("agents", "agents", Servers.Of(26), ExampleCallSeconds / TimeConstants.SecondsPerHour);
        var result = UnitMetrics.Compute(unit, ExampleCallsPerHour, ExampleCallsPerHour);

        // Printed in whole seconds: the mean delay rounds to 3 s.
        Assert.InRange(result.MeanWaitHours!.Value * TimeConstants.SecondsPerHour, 2.5, 3.5);
    }

    [Fact]
    public void Thirty_servers_cut_the_chance_of_waiting_at_20_erlangs_to_2_point_5_percent()
    {
        // Printed as 2.5%, one decimal of a percentage.
        Assert.Equal(0.025, ErlangFormulas.WaitProbability(30, 20.0), HalfOfThirdDecimal);
    }

    [Fact]
    public void Thirty_servers_at_a_15_percent_chance_of_waiting_carry_23_point_6_erlangs()
    {
        // Printed to one decimal: the load at which C(30, a) reaches 0.15 lies in [23.55, 23.65).
        Assert.True(ErlangFormulas.WaitProbability(30, 23.6 - HalfOfFirstDecimal) < 0.15);
        Assert.True(ErlangFormulas.WaitProbability(30, 23.6 + HalfOfFirstDecimal) > 0.15);
    }

    // Source: Westbay Engineers, Erlang traffic calculator manual, "How much traffic can a trunk group handle?",
    // erlang.com/calculatormanual/howmuchtrafficcanatrunkgrouphandle.htm (worked example). Published: a trunk group
    // of 15 lines at one call in a hundred blocked (Erlang B 0.01) can be offered "8.108 Erlangs". The true load lies
    // within half of the last printed digit, so B(15, a) crosses 0.01 between 8.1075 and 8.1085.
    [Fact]
    public void Fifteen_servers_block_one_percent_at_the_published_8_108_erlangs()
    {
        const double PublishedLoad = 8.108;
        const double HalfOfFourthDecimal = 0.0005;

        Assert.True(ErlangFormulas.BlockingProbability(15, PublishedLoad - HalfOfFourthDecimal) < 0.01);
        Assert.True(ErlangFormulas.BlockingProbability(15, PublishedLoad + HalfOfFourthDecimal) > 0.01);
    }

    // Source: P. A. Jensen, Operations Research Models and Methods (University of Texas at Austin), queuing problems,
    // "finite_infinite" exercise, www.me.utexas.edu/~jensen/ORMM/problems/units/queue/question/finite_infinite.html,
    // Queue 1: M/M/2 with arrival rate 5 and service rate 3 per hour. Published: mean time in queue 0.758 h, mean time
    // in service 0.333 h, throughput 5, P(1) 0.152, P(2) 0.126, P(3) 0.105, P(4) 0.088, P(5) 0.073.
    // The page also prints P(0) 0.901 and mean time in system 1.901 h; both contradict the page's own numbers (the
    // P(n) would add up to more than 1, and 0.758 + 0.333 = 1.091), so they are not checked: misprints of 0.091 and 1.091.
    // P(n) is not a result of the solver; it follows from C by the textbook M/M/c closed forms (from memory, as in
    // Gross and Harris, Fundamentals of Queueing Theory): P(n) = C (1 − ρ) ρ^(n − c) for n ≥ c, and for c = 2,
    // P(0) + P(1) = 1 − C with P(1) = a P(0).
    [Fact]
    public void Two_servers_at_five_arrivals_and_three_services_an_hour_match_the_published_table()
    {
        const double ArrivalsPerHour = 5.0;
        const double ServicesPerHour = 3.0;
        var unit = new Unit("pair", "pair", Servers.Of(2), 1.0 / ServicesPerHour);
        var result = UnitMetrics.Compute(unit, ArrivalsPerHour, ArrivalsPerHour);

        Assert.Equal(0.758, result.MeanWaitHours!.Value, HalfOfThirdDecimal);
        Assert.Equal(0.333, result.MeanTimeInUnitHours!.Value - result.MeanWaitHours.Value, HalfOfThirdDecimal);
        Assert.Equal(ArrivalsPerHour, result.ArrivalsPerHour, Exact);

        double load = result.OfferedLoad;
        double rho = result.Utilisation;
        double wait = result.WaitProbability;
        Assert.Equal(0.152, (1.0 - wait) * load / (1.0 + load), HalfOfThirdDecimal);
        double[] published = [0.126, 0.105, 0.088, 0.073];
        for (int n = 2; n <= 5; n++)
        {
            Assert.Equal(published[n - 2], wait * (1.0 - rho) * Math.Pow(rho, n - 2), HalfOfThirdDecimal);
        }
    }
}
