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
    public void The_ziggurat_layers_close_with_the_published_constants()
    {
        // Source: Marsaglia and Tsang, "The Ziggurat Method for Generating Random Variables", J. Stat. Software 5(8),
        // 2000: for 256 layers of the exponential, r = 7.69711747013104972 and v = 3.949659822581572e-3 (constants
        // from memory). Each layer has area v: the base plus the tail, e^−r·(r + 1), and the top layer, walked down to
        // from r, x_1·(1 − e^−x_1), must both come out as v.
        double r = ExponentialZiggurat.TailStart;
        double v = ExponentialZiggurat.LayerArea;
        double x1 = ExponentialZiggurat.RightEdges[1];

        Assert.Equal(v, Math.Exp(-r) * (r + 1.0), 12);
        Assert.Equal(v, x1 * (1.0 - Math.Exp(-x1)), 12);
        Assert.Equal(0.0, ExponentialZiggurat.RightEdges[0]);
        Assert.Equal(r, ExponentialZiggurat.RightEdges[^1]);
    }

    [Fact]
    public void Exponential_draws_pass_a_chi_square_test_on_100_equally_likely_bins()
    {
        // Source: the Exp(1) distribution function F(x) = 1 − e^−x, so bin k of 100 equally likely bins is
        // [−ln(1 − k/100), −ln(1 − (k+1)/100)). Chi-square with 99 degrees of freedom: the 0.1% critical value is about
        // 148 (statistical tables, from memory). One million draws, a fixed seed.
        const int n = 1_000_000;
        const int bins = 100;
        var random = new Xoshiro256StarStar(2000, 5);
        var counts = new long[bins];
        for (int i = 0; i < n; i++)
        {
            double x = random.NextExponential();
            int bin = (int)((1.0 - Math.Exp(-x)) * bins);
            counts[Math.Min(bin, bins - 1)]++;
        }

        double expected = (double)n / bins;
        double chiSquare = counts.Sum(count => (count - expected) * (count - expected) / expected);

        Assert.InRange(chiSquare, 0.0, 148.0);
    }

    [Fact]
    public void Exponential_draws_reach_the_tail_beyond_the_top_layer_as_often_as_the_closed_form_says()
    {
        // Source: exact by hand from F(x) = 1 − e^−x. P(X > r) = e^−7.697 = 4.54e-4, so four million draws expect
        // 1,817 beyond r (standard deviation about 43), and of those a share e^−1 beyond r + 1; and P(X < 0.05), inside
        // the top layer's wedge, is 1 − e^−0.05 = 0.04877 (standard deviation 0.0001).
        const int n = 4_000_000;
        var random = new Xoshiro256StarStar(99, 1);
        double r = ExponentialZiggurat.TailStart;
        int beyond = 0;
        int farBeyond = 0;
        int near = 0;
        for (int i = 0; i < n; i++)
        {
            double x = random.NextExponential();
            beyond += x > r ? 1 : 0;
            farBeyond += x > r + 1.0 ? 1 : 0;
            near += x < 0.05 ? 1 : 0;
        }

        Assert.InRange(beyond, 1_817 - 200, 1_817 + 200);
        Assert.InRange((double)farBeyond / beyond, Math.Exp(-1.0) - 0.06, Math.Exp(-1.0) + 0.06);
        Assert.InRange((double)near / n, 0.04877 - 0.0006, 0.04877 + 0.0006);
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
