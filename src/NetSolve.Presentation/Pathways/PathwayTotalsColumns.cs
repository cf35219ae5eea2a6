using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Pathways;

/// <summary>The registry of a pathway's own fields: ids as in the contract's <c>from</c> object, beside its units.</summary>
public static class PathwayTotalsColumns
{
    /// <summary>The unit patients enter at.</summary>
    public static readonly Column<PathwayResult> Unit = Columns.Words<PathwayResult>("unit", "entering at", pathway => pathway.FromUnitId);

    /// <summary>Mean time from entry to leaving the network; absent when a unit on the way is unstable.</summary>
    public static readonly Column<PathwayResult> MeanTimeInSystem = Columns.Number<PathwayResult>("mean_time_in_system", "mean time in network", MetricDimension.Time, pathway => pathway.MeanTimeInNetworkHours);

    /// <summary>Every field, in the contract's order.</summary>
    public static readonly ImmutableArray<Column<PathwayResult>> All = [Unit, MeanTimeInSystem];

    /// <summary>The one-row table of <paramref name="pathway"/>.</summary>
    public static ResultTable Table(PathwayResult pathway, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(pathway);
        return ResultTable.Build(All, [pathway], timeUnit);
    }
}
