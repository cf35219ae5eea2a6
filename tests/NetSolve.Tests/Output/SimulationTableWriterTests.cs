using System.Globalization;
using System.Text.RegularExpressions;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Simulation;
using NetSolve.Simulation;

namespace NetSolve.Tests.Output;

public sealed partial class SimulationTableWriterTests
{
    // Exact by hand: 0.0696 h is 4.176 min and 0.00517 h is 0.3102 min; 30 h stays in hours, so its half-width of
    // 0.5 h does too (alone it would read 30.00 min); 0.6958 is 69.6% and 0.0032 is 0.3 points; a rate of 2 per hour
    // ± 0.1 is 48 ± 2.4 per day.
    [Theory]
    [InlineData(0.0696, 0.00517, MetricDimension.Time, TimeUnit.Hour, "4.176 \u00B1 0.3102 min")]
    [InlineData(30.0, 0.5, MetricDimension.Time, TimeUnit.Hour, "30.00 \u00B1 0.5000 h")]
    [InlineData(0.6958, 0.0032, MetricDimension.Fraction, TimeUnit.Hour, "69.6 \u00B1 0.3%")]
    [InlineData(0.4316, 0.0576, MetricDimension.Probability, TimeUnit.Hour, "0.432 \u00B1 0.058")]
    [InlineData(2.0, 0.1, MetricDimension.Rate, TimeUnit.Day, "48.00 \u00B1 2.400")]
    public void An_estimate_reads_as_the_mean_and_half_width_in_one_unit_written_once(double mean, double half, MetricDimension dimension, TimeUnit timeUnit, string expected)
    {
        Assert.Equal(expected, PeopleFormat.Cell(EstimateCell.Of(new Estimate(mean, half, 3), dimension), timeUnit));
    }

    // From issue 10: tables showed "8.33E-6 ± 2.313E-5". As a time in hours that is 0.0005 ± 0.0014 minutes.
    [Theory]
    [InlineData(MetricDimension.Time, "< 0.001 \u00B1 0.0014 min")]
    [InlineData(MetricDimension.Count, "< 0.0001 \u00B1 < 0.0001")]
    [InlineData(MetricDimension.Probability, "< 0.001 \u00B1 < 0.001")]
    public void A_tiny_estimate_is_shown_without_an_exponent(MetricDimension dimension, string expected)
    {
        Assert.Equal(expected, PeopleFormat.Cell(EstimateCell.Of(new Estimate(8.33e-6, 2.313e-5, 3), dimension), TimeUnit.Hour));
    }

    [Fact]
    public void With_one_replication_an_estimate_is_its_mean_alone()
    {
        Assert.Equal("4.176 min", PeopleFormat.Cell(EstimateCell.Of(new Estimate(0.0696, null, 1), MetricDimension.Time), TimeUnit.Hour));
    }

    [Fact]
    public void The_tables_of_a_simulation_and_its_comparison_show_no_exponent_and_no_time_unit_in_a_header()
    {
        var (simulated, formula) = SimulationRuns.Larkspur();
        using var output = new StringWriter(CultureInfo.InvariantCulture);
        SimulationTableWriter.Write(simulated, output);
        ComparisonTableWriter.Write(simulated, formula, output);
        string text = output.ToString();

        Assert.DoesNotMatch(Exponent(), text);
        Assert.DoesNotContain("(h)", text, StringComparison.Ordinal);
        Assert.Contains("rates per hour", text, StringComparison.Ordinal);
    }

    [GeneratedRegex(@"\d[eE][+-]?\d")]
    private static partial Regex Exponent();
}
