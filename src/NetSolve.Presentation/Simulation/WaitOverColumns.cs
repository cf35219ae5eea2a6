using System.Collections.Immutable;
using NetSolve.Model;
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

    /// <summary>Every field, in the contract's order.</summary>
    public static readonly ImmutableArray<Column<WaitOverEstimate>> ForJson = [Wait, .. Probability.ForMachines];
}
