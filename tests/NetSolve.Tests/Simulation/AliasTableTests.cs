using NetSolve.Simulation;

namespace NetSolve.Tests.Simulation;

public sealed class AliasTableTests
{
    [Theory]
    [InlineData(new[] { 1.0 })]
    [InlineData(new[] { 0.1, 0.2, 0.3, 0.4 })]
    [InlineData(new[] { 5.0, 0.0, 1.0, 1.0, 3.0 })]
    [InlineData(new[] { 1e-9, 1.0, 1e9 })]
    public void The_columns_give_each_outcome_its_share_of_the_weights(double[] weights)
    {
        // Source: Walker (1977), Vose (1991): column i keeps its outcome with probability Keep_i and passes the rest to
        // its alias, each column drawn with probability 1/n, so outcome k has (Keep_k + Σ_{alias_j = k} (1 − Keep_j)) / n,
        // which the construction makes equal to w_k / Σ w (exactly in real arithmetic; here to rounding).
        var table = AliasTable.Of(weights);
        double total = weights.Sum();
        var probabilities = table.Probabilities();
        for (int k = 0; k < weights.Length; k++)
        {
            Assert.Equal(weights[k] / total, probabilities[k], 1e-12);
        }
    }

    [Fact]
    public void Evenly_spread_draws_pick_each_outcome_in_proportion_to_its_weight()
    {
        // Source: exact by hand. Draws on a fine even grid of [0, 1) stand for uniform draws: each outcome's share of
        // them differs from its probability by at most one grid step per column that can pick it.
        var random = new Xoshiro256StarStar(31, 0);
        var weights = Enumerable.Range(0, 1_000).Select(_ => random.NextDouble() < 0.2 ? 0.0 : random.NextExponential()).ToArray();
        weights[17] = 1.0;
        var table = AliasTable.Of(weights);
        const int Grid = 4_000_000;
        var counts = new int[weights.Length];
        for (int g = 0; g < Grid; g++)
        {
            counts[table.Pick((g + 0.5) / Grid)]++;
        }

        double total = weights.Sum();
        for (int k = 0; k < weights.Length; k++)
        {
            Assert.Equal(weights[k] / total, counts[k] / (double)Grid, (weights.Length + 1.0) / Grid);
            if (weights[k] == 0.0)
            {
                Assert.Equal(0, counts[k]);
            }
        }
    }

    [Fact]
    public void A_draw_just_below_one_picks_an_outcome_of_the_last_column()
    {
        // Exact by hand: u·n may round up to n for u just below 1; the last column is read, never one past it.
        var table = AliasTable.Of([1.0, 1.0, 1.0]);
        Assert.Equal(2, table.Pick(Math.BitDecrement(1.0)));
        Assert.Equal(0, table.Pick(0.0));
    }

    [Theory]
    [InlineData(new[] { 0.0, 0.0 })]
    [InlineData(new[] { 1.0, -1.0 })]
    [InlineData(new[] { 1.0, double.NaN })]
    [InlineData(new[] { double.PositiveInfinity })]
    public void Weights_that_are_not_a_distribution_are_refused(double[] weights)
    {
        // Exact by hand: a negative, unknown or infinite weight, or no positive one, has no distribution to draw from.
        Assert.ThrowsAny<ArgumentException>(() => AliasTable.Of(weights));
    }
}
