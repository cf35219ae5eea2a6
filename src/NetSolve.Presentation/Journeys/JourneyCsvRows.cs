using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Journeys;

/// <summary>
/// Adds the journeys to a per-unit CSV table: a CSV file holds one table, so the journeys come as rows after the units',
/// told apart by a <c>kind</c> column (<c>unit</c> or <c>journey</c>), with their figures in columns of their own at
/// the end of the row. A network without journeys keeps its table exactly as before.
/// </summary>
public static class JourneyCsvRows
{
    /// <summary>The column that says what a row describes.</summary>
    public const string KindId = "kind";

    /// <summary>The prefix of every journey figure's column, as the journey metrics of the comparison CSV.</summary>
    public const string Prefix = "journey_";

    /// <summary>
    /// The unit table with, when <paramref name="journeys"/> has rows, the <c>kind</c> column and
    /// <paramref name="columns"/> appended (empty on the units' rows) and one row per journey; a journey row has its
    /// id and label in the units' <c>id</c> and <c>label</c> columns and leaves the units' other cells empty.
    /// </summary>
    public static ResultTable Append<TJourney>(
        ResultTable units, IReadOnlyList<TJourney> journeys, Func<TJourney, string> id, Func<TJourney, string> label, IReadOnlyList<Column<TJourney>> columns)
    {
        ArgumentNullException.ThrowIfNull(units);
        ArgumentNullException.ThrowIfNull(journeys);
        ArgumentNullException.ThrowIfNull(id);
        ArgumentNullException.ThrowIfNull(label);
        ArgumentNullException.ThrowIfNull(columns);
        if (journeys.Count == 0)
        {
            return units;
        }

        var figures = ResultTable.Build(columns, journeys, units.TimeUnit);
        var kind = new ResultColumn(KindId, KindId, MetricDimension.Plain, IsText: true, Audience.Machines);
        var tail = UnitRowTail(figures.Columns.Length + 1);
        var unitRows = units.Rows.Select(row => row.AddRange(tail));
        var journeyRows = journeys.Select((journey, r) => units.Columns
            .Select(column => column.Id switch
            {
                "id" => Cell.Word(id(journey)),
                "label" => Cell.Word(label(journey)),
                _ => Empty,
            })
            .Append(Cell.Word("journey"))
            .Concat(figures.Rows[r])
            .ToImmutableArray());
        return new ResultTable(units.Columns.Add(kind).AddRange(figures.Columns), [.. unitRows, .. journeyRows], units.TimeUnit);
    }

    /// <summary>
    /// The cells <see cref="Append"/> puts after a unit's own, given how many columns it adds (0 without journeys):
    /// none, or the kind <c>unit</c> and an empty cell under each journey figure.
    /// </summary>
    public static ImmutableArray<Cell> UnitRowTail(int addedColumns) =>
        addedColumns == 0 ? [] : [Cell.Word("unit"), .. Enumerable.Repeat(Empty, addedColumns - 1)];

    /// <summary>The same column under the journey prefix, for programs only (<c>mean_time</c> becomes <c>journey_mean_time</c>).</summary>
    public static Column<TJourney> Prefixed<TJourney>(Column<TJourney> column)
    {
        ArgumentNullException.ThrowIfNull(column);
        string name = column.Id.StartsWith(Prefix, StringComparison.Ordinal) ? column.Id : Prefix + column.Id;
        return column with { Id = name, Audience = Audience.Machines };
    }

    /// <summary>Every distinct time over which some journey gives a share, shortest first: one column each.</summary>
    public static ImmutableArray<double> OverTimes(IEnumerable<IEnumerable<double>> perJourney)
    {
        ArgumentNullException.ThrowIfNull(perJourney);
        return [.. perJourney.SelectMany(times => times).Distinct().Order()];
    }

    /// <summary>The column id of the share longer than <paramref name="hours"/>, as the comparison CSV names it (<c>journey_over_4h</c>).</summary>
    public static string OverId(double hours) => Prefix + "over_" + hours.ToString("0.###", CultureInfo.InvariantCulture) + "h";

    private static Cell Empty => Cell.Of(null, MetricDimension.Plain);
}
