using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;
using NetSolve.Presentation.Solution;
using NetSolve.Solving;

namespace NetSolve.Presentation.Growth;

/// <summary>The registry of the long-format growth CSV: one row per factor and unit, ready to plot.</summary>
public static class GrowthRowColumns
{
    /// <summary>The multiple of today's demand.</summary>
    public static readonly Column<GrowthRow> Factor = Columns.Number<GrowthRow>("factor", "factor", MetricDimension.Factor, row => row.Factor);

    /// <summary>The unit's id; named <c>unit</c> here, as a plotting tool reads a long table.</summary>
    public static readonly Column<GrowthRow> Unit = Columns.Words<GrowthRow>("unit", "unit", row => row.Result.Unit.Id);

    /// <summary>The network's time unit.</summary>
    public static readonly Column<GrowthRow> TimeUnit = Columns.Words<GrowthRow>("time_unit", "time unit", row => TimeConstants.Name(row.TimeUnit));

    /// <summary>The growth factor at which 1% of the unit's arrivals find it full (the same on every row of the unit).</summary>
    public static readonly Column<GrowthRow> Full1Percent = Columns.Number<GrowthRow>(
        "full_1pct_at", "1% full at", MetricDimension.Factor, row => row.BedLimit?.Full1PercentFactor);

    /// <summary>The growth factor at which 5% of the unit's arrivals find it full (the same on every row of the unit).</summary>
    public static readonly Column<GrowthRow> Full5Percent = Columns.Number<GrowthRow>(
        "full_5pct_at", "5% full at", MetricDimension.Factor, row => row.BedLimit?.Full5PercentFactor);

    /// <summary>The columns appended when some unit has a capacity: P(full) at the row's factor and the unit's bed limit.</summary>
    public static readonly ImmutableArray<Column<GrowthRow>> BedLimitColumns = [OfUnit(UnitColumns.PFull), Full1Percent, Full5Percent];

    /// <summary>Every column, in the contract's order: the unit metrics are the solution's registry.</summary>
    public static readonly ImmutableArray<Column<GrowthRow>> All =
    [
        Factor, Unit, OfUnit(UnitColumns.Utilisation), OfUnit(UnitColumns.MeanWait), OfUnit(UnitColumns.MeanTimeInUnit),
        OfUnit(UnitColumns.Status), TimeUnit,
    ];

    /// <summary>Every unit at every factor, factors in the order requested, units in file order.</summary>
    public static ResultTable Table(GrowthResult growth)
    {
        ArgumentNullException.ThrowIfNull(growth);
        var timeUnit = growth.Network.TimeUnit;
        var limits = growth.BedLimits.ToDictionary(point => point.UnitId, StringComparer.Ordinal);
        var rows = growth.Steps.SelectMany(step => step.Solution.Units.Select(
            result => new GrowthRow(step.Factor, result, timeUnit, limits.GetValueOrDefault(result.Unit.Id))));
        return ResultTable.Build(growth.BedLimits.IsEmpty ? All : [.. All, .. BedLimitColumns], rows, timeUnit);
    }

    private static Column<GrowthRow> OfUnit(Column<UnitResult> column) =>
        new(column.Id, column.Header, column.Dimension, row => column.Read(row.Result), column.Audience);
}
