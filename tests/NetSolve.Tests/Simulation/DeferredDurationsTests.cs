using NetSolve.Simulation;

namespace NetSolve.Tests.Simulation;

/// <summary><see cref="DeferredDurations"/>: counting a buffer at a time ends with exactly the counts of counting at once.</summary>
public sealed class DeferredDurationsTests
{
    [Fact]
    public void Durations_counted_through_the_buffer_give_the_same_histograms_as_durations_counted_at_once()
    {
        // Exact by hand: a histogram's counts do not depend on the order they were added in, so 3.5 buffers' worth
        // of durations spread over 7 histograms, zeros included, must give identical counts and quantiles.
        var random = new Xoshiro256StarStar(5, 0);
        const int owners = 7;
        var direct = NewHistograms(owners);
        var deferredHistograms = NewHistograms(owners);
        var deferred = new DeferredDurations(deferredHistograms);
        int total = (DeferredDurations.Capacity * 7) / 2;
        for (int i = 0; i < total; i++)
        {
            int owner = (int)(random.NextDouble() * owners);
            double duration = i % 50 == 0 ? 0.0 : random.NextExponential() * (owner + 1);
            direct[owner].Record(duration);
            deferred.Record(owner, duration);
        }

        Assert.Equal(DeferredDurations.Capacity / 2, deferred.Pending);
        deferred.Flush();
        Assert.Equal(0, deferred.Pending);
        for (int owner = 0; owner < owners; owner++)
        {
            Assert.Equal(direct[owner].Count, deferredHistograms[owner].Count);
            Assert.Equal(direct[owner].Zeros, deferredHistograms[owner].Zeros);
            Assert.Equal(direct[owner].NonEmptyBuckets(), deferredHistograms[owner].NonEmptyBuckets());
        }
    }

    [Fact]
    public void Durations_counted_with_hints_in_many_histograms_give_the_same_histograms_as_durations_counted_at_once()
    {
        // Exact by hand, as above, with enough histograms (300) for the flush to hint the memory it reads ahead: some
        // owners see a few durations, some enough buckets to grow, merge, insert in order and turn dense; zeros and a
        // flush in the middle (after which counting goes on) included.
        var random = new Xoshiro256StarStar(11, 0);
        const int owners = 300;
        var direct = NewHistograms(owners);
        var deferredHistograms = NewHistograms(owners);
        var deferred = new DeferredDurations(deferredHistograms);
        int total = DeferredDurations.Capacity * 9;
        for (int i = 0; i < total; i++)
        {
            // A third of the durations go to the first 5 owners, over many scales; the rest spread thin.
            int owner = i % 3 == 0 ? (int)(random.NextDouble() * 5) : (int)(random.NextDouble() * owners);
            double scale = owner < 5 ? Math.Pow(2.0, (int)(random.NextDouble() * 12)) : owner + 1;
            double duration = i % 97 == 0 ? 0.0 : random.NextExponential() * scale;
            direct[owner].Record(duration);
            deferred.Record(owner, duration);
            if (i == total / 2)
            {
                deferred.Flush();
            }
        }

        deferred.Flush();
        Assert.Equal(0, deferred.Pending);
        Assert.Contains(deferredHistograms, histogram => !histogram.IsSparse);
        for (int owner = 0; owner < owners; owner++)
        {
            Assert.Equal(direct[owner].Count, deferredHistograms[owner].Count);
            Assert.Equal(direct[owner].Zeros, deferredHistograms[owner].Zeros);
            Assert.Equal(direct[owner].NonEmptyBuckets(), deferredHistograms[owner].NonEmptyBuckets());
        }
    }

    [Fact]
    public void Durations_not_yet_flushed_are_not_in_the_histogram()
    {
        // Exact by hand: one duration in an empty buffer stays pending until the buffer is flushed.
        var histograms = NewHistograms(1);
        var deferred = new DeferredDurations(histograms);
        deferred.Record(0, 2.5);
        Assert.Equal(0, histograms[0].Count);
        deferred.Flush();
        Assert.Equal(1, histograms[0].Count);
        Assert.Equal(2.5, histograms[0].Quantile(1.0), 2.5 * DurationHistogram.RelativeResolution);
    }

    private static DurationHistogram[] NewHistograms(int count)
    {
        var histograms = new DurationHistogram[count];
        for (int i = 0; i < count; i++)
        {
            histograms[i] = new DurationHistogram();
        }

        return histograms;
    }
}
