using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Overflow;

public sealed class OverflowPeakednessTests
{
    [Theory]
    [InlineData(10, 8.0)]
    [InlineData(24, 18.75)]
    [InlineData(5, 6.0)]
    public void The_overflow_of_an_erlang_loss_unit_has_riordans_peakedness(int servers, double offeredLoad)
    {
        // Source: R. I. Wilkinson, "Theories for toll traffic engineering in the U.S.A.", Bell System Technical Journal
        // 35, 1956, pp. 421-514: Riordan's variance of the overflow of c servers offered a erlangs, with α = a·B(c, a),
        // V = α(1 − α + a/(c + 1 + α − a)), so Z = V/α (holding times of the receiving group equal to the source's).
        double alpha = offeredLoad * ErlangFormulas.BlockingProbability(servers, offeredLoad);
        double riordan = 1.0 - alpha + (offeredLoad / (servers + 1.0 + alpha - offeredLoad));
        double z = OverflowPeakedness.Of(servers, servers, offeredLoad, 1.0, 1.0);
        Assert.Equal(riordan, z, 1e-9);
    }

    [Fact]
    public void Overflow_seen_by_very_short_stays_is_almost_poisson_and_longer_stays_see_its_bursts()
    {
        // Exact by hand: as θ grows each overflow patient leaves before the next comes, so the count present is 0 or 1
        // and Z → 1; longer stays add up the patients of a burst, so Z grows as θ falls (Riordan's formula, Wilkinson 1956,
        // grows likewise with the holding time of the receiving group).
        double veryShort = OverflowPeakedness.Of(24, 30, 7.5, 2.5, 1000.0);
        double medium = OverflowPeakedness.Of(24, 30, 7.5, 2.5, 1.2);
        double longStays = OverflowPeakedness.Of(24, 30, 7.5, 2.5, 0.1);
        Assert.InRange(veryShort, 1.0, 1.02);
        Assert.True(veryShort < medium && medium < longStays);
    }

    [Fact]
    public void A_unit_with_a_waiting_room_sends_its_overflow_in_bursts_that_the_fitted_interrupted_stream_reproduces()
    {
        // Exact by hand: the fit keeps the on-rate λ, sets P(on) = p and solves Z for the switching rate, so the fitted
        // stream's rate is λp and its peakedness, by the two-state moment equations, is the Z it was fitted to.
        double z = OverflowPeakedness.Of(24, 30, 7.5, 2.5, 1.2);
        Assert.True(z > 2.0 && z < 3.0);
        var stream = InterruptedPoisson.FitOverflow(7.5, 0.01, z, 1.2);
        Assert.NotNull(stream);
        Assert.Equal(0.075, stream.MeanPerHour, 1e-12);
        Assert.Equal(z, stream.Peakedness(1.2), 1e-9);
    }

    [Fact]
    public void A_nearly_poisson_overflow_has_no_interrupted_stream_and_is_left_as_poisson()
    {
        // Exact by hand: Z = 1 would need an infinite switching rate; a Z so small that s = λ(1 − p)/(Z − 1) − θ ≤ 0 has no fit.
        Assert.Null(InterruptedPoisson.FitOverflow(7.5, 0.01, 1.0, 1.2));
        Assert.Null(InterruptedPoisson.FitOverflow(1.0, 0.01, 3.0, 1.2));
    }
}
