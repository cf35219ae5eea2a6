using NetSolve.Model;
using NetSolve.Parsing.Values;

namespace NetSolve.Tests.Core.Parsing;

public class ValueKindsTests
{
    [Fact]
    public void A_default_result_holds_no_value_and_says_so()
    {
        var nothing = default(ValueResult<double>);

        Assert.False(nothing.IsValid);
        Assert.Equal("no value was read", nothing.Error);
        Assert.Throws<InvalidOperationException>(() => nothing.Value);
    }

    [Fact]
    public void A_valid_result_has_a_value_and_no_error()
    {
        var result = NumberValue.Parse("2.5e-3");

        Assert.True(result.IsValid);
        Assert.Equal(0.0025, result.Value);
        Assert.Throws<InvalidOperationException>(() => result.Error);
    }

    [Fact]
    public void The_message_names_the_field_before_the_error()
    {
        Assert.Equal("service_cv: 'high' is not a number", NumberValue.Parse("high").MessageFor("service_cv"));
        Assert.Equal("route to 'lab'", FieldLabels.For(FieldLabels.RouteTo, "lab"));
        Assert.Equal("servers", FieldLabels.For(FieldLabels.Servers, null));
    }

    // Exact by hand: 1e-320 h is a subnormal double; the range is 1e-6 s (2.8e-10 h) to 100 years (36,525 d), so
    // 1e-300 h and 1e300 d are refused although their reciprocals are finite, and 1e-9 h (3.6e-6 s) and 36,500 d pass.
    [Theory]
    [InlineData("1e-320h", false)]
    [InlineData("1e-310min", false)]
    [InlineData("1e-300h", false)]
    [InlineData("1e300d", false)]
    [InlineData("36600d", false)]
    [InlineData("1e-9h", true)]
    [InlineData("36500d", true)]
    public void A_duration_is_refused_when_its_service_rate_would_not_be_a_finite_number(string text, bool valid)
    {
        var result = DurationValue.Parse(text, TimeUnit.Hour);

        Assert.Equal(valid, result.IsValid);
        if (valid)
        {
            Assert.True(double.IsFinite(1.0 / result.Value));
        }
    }

    [Theory]
    [InlineData("unlimited", 0, true)]
    [InlineData("1", 1, false)]
    [InlineData("007", 7, false)]
    [InlineData("1000000", 1_000_000, false)]
    public void Servers_read_digits_or_unlimited(string text, int count, bool unlimited)
    {
        var servers = ServersValue.Parse(text).Value;

        Assert.Equal(count, servers.Count);
        Assert.Equal(unlimited, servers.IsUnlimited);
    }

    [Theory]
    [InlineData("+3")]
    [InlineData("3 ")]
    [InlineData("1e3")]
    [InlineData("Unlimited")]
    [InlineData("")]
    public void Servers_refuse_signs_spaces_exponents_and_other_words(string text)
    {
        Assert.False(ServersValue.Parse(text).IsValid);
    }

    [Theory]
    [InlineData("+2", 2)]
    [InlineData("-1", -1)]
    [InlineData("3", 3)]
    public void Servers_to_add_take_an_optional_sign(string text, int added)
    {
        Assert.Equal(added, AddedServersValue.Parse(text).Value);
    }

    [Fact]
    public void A_factor_on_arrivals_may_be_zero_but_a_factor_on_a_time_may_not()
    {
        Assert.Equal(0.0, FactorValue.NotNegative("0").Value);
        Assert.False(FactorValue.Positive("0").IsValid);
        Assert.Equal(0.8, FactorValue.Positive("0.8").Value);
    }
}
