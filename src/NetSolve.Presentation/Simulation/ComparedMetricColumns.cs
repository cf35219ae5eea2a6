using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Presentation.Simulation;

/// <summary>
/// The registry of formula against simulation: ids as the CSV columns of <c>simulate --compare</c> and the fields of a
/// unit's <c>compare</c> objects in JSON. A row is one metric of one unit, so a value's dimension is the metric's (a
/// rate, a time, a probability, ...), not the column's.
/// </summary>
public static class ComparedMetricColumns
{
    /// <summary>The unit's id.</summary>
    public static readonly Column<ComparisonRow> Unit = Columns.Words<ComparisonRow>("unit", "unit", row => row.UnitId);

    /// <summary>The contract's name of the metric (<c>mean_wait</c>).</summary>
    public static readonly Column<ComparisonRow> Metric = Columns.Words<ComparisonRow>("metric", "metric", row => row.Metric.Name);

    /// <summary>The formula's value; absent for an unstable unit.</summary>
    public static readonly Column<ComparisonRow> Formula = new("formula", "formula", MetricDimension.Plain, row => Cell.Of(row.Metric.Formula, row.Metric.Dimension));

    /// <summary>The simulated mean.</summary>
    public static readonly Column<ComparisonRow> Simulated = new("simulated", "simulated", MetricDimension.Plain, row => EstimateCell.Mean(row.Metric.Simulated, row.Metric.Dimension), Audience.Machines);

    /// <summary>The 95% half-width of the simulated mean; absent with one replication.</summary>
    public static readonly Column<ComparisonRow> SimulatedHalfWidth = new("simulated" + EstimateCell.HalfWidthSuffix, "simulated", MetricDimension.Plain, row => EstimateCell.HalfWidth(row.Metric.Simulated, row.Metric.Dimension), Audience.Machines);

    /// <summary>The simulated mean with ± its half-width, for people.</summary>
    public static readonly Column<ComparisonRow> SimulatedForPeople = new("simulated", "simulated", MetricDimension.Plain, row => EstimateCell.Of(row.Metric.Simulated, row.Metric.Dimension), Audience.People);

    /// <summary>Whether the formula lies inside the simulation's 95% interval (<see cref="Analysis.ComparedMetric.Verdict"/>).</summary>
    public static readonly Column<ComparisonRow> Verdict = Columns.Words<ComparisonRow>("verdict", "verdict", row => row.Metric.Verdict);

    /// <summary>The formula's error relative to the simulated mean, a fraction (<see cref="Analysis.ComparedMetric.RelativeError"/>).</summary>
    public static readonly Column<ComparisonRow> RelativeError = Columns.Number<ComparisonRow>("relative_error", "error", MetricDimension.Plain, row => row.Metric.RelativeError, Audience.Machines);

    /// <summary>The relative error as a signed percentage for people (<c>+36.0%</c>: the formula is 36% above the simulation).</summary>
    public static readonly Column<ComparisonRow> RelativeErrorForPeople = Columns.Words<ComparisonRow>("relative_error", "error",
        row => row.Metric.RelativeError is double error ? PeopleFormat.SignedPercent(error) : PeopleFormat.Missing, Audience.People);

    /// <summary>The method of the unit's formula values (<see cref="UnitResult.Method"/>), on every CSV row.</summary>
    public static readonly Column<ComparisonRow> Method = Columns.Words<ComparisonRow>("method", "method", row => row.Method, Audience.Machines);

    /// <summary>The network's time unit, on every CSV row.</summary>
    public static readonly Column<ComparisonRow> TimeUnitName = Columns.Words<ComparisonRow>("time_unit", "time unit", row => TimeConstants.Name(row.TimeUnit), Audience.Machines);

    /// <summary>The long table, one row per unit and metric: CSV reads the columns for programs, the table those for people.</summary>
    /// <remarks><c>relative_error</c> and <c>method</c> came after <c>time_unit</c>, so they end the CSV row: a compatible extension.</remarks>
    public static readonly ImmutableArray<Column<ComparisonRow>> All =
        [Unit, Metric, Formula, Simulated, SimulatedHalfWidth, SimulatedForPeople, RelativeErrorForPeople, Verdict, TimeUnitName, RelativeError, Method];

    /// <summary>The fields of one metric's object in a unit's JSON <c>compare</c> object, keyed by the metric's name.</summary>
    public static readonly ImmutableArray<Column<ComparisonRow>> ForJson = [Formula, Simulated, SimulatedHalfWidth, Verdict, RelativeError];

    /// <summary>The long table of <paramref name="simulated"/> against <paramref name="formula"/>, one row per unit and metric.</summary>
    public static ResultTable Table(SimulationResult simulated, NetworkSolution formula)
    {
        ArgumentNullException.ThrowIfNull(simulated);
        return ResultTable.Build(All, ComparisonRow.Of(simulated, formula), simulated.Network.TimeUnit);
    }
}
