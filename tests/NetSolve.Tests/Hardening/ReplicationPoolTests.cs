using NetSolve.Simulation;

namespace NetSolve.Tests.Hardening;

/// <summary>
/// A simulation's memory does not grow with its replications: each is pooled as it finishes, in replication order,
/// and past a budget the percentile intervals come from share moments instead of the replications' histograms.
/// </summary>
public sealed class ReplicationPoolTests
{
    [Fact]
    public void Percentile_intervals_from_share_moments_equal_those_from_the_kept_histograms()
    {
        var random = new Random(5);
        var replications = Enumerable.Range(0, 40).Select(r => Histogram(random, 50 + random.Next(400), zeros: r % 3)).ToList();
        var pooled = ReplicationTallies.Pool(replications);
        var moments = new ShareMoments();
        replications.ForEach(moments.Add);

        foreach (double fraction in MetricLayout.Percentiles)
        {
            var direct = QuantileInterval.Of(fraction, pooled, replications)!.Value;
            var fromMoments = QuantileInterval.Of(fraction, pooled, moments)!.Value;

            // Exact by hand: the same sum of squares, expanded as a quadratic in the position inside the bucket, differs only by rounding.
            Assert.Equal(direct.Mean, fromMoments.Mean);
            Assert.Equal(direct.Replications, fromMoments.Replications);
            Assert.Equal(direct.HalfWidth!.Value, fromMoments.HalfWidth!.Value, direct.HalfWidth.Value * 1e-9);
        }
    }

    [Fact]
    public void The_sum_of_squares_is_read_at_zero_at_a_bucket_edge_and_beyond_every_bucket()
    {
        var one = new DurationHistogram();
        one.Record(0.0);
        one.Record(1.0);
        var other = new DurationHistogram();
        other.Record(2.0);
        other.Record(2.0);
        var moments = new ShareMoments();
        moments.Add(one);
        moments.Add(other);
        moments.Add(new DurationHistogram());

        // Exact by hand: shares at most 0 are 1/2 and 0 (the empty third replication has none); at 1.5 (past the bucket of 1, below that of 2) 1 and 0; past 2 both 1.
        Assert.Equal(2, moments.Replications);
        Assert.Equal(0.0 + 0.25, moments.SumOfSquares(0.0, 0.5), 12);
        Assert.Equal(0.25 + 0.25, moments.SumOfSquares(1.5, 0.5), 12);
        Assert.Equal(0.0, moments.SumOfSquares(1e6, 1.0), 12);
        Assert.Equal((1.0 - 0.5) * (1.0 - 0.5) + (0.5 * 0.5), moments.SumOfSquares(DurationHistogram.LowerEdge(DurationHistogram.BucketOf(2.0)), 0.5), 12);
    }

    [Fact]
    public void Replications_handed_in_out_of_order_are_pooled_in_replication_order()
    {
        var pool = new ReplicationPool(units: 1, namedGroups: 0, thresholds: 0);

        pool.Finish(2, Output(2.0));
        pool.Finish(1, Output(1.0));
        Assert.Empty(pool.Rows);
        pool.Finish(0, Output(0.0));

        Assert.Equal([0.0, 1.0, 2.0], pool.Rows.Select(row => row[0]));
    }

    [Fact]
    public void A_replication_that_never_finished_is_skipped_when_the_batch_ends()
    {
        var pool = new ReplicationPool(units: 1, namedGroups: 0, thresholds: 0);

        pool.Finish(0, Output(0.0));
        pool.Finish(2, Output(2.0));
        pool.Flush(3);
        pool.Finish(3, Output(3.0));

        Assert.Equal([0.0, 2.0, 3.0], pool.Rows.Select(row => row[0]));
        Assert.Equal(3 * 7L, pool.Events);
    }

    [Fact]
    public void Past_the_budget_the_replications_histograms_are_let_go()
    {
        // Exact by hand: each replication keeps three sparse histograms of about 100 buckets (arrays of 141 pairs of
        // 4 bytes, about 0.6 KB each), so about 1.7 KB a replication: past 20,000 bytes within the 20 replications,
        // not at the first.
        var pool = new ReplicationPool(units: 1, namedGroups: 0, thresholds: 0, keptBytesLimit: 20_000);

        pool.Finish(0, Output(0.0));
        Assert.True(pool.KeepsReplications);
        for (int r = 1; r < 20; r++)
        {
            pool.Finish(r, Output(r));
        }

        Assert.False(pool.KeepsReplications);
        Assert.All(pool.UnitTimes, unit => Assert.False(unit.KeepsReplications));
        Assert.Equal(20, pool.UnitTimes[0].Percentiles()[0].Hours!.Value.Replications);
    }

    [Fact]
    public void A_pool_that_stops_keeping_after_one_replication_gives_the_very_intervals_of_moments_made_at_once()
    {
        // Exact by hand: the moments are made when the second replication comes, from the first and then the second,
        // so every sum sees the same additions in the same order as moments fed each replication as it came.
        var random = new Random(8);
        var replications = Enumerable.Range(0, 6).Select(r => Histogram(random, 80 + random.Next(200), zeros: r % 2)).ToList();
        long firstCount = replications[0].Count;
        double firstMedian = replications[0].Quantile(0.5);
        var late = new PercentilePool();
        var moments = new ShareMoments();
        for (int r = 0; r < replications.Count; r++)
        {
            late.Add(replications[r]);
            moments.Add(replications[r]);
            if (r == 0)
            {
                late.StopKeeping();

                // One replication: no half-width either way, and the point is its own percentile.
                var lone = late.Percentiles();
                Assert.All(lone, percentile => Assert.Null(percentile.Hours!.Value.HalfWidth));
                Assert.Equal(replications[0].Quantile(0.5), lone[0].Hours!.Value.Mean);
            }
        }

        var pooled = ReplicationTallies.Pool(replications);
        var fromPool = late.Percentiles();
        for (int i = 0; i < MetricLayout.Percentiles.Length; i++)
        {
            Assert.Equal(QuantileInterval.Of(MetricLayout.Percentiles[i], pooled, moments), fromPool[i].Hours);
        }

        // The first replication's histogram was the pooled one until the second came: pooling must not have changed it.
        Assert.Equal((firstCount, firstMedian), (replications[0].Count, replications[0].Quantile(0.5)));
    }

    private static ReplicationOutput Output(double marker)
    {
        var random = new Random((int)marker);
        var unit = Histogram(random, 100, zeros: 1);
        var group = Histogram(random, 100, zeros: 0);
        var tallies = new ReplicationTallies([unit], [group], [100L], []);
        return new ReplicationOutput([marker], 7, tallies, new double[SimulationEngine.SeriesPoints]);
    }

    private static DurationHistogram Histogram(Random random, int count, int zeros)
    {
        var histogram = new DurationHistogram();
        double scale = 0.5 + random.NextDouble();
        for (int i = 0; i < count; i++)
        {
            histogram.Record(-scale * Math.Log(1.0 - random.NextDouble()));
        }

        for (int i = 0; i < zeros; i++)
        {
            histogram.Record(0.0);
        }

        return histogram;
    }
}
