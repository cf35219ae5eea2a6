using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Pathways;

/// <summary>The registry of a named sequence's own fields: ids as in the contract's <c>path</c> object, after its units.</summary>
public static class PathTotalsColumns
{
    /// <summary>The sum of the mean times in unit along the sequence; absent when a unit on it is unstable.</summary>
    public static readonly Column<PathResult> MeanTime = Columns.Number<PathResult>("mean_time", "mean time along the path", MetricDimension.Time, path => path.MeanTimeHours);

    /// <summary>The chance that a patient finishing at the first unit goes through the rest in this order. People read chances as percentages.</summary>
    public static readonly Column<PathResult> StepProbability = Columns.Number<PathResult>("step_probability", "chance of following it", MetricDimension.Fraction, path => path.StepProbability);

    /// <summary>Every field, in the contract's order.</summary>
    public static readonly ImmutableArray<Column<PathResult>> All = [MeanTime, StepProbability];

    /// <summary>The one-row table of <paramref name="path"/>.</summary>
    public static ResultTable Table(PathResult path, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(path);
        return ResultTable.Build(All, [path], timeUnit);
    }
}
