using NetSolve.Simulation;

namespace NetSolve.Tests.Simulation;

public sealed class DurationHistogramTests
{
    // Exact by hand: a quantile is read inside the bucket holding the sample value of the same rank, and a bucket is
    // at most 2^−7 of its lower edge wide, so the two differ by at most 2^−7 (0.78%) of that value.
    [Theory]
    [InlineData(0.01)]
    [InlineData(0.50)]
    [InlineData(0.95)]
    [InlineData(0.99)]
    [InlineData(1.00)]
    public void A_quantile_is_within_the_stated_resolution_of_the_sample_value_of_that_rank_over_twenty_decades(double fraction)
    {
        var random = new Xoshiro256StarStar(17, 0);
        var histogram = new DurationHistogram();
        var values = new double[100_000];
        for (int i = 0; i < values.Length; i++)
        {
            // Log-uniform from 1e-10 h to 1e10 h: far beyond any range fixed in advance.
            values[i] = Math.Pow(10.0, (random.NextDouble() * 20.0) - 10.0);
            histogram.Record(values[i]);
        }

        Array.Sort(values);
        double atRank = values[Math.Max(0, (int)Math.Ceiling(fraction * values.Length) - 1)];

        Assert.Equal(atRank, histogram.Quantile(fraction), atRank * DurationHistogram.RelativeResolution);
    }

    // The one walk for several fractions gives each quantile bit for bit as the walk for one does: sparse and dense
    // forms, zeros, fractions sharing a bucket, the ends, and fractions out of order (read one by one).
    [Theory]
    [InlineData(10, 0)]
    [InlineData(300, 40)]
    [InlineData(20_000, 5_000)]
    public void Quantiles_read_together_are_each_the_quantile_read_alone(int draws, int zeros)
    {
        var random = new Xoshiro256StarStar(5, 0);
        var histogram = new DurationHistogram();
        for (int i = 0; i < draws; i++)
        {
            histogram.Record(-Math.Log(1.0 - random.NextDouble()));
        }

        for (int i = 0; i < zeros; i++)
        {
            histogram.Record(0.0);
        }

        double[][] sets = [[0.0, 0.001, 0.2, 0.5, 0.9, 0.95, 0.99, 0.999, 1.0], [0.5, 0.5, 0.9], [0.99, 0.5, 0.9], [0.7], []];
        foreach (var fractions in sets)
        {
            var together = new double[fractions.Length];
            histogram.Quantiles(fractions, together);
            Assert.Equal(fractions.Select(histogram.Quantile), together);
        }

        var empty = new double[2];
        new DurationHistogram().Quantiles([0.5, 0.9], empty);
        Assert.All(empty, value => Assert.True(double.IsNaN(value)));
    }

    [Theory]
    [InlineData(0.50)]
    [InlineData(0.95)]
    [InlineData(0.99)]
    public void Quantiles_of_exponential_draws_match_the_closed_form(double fraction)
    {
        // Exact by hand: the p-quantile of the exponential with mean 1 is −ln(1 − p); with 1,000,000 draws the
        // sampling error is below 0.3% and the resolution adds at most 0.78%.
        var random = new Xoshiro256StarStar(17, 1);
        var histogram = new DurationHistogram();
        for (int i = 0; i < 1_000_000; i++)
        {
            histogram.Record(random.NextExponential());
        }

        double expected = -Math.Log(1.0 - fraction);
        Assert.Equal(expected, histogram.Quantile(fraction), expected * 0.011);
    }

    [Fact]
    public void Zero_is_counted_exactly_and_an_empty_histogram_has_no_quantile()
    {
        // Exact by hand: 60 zeros and 40 values of 6 h: the 50th percentile is 0, the 70th is in the 6 h bucket.
        var histogram = new DurationHistogram();
        Assert.True(double.IsNaN(histogram.Quantile(0.5)));
        for (int i = 0; i < 60; i++)
        {
            histogram.Record(0.0);
        }

        for (int i = 0; i < 40; i++)
        {
            histogram.Record(6.0);
        }

        Assert.Equal(0.0, histogram.Quantile(0.5));
        Assert.InRange(histogram.Quantile(0.7), 6.0, 6.0 * (1.0 + DurationHistogram.RelativeResolution));
        Assert.Equal(60, histogram.Zeros);
        Assert.Equal(100, histogram.Count);
    }

    [Fact]
    public void Pooled_histograms_give_the_quantiles_of_all_their_values_together()
    {
        // Exact by hand: recording every value into one histogram fills the same buckets as adding the parts.
        var seconds = new DurationHistogram();
        var days = new DurationHistogram();
        var together = new DurationHistogram();
        for (int i = 1; i <= 1_000; i++)
        {
            seconds.Record(i / 3_600.0);
            days.Record(i * 24.0);
            together.Record(i / 3_600.0);
            together.Record(i * 24.0);
        }

        var pooled = new DurationHistogram();
        pooled.Add(days);
        pooled.Add(seconds);

        Assert.Equal(together.Count, pooled.Count);
        foreach (double fraction in new[] { 0.1, 0.5, 0.9, 0.99 })
        {
            Assert.Equal(together.Quantile(fraction), pooled.Quantile(fraction));
        }
    }

    [Theory]
    [InlineData(-1.0)]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    public void A_negative_or_undefined_duration_is_refused_rather_than_counted_somewhere(double duration)
    {
        var histogram = new DurationHistogram();
        Assert.Throws<ArgumentOutOfRangeException>(() => histogram.Record(duration));
    }

    [Theory]
    [InlineData(0.05)]
    [InlineData(0.50)]
    [InlineData(0.95)]
    [InlineData(0.99)]
    public void The_share_at_most_a_quantile_gives_back_its_fraction(double fraction)
    {
        var random = new Xoshiro256StarStar(5, 0);
        var histogram = new DurationHistogram();
        for (int i = 0; i < 10_000; i++)
        {
            histogram.Record(random.NextExponential());
        }

        // Exact by hand: both interpolate linearly inside the same bucket, so one inverts the other up to rounding.
        Assert.Equal(fraction, histogram.ShareAtMost(histogram.Quantile(fraction)), 1e-9);
    }

    [Fact]
    public void The_share_at_most_counts_zeros_and_is_one_beyond_the_largest_time()
    {
        var histogram = new DurationHistogram();
        histogram.Record(0.0);
        histogram.Record(2.0);
        histogram.Record(4.0);
        histogram.Record(8.0);

        // Exact by hand: one of four is 0; 2 is the lower edge of its bucket, so the share at most 2 counts the zero only.
        Assert.Equal(0.25, histogram.ShareAtMost(0.0));
        Assert.Equal(0.25, histogram.ShareAtMost(2.0));
        Assert.Equal(1.0, histogram.ShareAtMost(100.0));
        Assert.True(double.IsNaN(new DurationHistogram().ShareAtMost(1.0)));
    }
}
