using NetSolve.Solving;

namespace NetSolve.Tests.Core.TimeVarying;

public class PeriodicBirthDeathChainTests
{
    private const int StepsPerHour = 60;

    // A tight periodicity tolerance; the hourly means are exact integrals within each step of the chain.
    private static readonly ExactChainOptions Tight = new() { Tolerance = 1e-13 };

    // Exact by hand: one server and room for one patient is a two-state chain, P1' = λ(t)(1 − P1) − μ·P1. With λ
    // constant on each half day, P1 relaxes towards q = λ/(λ + μ) at rate r = λ + μ: P(t) = q + (P(s) − q)e^(−r(t − s)).
    // Periodicity P(24) = P(0) gives P(0) = [q2(1 − e2) + q1(1 − e1)e2] / (1 − e1·e2), e_i = e^(−12 r_i); the hourly
    // mean over [h, h + 1] is q + (P(s) − q)·e^(−r(h − s))·(1 − e^(−r))/r.
    [Fact]
    public void One_server_with_room_for_one_matches_the_hand_solved_two_state_chain()
    {
        const int fineSteps = 480;
        const double dayArrivals = 3.0;
        const double nightArrivals = 0.5;
        const double servicePerHour = 2.0;
        var arrivals = Enumerable.Range(0, 24 * fineSteps).Select(k => k < 12 * fineSteps ? dayArrivals : nightArrivals).ToArray();

        var waits = PeriodicBirthDeathChain.Solve(arrivals, fineSteps, ServerRoster.Constant(1), 1.0 / servicePerHour, Tight, capacity: 1);

        double q1 = dayArrivals / (dayArrivals + servicePerHour);
        double r1 = dayArrivals + servicePerHour;
        double q2 = nightArrivals / (nightArrivals + servicePerHour);
        double r2 = nightArrivals + servicePerHour;
        double e1 = Math.Exp(-12.0 * r1);
        double e2 = Math.Exp(-12.0 * r2);
        double start = ((q2 * (1.0 - e2)) + (q1 * (1.0 - e1) * e2)) / (1.0 - (e1 * e2));
        double noon = q1 + ((start - q1) * e1);
        for (int h = 0; h < 24; h++)
        {
            var (q, r, from, s) = h < 12 ? (q1, r1, start, 0) : (q2, r2, noon, 12);
            double hourly = q + ((from - q) * Math.Exp(-r * (h - s)) * (1.0 - Math.Exp(-r)) / r);
            Assert.Equal(hourly, waits.MeanInUnitByHour[h], 1e-9);
            Assert.Equal(0.0, waits.MeanQueueByHour[h], 1e-12);
        }
    }

    // Exact by hand: M/M/3 at a = 2 erlangs, μ = 1/h has C = 4/9, Lq = 8/9, Wq = 4/9 h, L = 26/9 (the same values as
    // ErlangFormulasTests); with constant arrivals every hour of the periodic chain is that steady state.
    [Fact]
    public void A_constant_arrival_rate_gives_the_steady_state_Erlang_C_values_in_every_hour()
    {
        var arrivals = Enumerable.Repeat(2.0, 24 * StepsPerHour).ToArray();

        var waits = PeriodicBirthDeathChain.Solve(arrivals, StepsPerHour, ServerRoster.Constant(3), 1.0, Tight);

        Assert.Equal(TimeVaryingMethodNames.ExactChain, waits.Method);
        for (int h = 0; h < 24; h++)
        {
            Assert.Equal(8.0 / 9.0, waits.MeanQueueByHour[h], 1e-9);
            Assert.Equal(26.0 / 9.0, waits.MeanInUnitByHour[h], 1e-9);
            Assert.Equal(4.0 / 9.0, waits.WaitProbabilityByHour[h], 1e-9);
            Assert.Equal(4.0 / 9.0, waits.MeanWaitHoursByHour[h], 1e-9);
        }
    }

    // Exact by hand: arrivals over the day at or above what the servers can do over the day have no periodic state.
    [Fact]
    public void Arrivals_beyond_the_servers_over_the_cycle_are_unstable()
    {
        var arrivals = Enumerable.Range(0, 24 * StepsPerHour).Select(k => k < 12 * StepsPerHour ? 1.0 : 5.0).ToArray();

        var waits = PeriodicBirthDeathChain.Solve(arrivals, StepsPerHour, ServerRoster.Constant(3), 1.0);

        Assert.False(waits.IsStable);
        Assert.Equal(TimeVaryingMethodNames.Unstable, waits.Method);
    }
}
