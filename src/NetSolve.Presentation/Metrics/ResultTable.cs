using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Presentation.Metrics;

/// <summary>A result kind's rows and columns, built once and written by every format's writer.</summary>
/// <param name="Columns">The metrics, in the contract's order.</param>
/// <param name="Rows">The cells of each row, one per column.</param>
/// <param name="TimeUnit">The time unit of the network: machine formats (JSON, CSV) convert to it.</param>
public sealed record ResultTable(ImmutableArray<ResultColumn> Columns, ImmutableArray<ImmutableArray<Cell>> Rows, TimeUnit TimeUnit)
{
    /// <summary>Reads every column of <paramref name="columns"/> from every row of <paramref name="rows"/>.</summary>
    public static ResultTable Build<TRow>(IEnumerable<Column<TRow>> columns, IEnumerable<TRow> rows, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(columns);
        ArgumentNullException.ThrowIfNull(rows);
        var columnList = columns.ToImmutableArray();
        var cells = rows.Select(row => columnList.Select(column => column.Read(row)).ToImmutableArray()).ToImmutableArray();
        var described = columnList.Select((column, index) => new ResultColumn(
            column.Id, column.Header, column.Dimension, cells.Any(row => row[index].IsText), column.Audience)).ToImmutableArray();
        return new ResultTable(described, cells, timeUnit);
    }

    // Read once per row by every writer: worked out once per table.
    private readonly ImmutableArray<int> _forPeople = Shown(Columns, Audience.People);
    private readonly ImmutableArray<int> _forMachines = Shown(Columns, Audience.Machines);

    /// <summary>The indexes of the columns shown to <paramref name="audience"/>, in order.</summary>
    public ImmutableArray<int> ColumnsFor(Audience audience) => audience switch
    {
        Audience.People => _forPeople,
        Audience.Machines => _forMachines,
        _ => [.. Enumerable.Range(0, Columns.Length)],
    };

    /// <summary>True when a column for <paramref name="columnAudience"/> is shown to <paramref name="audience"/>.</summary>
    public static bool Shows(Audience columnAudience, Audience audience) => columnAudience == Audience.All || columnAudience == audience;

    private static ImmutableArray<int> Shown(ImmutableArray<ResultColumn> columns, Audience audience) =>
        [.. Enumerable.Range(0, columns.Length).Where(i => Shows(columns[i].Audience, audience))];
}
