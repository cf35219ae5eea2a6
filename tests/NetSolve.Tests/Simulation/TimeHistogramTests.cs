using NetSolve.Simulation;

namespace NetSolve.Tests.Simulation;

public sealed class TimeHistogramTests
{
    // Source: exact by hand. The p-quantile of the exponential with mean 1 is −ln(1 − p); bins are 1/16 octave wide
    // (about 4.4%), so the interpolated estimate from 1,000,000 draws is well within 3%.
    [Theory]
    [InlineData(0.50)]
    [InlineData(0.90)]
    [InlineData(0.95)]
    [InlineData(0.99)]
    public void Quantiles_of_exponential_draws_match_the_closed_form(double fraction)
    {
        var counts = new int[TimeHistogram.Bins];
        var random = new Xoshiro256StarStar(17, 0);
        for (int i = 0; i < 1_000_000; i++)
        {
            counts[TimeHistogram.BinOf(random.NextExponential())]++;
        }

        double expected = -Math.Log(1.0 - fraction);
        Assert.Equal(expected, TimeHistogram.Quantile(counts, 0, 1.0, fraction), expected * 0.03);
    }

    [Fact]
    public void The_scale_moves_the_bins_and_an_empty_row_has_no_quantile()
    {
        // Source: exact by hand. 200 values all equal to 6 h on a 3 h scale fall in the bin starting at ratio 2.
        var counts = new int[TimeHistogram.Bins * 2];
        counts[TimeHistogram.Bins + TimeHistogram.BinOf(6.0 / 3.0)] = 200;

        double median = TimeHistogram.Quantile(counts, TimeHistogram.Bins, 3.0, 0.5);

        Assert.InRange(median, 6.0, 6.0 * 1.045);
        Assert.True(double.IsNaN(TimeHistogram.Quantile(counts, 0, 3.0, 0.5)));
    }
}
