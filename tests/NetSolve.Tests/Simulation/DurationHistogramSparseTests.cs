using NetSolve.Simulation;

namespace NetSolve.Tests.Simulation;

/// <summary>The sparse form of <see cref="DurationHistogram"/>: small while few buckets are counted, and the same counts as the dense form.</summary>
public sealed class DurationHistogramSparseTests
{
    [Fact]
    public void A_few_hundred_durations_over_four_decades_stay_sparse_in_a_few_kilobytes()
    {
        // Exact by hand: 300 durations from 0.01 h to 100 h touch about 14 octaves, 14 KB in the dense form; sparse
        // they are at most 300 pairs of 4 bytes, in an array grown by half again each time to 316 pairs (1.3 KB;
        // 4, 6, 9, ..., 316 pairs: 3.8 KB allocated in all, with the arrays' headers and the histogram under 5 KB).
        var random = new Xoshiro256StarStar(3, 0);
        var values = new double[300];
        for (int i = 0; i < values.Length; i++)
        {
            values[i] = Math.Pow(10.0, (random.NextDouble() * 4.0) - 2.0);
        }

        long before = GC.GetAllocatedBytesForCurrentThread();
        var histogram = new DurationHistogram();
        foreach (double value in values)
        {
            histogram.Record(value);
        }

        long allocated = GC.GetAllocatedBytesForCurrentThread() - before;
        Assert.True(histogram.IsSparse);
        Assert.InRange(allocated, 1, 5_000);
    }

    [Fact]
    public void A_histogram_that_turns_dense_part_way_keeps_every_count_and_quantile()
    {
        // Exact by hand: pooling adds bucket by bucket, so 40 sparse parts of 125 durations pooled hold the same
        // buckets as one histogram that saw all 5,000 and turned dense on its 513th bucket.
        var random = new Xoshiro256StarStar(9, 0);
        var whole = new DurationHistogram();
        var pooled = new DurationHistogram();
        for (int part = 0; part < 40; part++)
        {
            var piece = new DurationHistogram();
            for (int i = 0; i < 125; i++)
            {
                double value = i % 10 == 0 ? 0.0 : Math.Pow(10.0, (random.NextDouble() * 6.0) - 3.0);
                piece.Record(value);
                whole.Record(value);
            }

            Assert.True(piece.IsSparse);
            pooled.Add(piece);
        }

        Assert.False(whole.IsSparse);
        Assert.False(pooled.IsSparse);
        Assert.Equal(whole.Count, pooled.Count);
        Assert.Equal(whole.Zeros, pooled.Zeros);
        foreach (double fraction in new[] { 0.05, 0.1, 0.5, 0.9, 0.95, 0.99, 1.0 })
        {
            Assert.Equal(whole.Quantile(fraction), pooled.Quantile(fraction));
            Assert.Equal(whole.ShareAtMost(whole.Quantile(fraction)), pooled.ShareAtMost(whole.Quantile(fraction)));
        }
    }

    [Fact]
    public void A_sparse_histogram_gives_the_same_quantiles_as_a_dense_one_with_the_same_counts()
    {
        // Exact by hand: 200 durations recorded into a histogram made dense first by pooling 600 others hold the same
        // buckets as those 600 pooled with a sparse histogram of the 200.
        var random = new Xoshiro256StarStar(11, 0);
        var sparse = new DurationHistogram();
        var dense = new DurationHistogram();
        var filler = new DurationHistogram();
        for (int i = 0; i < 600; i++)
        {
            filler.Record(Math.Pow(2.0, i / 10.0));
        }

        dense.Add(filler);
        var reference = new DurationHistogram();
        reference.Add(filler);
        for (int i = 0; i < 200; i++)
        {
            double value = random.NextExponential();
            sparse.Record(value);
            dense.Record(value);
        }

        Assert.True(sparse.IsSparse);
        Assert.False(dense.IsSparse);

        // The dense histogram holds filler and sample; pooling the sparse sample into the filler alone must match it.
        reference.Add(sparse);
        foreach (double fraction in new[] { 0.01, 0.25, 0.5, 0.75, 0.99 })
        {
            Assert.Equal(dense.Quantile(fraction), reference.Quantile(fraction));
        }
    }

    [Fact]
    public void Counts_appended_in_any_order_and_repeated_end_in_the_same_buckets_as_in_the_dense_form()
    {
        // Exact by hand: counting does not depend on order, so a sparse histogram that appends its counts and merges
        // them (and inserts in order once its array is nearly full) holds, bucket for bucket, what a dense histogram
        // holds for the same durations; the dense one also holds 600 filler buckets from 2^20 h up, kept apart here.
        var random = new Xoshiro256StarStar(17, 0);
        var filler = new DurationHistogram();
        for (int i = 0; i < 600; i++)
        {
            filler.Record(Math.Pow(2.0, 20.0 + (i / 10.0)));
        }

        var dense = new DurationHistogram();
        dense.Add(filler);
        var sparse = new DurationHistogram();
        var distinct = new double[250];
        for (int i = 0; i < distinct.Length; i++)
        {
            distinct[i] = Math.Pow(10.0, (random.NextDouble() * 3.0) - 1.0);
        }

        for (int i = 0; i < 4_000; i++)
        {
            // Mostly repeats of 250 values, a new value one time in 25: merges free room, and the array nearly fills.
            double value = i % 25 == 0 ? Math.Pow(10.0, (random.NextDouble() * 3.0) - 1.0) : distinct[random.NextInt(distinct.Length)];
            sparse.Record(value);
            dense.Record(value);
            if (i % 997 == 0)
            {
                // Reading in the middle settles the appended counts; counting goes on afterwards.
                Assert.Equal(Expected(), sparse.NonEmptyBuckets());
            }
        }

        Assert.True(sparse.IsSparse);
        Assert.Equal(Expected(), sparse.NonEmptyBuckets());
        Assert.Equal(dense.Count - filler.Count, sparse.Count);

        IEnumerable<(double Low, double High, long Count)> Expected() => dense.NonEmptyBuckets().Where(bucket => bucket.High <= 1_048_576.0).ToList();
    }

    [Fact]
    public void A_bucket_counted_past_fourteen_bits_turns_the_histogram_dense_with_the_exact_count()
    {
        // Exact by hand: 20,000 durations of 1 h (bucket [1, 1 + 2^-7)) and 5 of 2 h (bucket [2, 2 + 2^-6)); a sparse
        // pair holds at most 16,383 in its count, so the histogram turns dense and keeps both counts whole.
        var histogram = new DurationHistogram();
        for (int i = 0; i < 20_000; i++)
        {
            histogram.Record(1.0);
            if (i % 4_000 == 0)
            {
                histogram.Record(2.0);
            }
        }

        Assert.False(histogram.IsSparse);
        Assert.Equal([(1.0, 1.0078125, 20_000L), (2.0, 2.015625, 5L)], histogram.NonEmptyBuckets());
    }
}
