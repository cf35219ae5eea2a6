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
