using NetSolve.Simulation;

namespace NetSolve.Tests.Simulation;

public sealed class MserTruncationTests
{
    [Fact]
    public void A_series_that_starts_ten_high_then_settles_is_cut_after_its_first_two_batches()
    {
        // Batch means 10, 10, then +1, -1 alternating for 18 batches (each batch of 5 holds its mean five times).
        var series = Enumerable.Repeat(10.0, 10)
            .Concat(Enumerable.Range(0, 18).SelectMany(batch => Enumerable.Repeat(batch % 2 == 0 ? 1.0 : -1.0, 5)))
            .ToList();

        // Exact by hand: the score Σ(Z − Z̄)² / (k − d)² is 198/400 = 0.495 at d = 0, 112.7/361 = 0.312 at d = 1,
        // 18/324 = 0.0556 at d = 2, 16.94/289 = 0.0586 at d = 3 and 16/256 = 0.0625 at d = 4, rising as about
        // 1/(k − d) beyond: the least is d = 2, the two batches of the transient.
        Assert.Equal(2, MserTruncation.TruncatedBatches(series));
    }

    [Fact]
    public void A_series_with_no_transient_is_not_cut()
    {
        var series = Enumerable.Range(0, 100).Select(i => (i / 5) % 2 == 0 ? 1.0 : -1.0).ToList();

        // Exact by hand: 20 batch means +1, -1, ...: the score is 20/400 = 0.05 at d = 0 and grows as d rises.
        Assert.Equal(0, MserTruncation.TruncatedBatches(series));
    }

    [Fact]
    public void A_series_still_climbing_at_its_end_is_too_short_to_say()
    {
        var series = Enumerable.Range(0, 100).Select(i => (double)i).ToList();

        // Exact by hand: the batch means climb by 5 each; the score falls all the way to the last two batches
        // (12.5/4 = 3.1, against 16,625/400 = 41.6 at d = 0), so the best cut is in the second half.
        Assert.Null(MserTruncation.TruncatedBatches(series));
    }

    [Fact]
    public void A_series_of_fewer_than_two_batches_cannot_be_judged()
    {
        Assert.Null(MserTruncation.TruncatedBatches([1.0, 2.0, 3.0, 4.0, 5.0, 6.0]));
    }
}
