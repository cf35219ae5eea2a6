using NetSolve.Rendering.Report;
using NetSolve.Solving;

namespace NetSolve.Tests.Rendering;

/// <summary>The wait chart draws the unit the finding names first and says so in its legend.</summary>
public sealed class WaitChartFindingTests
{
    [Theory]
    [InlineData("harbourside")]
    [InlineData("kestrel-general")]
    [InlineData("fenwick-winter-surge")]
    [InlineData("larkspur-simulation")]
    public void The_first_curve_is_the_unit_that_saturates_first_and_its_legend_says_so(string example)
    {
        var solution = RenderingFixtures.Solved(example);
        var growth = WaitGrowth.Compute(solution);
        var first = solution.Units.Where(u => u.Status == UnitStatus.Bottleneck && u.Headroom is not null).Select(u => u.Unit.Id).ToList();
        if (first.Count == 0 || growth.Curves.IsEmpty)
        {
            return; // No finding names a unit: nothing to put first.
        }

        // Exact by hand: the finding (Finding.Summarise) names the bottleneck units; the chart must lead with one of them.
        var shown = WaitChart.Shown(growth);
        Assert.Contains(shown[0].UnitId, first, StringComparer.Ordinal);
        Assert.Contains("(saturates first)", WaitChart.Svg(growth), StringComparison.Ordinal);
    }

    [Fact]
    public void The_growth_axis_ends_at_the_last_factor_drawn_with_no_line_past_the_data()
    {
        var growth = WaitGrowth.Compute(RenderingFixtures.Solved("harbourside"));

        string svg = WaitChart.Svg(growth)!;

        // The saturation factor is named in the axis title instead of drawn as a dashed line beyond the data.
        Assert.Contains("first saturation at \u00D7", svg, StringComparison.Ordinal);
        Assert.DoesNotContain("stroke-dasharray", svg, StringComparison.Ordinal);
    }
}
