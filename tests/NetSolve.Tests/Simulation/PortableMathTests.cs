using NetSolve.Simulation;

namespace NetSolve.Tests.Simulation;

public sealed class PortableMathTests
{
    // Common practice: a libm-quality exp or log is within one ulp of the correctly rounded value, so two
    // implementations of that quality differ by at most two ulps; the platform's Math.Exp and Math.Log are the reference.
    private const long AllowedUlps = 2;

    [Fact]
    public void Exp_agrees_with_the_platform_within_two_ulps_over_its_whole_range()
    {
        var random = new Xoshiro256StarStar(2024, 0);
        for (int i = 0; i < 20_000; i++)
        {
            double x = (random.NextDouble() * 1_450.0) - 740.0;
            AssertWithinUlps(Math.Exp(x), PortableMath.Exp(x), x);
        }

        for (int i = 0; i < 5_000; i++)
        {
            double x = (random.NextDouble() * 2.0) - 1.0;
            AssertWithinUlps(Math.Exp(x), PortableMath.Exp(x), x);
        }
    }

    [Fact]
    public void Log_agrees_with_the_platform_within_two_ulps_for_every_positive_exponent()
    {
        var random = new Xoshiro256StarStar(2025, 0);
        for (int i = 0; i < 20_000; i++)
        {
            // Random bits of a positive finite double: every exponent, subnormals included, equally often.
            double x = BitConverter.Int64BitsToDouble((long)(random.NextUInt64() % 0x7FF0_0000_0000_0000UL));
            if (x == 0.0)
            {
                continue;
            }

            AssertWithinUlps(Math.Log(x), PortableMath.Log(x), x);
        }

        for (int i = 0; i < 5_000; i++)
        {
            double x = 0.5 + random.NextDouble();
            AssertWithinUlps(Math.Log(x), PortableMath.Log(x), x);
        }
    }

    [Fact]
    public void Pow_of_a_fraction_agrees_with_the_platform_to_thirteen_digits()
    {
        // Exact by hand: e^(y·log x) carries the rounding of y·log x (at most |y·log x|·2^−53 relative, below 1e-13 here).
        var random = new Xoshiro256StarStar(2026, 0);
        for (int i = 0; i < 5_000; i++)
        {
            double x = random.NextOpenDouble();
            double y = 1.0 + (random.NextDouble() * 9.0);
            double expected = Math.Pow(x, y);
            Assert.Equal(expected, PortableMath.Pow(x, y), expected * 1e-13);
        }
    }

    [Fact]
    public void The_edges_of_the_range_give_the_exact_answers()
    {
        // Exact by hand: IEEE values at the edges.
        Assert.Equal(1.0, PortableMath.Exp(0.0));
        Assert.Equal(0.0, PortableMath.Log(1.0));
        Assert.Equal(double.PositiveInfinity, PortableMath.Exp(710.0));
        Assert.Equal(0.0, PortableMath.Exp(-746.0));
        Assert.Equal(double.NegativeInfinity, PortableMath.Log(0.0));
        Assert.True(double.IsNaN(PortableMath.Log(-1.0)));
        Assert.True(double.IsNaN(PortableMath.Exp(double.NaN)));
        Assert.Equal(Math.Log(double.Epsilon), PortableMath.Log(double.Epsilon));
        Assert.Equal(Math.Log(double.MaxValue), PortableMath.Log(double.MaxValue));
    }

    private static void AssertWithinUlps(double expected, double actual, double argument)
    {
        long distance = Math.Abs(BitConverter.DoubleToInt64Bits(expected) - BitConverter.DoubleToInt64Bits(actual));
        Assert.True(distance <= AllowedUlps, string.Create(System.Globalization.CultureInfo.InvariantCulture, $"at {argument:R}: expected {expected:R}, got {actual:R} ({distance} ulps)"));
    }
}
