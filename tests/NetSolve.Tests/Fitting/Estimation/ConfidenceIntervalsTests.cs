using NetSolve.Fitting.Estimation;

namespace NetSolve.Tests.Fitting.Estimation;

public sealed class ConfidenceIntervalsTests
{
    [Theory]
    // Source: Newcombe, "Two-sided confidence intervals for the single proportion: comparison of seven methods",
    // Statistics in Medicine 17, 1998, 857–872, Table II (from memory), method 3 (Wilson score), to 4 decimals.
    [InlineData(81, 263, 0.2553, 0.3662)]
    [InlineData(15, 148, 0.0624, 0.1605)]
    [InlineData(0, 20, 0.0000, 0.1611)]
    [InlineData(1, 29, 0.0061, 0.1718)]
    public void Wilson_intervals_match_the_published_examples(int successes, int trials, double lower, double upper)
    {
        var interval = ConfidenceIntervals.Wilson(successes, trials);

        Assert.Equal(lower, interval.Lower, 0.00005);
        Assert.Equal(upper, interval.Upper, 0.00005);
    }

    [Fact]
    public void A_route_taken_by_every_patient_has_an_upper_end_of_exactly_one()
    {
        var interval = ConfidenceIntervals.Wilson(12, 12);

        // Exact by hand: at n successes the upper end is 1 and the lower n / (n + z²).
        Assert.Equal(1.0, interval.Upper);
        Assert.Equal(12.0 / (12.0 + (EvidenceThresholds.NormalQuantile * EvidenceThresholds.NormalQuantile)), interval.Lower, 1e-12);
    }

    [Theory]
    // From memory: the standard table of exact (Garwood) 95% limits for a Poisson count, as printed in e.g. Sahai and
    // Khurshid, American Journal of Epidemiology 1993, and most epidemiology texts; 3 to 4 significant digits.
    [InlineData(0, 0.0, 3.689)]
    [InlineData(1, 0.0253, 5.572)]
    [InlineData(2, 0.2422, 7.225)]
    [InlineData(5, 1.6235, 11.668)]
    [InlineData(10, 4.7954, 18.390)]
    public void Exact_poisson_limits_match_the_published_table(int events, double lower, double upper)
    {
        var interval = ConfidenceIntervals.PoissonCount(events);

        Assert.Equal(lower, interval.Lower, 0.0005);
        Assert.Equal(upper, interval.Upper, 0.0005);
    }

    [Fact]
    public void A_rate_divides_the_count_and_its_limits_by_the_hours()
    {
        var rate = RateEvidence.Of(10, 5.0);

        // Exact by hand: 10 events in 5 h is 2 per hour; the Garwood limits 4.7954 and 18.390 divided by 5.
        Assert.Equal(2.0, rate.PerHour.Value);
        Assert.Equal(4.7954 / 5.0, rate.PerHour.Interval.Lower, 0.0001);
        Assert.Equal(18.390 / 5.0, rate.PerHour.Interval.Upper, 0.0001);
    }

    [Fact]
    public void Impossible_counts_are_refused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => ConfidenceIntervals.Wilson(3, 2));
        Assert.Throws<ArgumentOutOfRangeException>(() => ConfidenceIntervals.Wilson(0, 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => ConfidenceIntervals.PoissonCount(-1));
        Assert.Throws<ArgumentOutOfRangeException>(() => RateEvidence.Of(1, 0.0));
    }
}
