using NetSolve.Model;
using NetSolve.Presentation.Solution;
using NetSolve.Presentation.Staffing;
using NetSolve.Solving;

namespace NetSolve.Tests.Presentation.Staffing;

public sealed class BeforeAndAfterTests
{
    [Fact]
    public void The_pair_takes_the_metric_id_and_header_with_before_and_after()
    {
        var before = BeforeAndAfter.Before<UnitResult, UnitResult>(UnitColumns.MeanWait, result => result);
        var after = BeforeAndAfter.After<UnitResult, UnitResult>(UnitColumns.MeanWait, result => result);

        Assert.Equal(("mean_wait_before", "wait now", MetricDimension.Time), (before.Id, before.Header, before.Dimension));
        Assert.Equal(("mean_wait_after", "wait after", MetricDimension.Time), (after.Id, after.Header, after.Dimension));
    }

    [Fact]
    public void Without_a_network_after_the_value_is_absent_and_keeps_its_dimension()
    {
        var after = BeforeAndAfter.After<string, UnitResult>(UnitColumns.Utilisation, _ => null);

        var cell = after.Read("any unit");

        Assert.Null(cell.Number);
        Assert.Equal(MetricDimension.Fraction, cell.Dimension);
    }
}
