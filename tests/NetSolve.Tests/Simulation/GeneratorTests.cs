using NetSolve.Simulation;

namespace NetSolve.Tests.Simulation;

public sealed class GeneratorTests
{
    [Fact]
    public void Xoshiro_from_state_1_2_3_4_gives_the_hand_computed_first_outputs()
    {
        // Source: exact by hand from the xoshiro256** definition (Blackman and Vigna, 2018): the first output is
        // rotl(s1·5, 7)·9 = rotl(10, 7)·9 = 1280·9 = 11520. The update leaves s1 = 2 ^ (3 ^ 1) = 0, so the second is 0;
        // the third uses s1 = 0 ^ (s2 ^ s0) after the next update: s0 = 7, s2 = 3 ^ 1 ^ (2 << 17) = 262146, s1 = 262146 ^ 7
        // = 262149, giving rotl(262149·5, 7)·9.
        var random = Xoshiro256StarStar.FromState(1, 2, 3, 4);

        Assert.Equal(11520UL, random.NextUInt64());
        Assert.Equal(0UL, random.NextUInt64());
        ulong s1 = 262149UL * 5;
        Assert.Equal(((s1 << 7) | (s1 >> 57)) * 9, random.NextUInt64());
    }

    [Fact]
    public void SplitMix64_from_seed_0_gives_the_published_first_output()
    {
        // From memory: SplitMix64 started at state 0 first returns 0xE220A8397B1DCDAF (Vigna's reference splitmix64.c).
        ulong state = 0;

        Assert.Equal(0xE220A8397B1DCDAFUL, SplitMix64.Next(ref state));
    }

    [Fact]
    public void The_same_seed_and_stream_replay_the_same_sequence_and_other_streams_differ()
    {
        var first = new Xoshiro256StarStar(42, 3);
        var again = new Xoshiro256StarStar(42, 3);
        var otherStream = new Xoshiro256StarStar(42, 4);
        var otherSeed = new Xoshiro256StarStar(43, 3);

        var a = Enumerable.Range(0, 100).Select(_ => first.NextUInt64()).ToList();
        var b = Enumerable.Range(0, 100).Select(_ => again.NextUInt64()).ToList();
        var c = Enumerable.Range(0, 100).Select(_ => otherStream.NextUInt64()).ToList();
        var d = Enumerable.Range(0, 100).Select(_ => otherSeed.NextUInt64()).ToList();

        Assert.Equal(a, b);
        Assert.Empty(a.Intersect(c));
        Assert.Empty(a.Intersect(d));
    }

    [Fact]
    public void Uniform_exponential_and_normal_draws_have_their_textbook_means_and_variances()
    {
        // Source: exact by hand. U(0,1): mean 1/2, variance 1/12; Exp(1): mean 1, variance 1; N(0,1): mean 0, variance 1.
        // With n = 400,000 draws the standard error of each mean is below 0.0016; five of them bound a fair check.
        const int n = 400_000;
        var random = new Xoshiro256StarStar(7, 0);
        double[] uniform = new double[n];
        double[] exponential = new double[n];
        double[] normal = new double[n];
        for (int i = 0; i < n; i++)
        {
            uniform[i] = random.NextDouble();
            exponential[i] = random.NextExponential();
            normal[i] = random.NextNormal();
        }

        AssertMoments(uniform, 0.5, 1.0 / 12.0);
        AssertMoments(exponential, 1.0, 1.0);
        AssertMoments(normal, 0.0, 1.0);
        Assert.All(uniform, u => Assert.InRange(u, 0.0, 1.0 - double.Epsilon));
    }

    [Fact]
    public void Bounded_integers_cover_every_value_evenly()
    {
        // Source: exact by hand. 70,000 draws below 7 expect 10,000 each, standard deviation about 93.
        var random = new Xoshiro256StarStar(1, 1);
        var counts = new int[7];
        for (int i = 0; i < 70_000; i++)
        {
            counts[random.NextInt(7)]++;
        }

        Assert.All(counts, count => Assert.InRange(count, 9_500, 10_500));
    }

    private static void AssertMoments(double[] values, double mean, double variance)
    {
        double m = values.Average();
        double v = values.Sum(x => (x - m) * (x - m)) / (values.Length - 1);
        double standardError = Math.Sqrt(variance / values.Length);
        Assert.InRange(m, mean - (5 * standardError), mean + (5 * standardError));
        Assert.InRange(v, variance * 0.98, variance * 1.02);
    }
}
