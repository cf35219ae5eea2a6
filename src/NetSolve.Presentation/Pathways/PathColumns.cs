using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Pathways;

/// <summary>
/// The registry of the units of a named sequence: ids as in the contract's <c>path.units</c> objects, and the CSV
/// rows that follow the pathway's rows under the same header (<see cref="PathwayColumns.All"/>).
/// </summary>
public static class PathColumns
{
    /// <summary>The unit at this step.</summary>
    public static readonly Column<PathStepRow> Id = Columns.Words<PathStepRow>("id", "unit", row => row.UnitId);

    /// <summary>Mean time in the unit per visit, wait plus service; absent when it is unstable.</summary>
    public static readonly Column<PathStepRow> MeanTimeInUnit = Columns.Number<PathStepRow>("mean_time_in_unit", "mean time in unit", MetricDimension.Time, row => row.MeanTimeHours);

    /// <summary>CSV: the word <c>path</c> in the pathway's <c>from</c> column marks a row of the sequence.</summary>
    public static readonly Column<PathStepRow> CsvFrom = Columns.Words<PathStepRow>("from", "from", _ => "path", Audience.Machines);

    /// <summary>CSV: the unit at this step, under the pathway's <c>unit</c> column.</summary>
    public static readonly Column<PathStepRow> CsvUnit = Id with { Id = "unit", Audience = Audience.Machines };

    /// <summary>CSV: empty under the pathway's <c>expected_visits</c>.</summary>
    public static readonly Column<PathStepRow> CsvExpectedVisits = Columns.Number<PathStepRow>("expected_visits", "expected visits", MetricDimension.Plain, _ => null, Audience.Machines);

    /// <summary>CSV: the chance of following the whole sequence step by step, on its last row only, under <c>visit_probability</c>.</summary>
    public static readonly Column<PathStepRow> CsvStepProbability = Columns.Number<PathStepRow>("visit_probability", "chance of following it", MetricDimension.Fraction, row => row.IsLast ? row.Path.StepProbability : null, Audience.Machines);

    /// <summary>CSV: <see cref="MeanTimeInUnit"/> under the pathway's <c>expected_time</c>.</summary>
    public static readonly Column<PathStepRow> CsvExpectedTime = MeanTimeInUnit with { Id = "expected_time", Audience = Audience.Machines };

    /// <summary>CSV: the network's time unit.</summary>
    public static readonly Column<PathStepRow> CsvTimeUnit = Columns.Words<PathStepRow>("time_unit", "time unit", row => TimeConstants.Name(row.TimeUnit), Audience.Machines);

    /// <summary>The columns of the table and of the JSON <c>path.units</c> objects.</summary>
    public static readonly ImmutableArray<Column<PathStepRow>> All = [Id, MeanTimeInUnit];

    /// <summary>The CSV columns, in the order of <see cref="PathwayColumns.All"/>.</summary>
    public static readonly ImmutableArray<Column<PathStepRow>> Csv = [CsvFrom, CsvUnit, CsvExpectedVisits, CsvStepProbability, CsvExpectedTime, CsvTimeUnit];

    /// <summary>The table of the steps of <paramref name="path"/> over <paramref name="columns"/>; no rows without a path.</summary>
    public static ResultTable Table(PathResult? path, TimeUnit timeUnit, IEnumerable<Column<PathStepRow>> columns) =>
        ResultTable.Build(columns, Enumerable.Range(0, path?.UnitIds.Length ?? 0).Select(k => new PathStepRow(path!, k, timeUnit)), timeUnit);
}
