using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Presentation.Solution;
using NetSolve.Solving;

namespace NetSolve.Presentation.Scenarios;

/// <summary>
/// The registry of what a scenario comparison compares: a selection of the solution's own unit and total metrics, so
/// a compared metric has the same id, header and dimension as in <c>solve</c>. Order is the contract's.
/// </summary>
public static class ComparedMetrics
{
    /// <summary>The unit metrics compared, in the order of the contract's unit objects and CSV rows.</summary>
    public static readonly ImmutableArray<Column<UnitResult>> Units =
    [
        UnitColumns.Servers, UnitColumns.ArrivalRate, UnitColumns.Utilisation, UnitColumns.MeanWait,
        UnitColumns.MeanTimeInUnit, UnitColumns.MeanInUnit,
    ];

    /// <summary>The network totals compared, in the order of the contract's <c>totals</c> object and CSV rows.</summary>
    public static readonly ImmutableArray<Column<NetworkTotals>> Totals =
        [TotalsColumns.ExternalArrivalRate, TotalsColumns.MeanInSystem, TotalsColumns.MeanTimeInSystem];

    /// <summary>The value of <paramref name="column"/> for <paramref name="row"/>; absent when the row is (a unit added or closed).</summary>
    public static Cell Read<TRow>(Column<TRow> column, TRow? row)
        where TRow : class
    {
        ArgumentNullException.ThrowIfNull(column);
        return row is null ? Cell.Of(null, column.Dimension) : column.Read(row);
    }

    /// <summary>The change of <paramref name="column"/> in Core's units (hours, per hour), for people.</summary>
    public static MetricChange Change<TRow>(Column<TRow> column, TRow? before, TRow? after)
        where TRow : class =>
        new(Read(column, before).Number, Read(column, after).Number);

    /// <summary>The change of <paramref name="column"/> in <paramref name="timeUnit"/>, for JSON and CSV.</summary>
    /// <remarks>
    /// Both values are converted first and the change is taken between the converted values, so that a program
    /// subtracting the file's <c>base</c> from its <c>scenario</c> gets the file's <c>change</c> to the last bit.
    /// </remarks>
    public static MetricChange InFileUnit<TRow>(Column<TRow> column, TRow? before, TRow? after, TimeUnit timeUnit)
        where TRow : class =>
        new(MachineFormat.Value(Read(column, before), timeUnit), MachineFormat.Value(Read(column, after), timeUnit));
}
