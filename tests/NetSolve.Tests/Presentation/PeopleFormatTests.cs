using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Tests.Presentation;

/// <summary>The people's number style against the rules written in docs/map-and-report.md, "Numbers for people".</summary>
public class PeopleFormatTests
{
    [Theory]
    [InlineData(2e-14, "< 0.0001")]
    [InlineData(1.854e-5, "< 0.0001")]
    [InlineData(0.18672, "0.1867")]
    [InlineData(2.6719, "2.672")]
    [InlineData(158.84, "158.8")]
    [InlineData(1200.0, "1,200")]
    [InlineData(12345678.0, "12,345,678")]
    [InlineData(1e300, "> 1,000,000,000,000,000")]
    [InlineData(-0.25, "-0.2500")]
    [InlineData(0.0, "0")]
    public void Numbers_never_use_an_exponent(double value, string expected) => Assert.Equal(expected, PeopleFormat.Number(value));

    [Theory]
    [InlineData(2e-14, "< 0.001 min")]
    [InlineData(0.0696, "4.176 min")]
    [InlineData(0.9999, "59.99 min")]
    [InlineData(1.570, "1.570 h")]
    [InlineData(47.9, "47.90 h")]
    [InlineData(132.1, "5.504 d")]
    [InlineData(0.0, "0")]
    public void Each_time_is_shown_in_the_unit_that_reads_best_with_the_unit_beside_it(double hours, string expected) =>
        Assert.Equal(expected, PeopleFormat.Time(hours));

    [Fact]
    public void Servers_are_grouped_and_unlimited_servers_say_so()
    {
        Assert.Equal("1,200", PeopleFormat.Cell(Cell.Of(Servers.Of(1200)), TimeUnit.Hour));
        Assert.Equal("unlimited", PeopleFormat.Cell(Cell.Of(Servers.Unlimited), TimeUnit.Hour));
    }

    [Fact]
    public void A_missing_value_is_a_dash_and_a_rate_is_per_the_files_time_unit()
    {
        Assert.Equal("-", PeopleFormat.Cell(Cell.Of(null, MetricDimension.Time), TimeUnit.Hour));
        Assert.Equal("240.0", PeopleFormat.Cell(Cell.Of(10.0, MetricDimension.Rate), TimeUnit.Day));
    }

    [Theory]
    [InlineData(0.125, "+12.5%")]
    [InlineData(-0.04, "-4.0%")]
    [InlineData(0.0, "0.0%")]
    [InlineData(12.5, "+1,250.0%")]
    public void Relative_changes_carry_their_sign(double relative, string expected) => Assert.Equal(expected, PeopleFormat.SignedPercent(relative));

    [Theory]
    [InlineData(0.8490, "84.9%")]
    [InlineData(0.0001, "< 0.1%")]
    [InlineData(1.076, "107.6%")]
    public void Shares_are_percentages_with_one_decimal(double fraction, string expected) => Assert.Equal(expected, PeopleFormat.Percent(fraction));

    [Theory]
    [InlineData(0.2531, "0.253")]
    [InlineData(0.0001, "< 0.001")]
    [InlineData(1.0, "1.000")]
    public void Probabilities_have_three_decimals(double probability, string expected) => Assert.Equal(expected, PeopleFormat.Probability(probability));
}
