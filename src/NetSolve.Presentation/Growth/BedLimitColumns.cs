using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Growth;

/// <summary>The registry of a unit's bed limit as demand grows: ids as in the contract's <c>bed_limits</c> objects.</summary>
public static class BedLimitColumns
{
    /// <summary>The unit.</summary>
    public static readonly Column<BedLimitPoint> Unit = Columns.Words<BedLimitPoint>("unit", "unit", point => point.UnitId);

    /// <summary>Its capacity: most patients at once.</summary>
    public static readonly Column<BedLimitPoint> Capacity = Columns.Number<BedLimitPoint>("capacity", "capacity", MetricDimension.Count, point => point.Capacity);

    /// <summary>The share of arrivals that find it full today.</summary>
    public static readonly Column<BedLimitPoint> FullToday = Columns.Number<BedLimitPoint>("p_full", "P(full) today", MetricDimension.Probability, point => point.FullToday);

    /// <summary>The growth factor at which 1% of arrivals find it full; absent when not reached by x1000.</summary>
    public static readonly Column<BedLimitPoint> Full1Percent = Columns.Number<BedLimitPoint>("full_1pct_at", "1% full at", MetricDimension.Factor, point => point.Full1PercentFactor);

    /// <summary>The growth factor at which 5% of arrivals find it full; absent when not reached by x1000.</summary>
    public static readonly Column<BedLimitPoint> Full5Percent = Columns.Number<BedLimitPoint>("full_5pct_at", "5% full at", MetricDimension.Factor, point => point.Full5PercentFactor);

    /// <summary>Every column, in the contract's order.</summary>
    public static readonly ImmutableArray<Column<BedLimitPoint>> All = [Unit, Capacity, FullToday, Full1Percent, Full5Percent];

    /// <summary>The bed limits of <paramref name="growth"/>: units with a capacity, in file order.</summary>
    public static ResultTable Table(GrowthResult growth)
    {
        ArgumentNullException.ThrowIfNull(growth);
        return ResultTable.Build(All, growth.BedLimits, growth.Network.TimeUnit);
    }
}
