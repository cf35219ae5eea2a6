using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Pathways;

/// <summary>
/// The registry of the units reached from a start unit: ids as in the contract's CSV columns and <c>from.units</c>
/// objects (which name the unit <c>id</c> where the CSV says <c>unit</c>), headers for people.
/// </summary>
public static class PathwayColumns
{
    /// <summary>The start unit. CSV only: the JSON states it once, in <c>from.unit</c>.</summary>
    public static readonly Column<PathwayRow> From = Columns.Words<PathwayRow>("from", "from", row => row.FromUnitId, Audience.Machines);

    /// <summary>The unit reached.</summary>
    public static readonly Column<PathwayRow> Unit = Columns.Words<PathwayRow>("unit", "unit", row => row.Visit.UnitId);

    /// <summary>The unit reached, under the JSON's name.</summary>
    public static readonly Column<PathwayRow> Id = Unit with { Id = "id" };

    /// <summary>Mean visits per patient entering at the start unit (the entry visit counts).</summary>
    public static readonly Column<PathwayRow> ExpectedVisits = Columns.Number<PathwayRow>("expected_visits", "expected visits", MetricDimension.Plain, row => row.Visit.ExpectedVisits);

    /// <summary>The chance of visiting the unit at least once; absent when not computed. People read chances as percentages.</summary>
    public static readonly Column<PathwayRow> VisitProbability = Columns.Number<PathwayRow>("visit_probability", "chance of visiting", MetricDimension.Fraction, row => row.Visit.VisitProbability);

    /// <summary>Expected visits times the mean time per visit; absent when the unit is unstable.</summary>
    public static readonly Column<PathwayRow> ExpectedTime = Columns.Number<PathwayRow>("expected_time", "expected time", MetricDimension.Time, row => row.Visit.ExpectedTimeHours);

    /// <summary>The network's time unit. CSV only: each row says the unit of its times.</summary>
    public static readonly Column<PathwayRow> TimeUnit = Columns.Words<PathwayRow>("time_unit", "time unit", row => TimeConstants.Name(row.TimeUnit), Audience.Machines);

    /// <summary>The CSV columns, which are also the table's (people do not see <see cref="From"/> and <see cref="TimeUnit"/>).</summary>
    public static readonly ImmutableArray<Column<PathwayRow>> All = [From, Unit, ExpectedVisits, VisitProbability, ExpectedTime, TimeUnit];

    /// <summary>The JSON <c>from.units</c> objects.</summary>
    public static readonly ImmutableArray<Column<PathwayRow>> Json = [Id, ExpectedVisits, VisitProbability, ExpectedTime];

    /// <summary>The table of the units reached in <paramref name="pathway"/> over <paramref name="columns"/>; no rows without a pathway.</summary>
    public static ResultTable Table(PathwayResult? pathway, TimeUnit timeUnit, IEnumerable<Column<PathwayRow>> columns) =>
        ResultTable.Build(columns, pathway?.Units.Select(visit => new PathwayRow(pathway.FromUnitId, visit, timeUnit)) ?? [], timeUnit);
}
