using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Simulation;

namespace NetSolve.Presentation.Simulation;

/// <summary>The registry of P(wait &gt; t): ids as in the objects of the contract's <c>p_wait_over</c> array.</summary>
public static class WaitOverColumns
{
    /// <summary>The time t.</summary>
    public static readonly Column<WaitOverEstimate> Wait = Columns.Number<WaitOverEstimate>("wait", "wait over", MetricDimension.Time, over => over.WaitHours);

    /// <summary>The share of patients starting service who waited longer than t.</summary>
    public static readonly EstimateMetric<WaitOverEstimate> Probability = new("probability", "P(wait > t)", MetricDimension.Probability, over => over.Probability);

    /// <summary>
    /// The one-sided 95% upper bound 3/n when no patient waited longer than t (the rule of three); absent (null)
    /// when such a wait was observed.
    /// </summary>
    public static readonly Column<WaitOverEstimate> UpperBound = Columns.Number<WaitOverEstimate>("upper_bound", "upper bound", MetricDimension.Probability, over => over.UpperBound);

    /// <summary>Every field, in the contract's order (<c>upper_bound</c> is a later, compatible extension).</summary>
    public static readonly ImmutableArray<Column<WaitOverEstimate>> ForJson = [Wait, .. Probability.ForMachines, UpperBound];

    /// <summary>
    /// The cell people read: the share ± its half-width, or <c>&lt; 0.0003</c> (the upper bound) when no patient
    /// waited longer than t, rather than a <c>0 ± 0</c> that would claim certainty.
    /// </summary>
    public static Cell ForPeople(WaitOverEstimate over)
    {
        ArgumentNullException.ThrowIfNull(over);
        return over.UpperBound is double bound
            ? Cell.Word(NotAbove + PeopleFormat.Number(bound))
            : EstimateCell.Of(over.Probability, MetricDimension.Probability);
    }

    private const string NotAbove = "< ";
}
