using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Scenarios;

/// <summary>How a change reads for people: values as <see cref="PeopleFormat"/> shows them, differences with their sign.</summary>
/// <remarks>
/// A share changes in percentage points (<c>+3.2 pt</c>), a time by a signed time in the unit that reads best
/// (<c>+4.2 min</c>), anything else by a signed number; a relative change is a signed percentage (<c>+12.5%</c>).
/// </remarks>
public static class ChangeFormat
{
    /// <summary>The difference <paramref name="change"/> of a <paramref name="dimension"/> in Core's units; <c>-</c> when absent.</summary>
    public static string Absolute(double? change, MetricDimension dimension, TimeUnit timeUnit) => change is not double value
        ? PeopleFormat.Missing
        : dimension switch
        {
            MetricDimension.Time => PeopleFormat.SignedTime(value),
            MetricDimension.Fraction => PeopleFormat.Points(value),
            _ => PeopleFormat.SignedNumber(MachineFormat.Convert(value, dimension, timeUnit)),
        };

    /// <summary>A relative change as a signed percentage; <c>-</c> when absent.</summary>
    public static string Relative(double? relative) => relative is double value ? PeopleFormat.SignedPercent(value) : PeopleFormat.Missing;

    /// <summary><c>base -&gt; scenario (+change, +relative%)</c> for one metric.</summary>
    public static string BeforeAfter(MetricChange change, MetricDimension dimension, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(change);
        return $"{PeopleFormat.Cell(Cell.Of(change.Before, dimension), timeUnit)} -> {PeopleFormat.Cell(Cell.Of(change.After, dimension), timeUnit)} "
            + $"({Absolute(change.Absolute, dimension, timeUnit)}, {Relative(change.Relative)})";
    }
}
