using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Journeys;
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
    /// <remarks>With an interval, ± the half-width the simulation's interval allows (<c>+12.0% ± 3.1%</c>).</remarks>
    public static readonly Column<ComparisonRow> RelativeErrorForPeople = Columns.Words<ComparisonRow>("relative_error", "error", RelativeErrorText, Audience.People);

    /// <summary>The method of the unit's formula values (<see cref="UnitResult.Method"/>), on every CSV row.</summary>
    public static readonly Column<ComparisonRow> Method = Columns.Words<ComparisonRow>("method", "method", row => row.Method, Audience.Machines);

    /// <summary>The network's time unit, on every CSV row.</summary>
    public static readonly Column<ComparisonRow> TimeUnitName = Columns.Words<ComparisonRow>("time_unit", "time unit", row => TimeConstants.Name(row.TimeUnit), Audience.Machines);

    /// <summary>Whether the formula is exact for the unit as simulated (<see cref="Analysis.ComparedMetric.IsFormulaExact"/>), on every CSV row.</summary>
    public static readonly Column<ComparisonRow> FormulaExact = Columns.Words<ComparisonRow>("formula_exact", "exact", row => row.Metric.IsFormulaExact ? "true" : "false", Audience.Machines);

    /// <summary>The half-width of the relative error the simulation's interval allows (<see cref="Analysis.ComparedMetric.RelativeErrorHalfWidth"/>).</summary>
    public static readonly Column<ComparisonRow> RelativeErrorHalfWidth = Columns.Number<ComparisonRow>("relative_error" + EstimateCell.HalfWidthSuffix, "error", MetricDimension.Plain, row => row.Metric.RelativeErrorHalfWidth, Audience.Machines);

    /// <summary>Which side an <c>outside</c> verdict points to, <c>run</c> or <c>formula</c> (<see cref="Analysis.ComparedMetric.Suspect"/>); empty otherwise.</summary>
    public static readonly Column<ComparisonRow> Suspect = new("suspect", "suspect", MetricDimension.Plain, SuspectCell, Audience.Machines);

    /// <summary>As <see cref="Suspect"/>, beside the verdict for people.</summary>
    public static readonly Column<ComparisonRow> SuspectForPeople = new("suspect", "points to", MetricDimension.Plain, SuspectCell, Audience.People);

    /// <summary>The long table, one row per unit and metric: CSV reads the columns for programs, the table those for people.</summary>
    /// <remarks>
    /// <c>relative_error</c> and <c>method</c> came after <c>time_unit</c>, and <c>formula_exact</c>, <c>suspect</c> and
    /// <c>relative_error_ci</c> after them, so they end the CSV row: compatible extensions.
    /// </remarks>
    public static readonly ImmutableArray<Column<ComparisonRow>> All =
        [Unit, Metric, Formula, Simulated, SimulatedHalfWidth, SimulatedForPeople, RelativeErrorForPeople, Verdict, SuspectForPeople, TimeUnitName, RelativeError, Method, FormulaExact, Suspect, RelativeErrorHalfWidth];

    /// <summary>The fields of one metric's object in a unit's JSON <c>compare</c> object, keyed by the metric's name.</summary>
    public static readonly ImmutableArray<Column<ComparisonRow>> ForJson = [Formula, Simulated, SimulatedHalfWidth, Verdict, RelativeError, RelativeErrorHalfWidth, Suspect];

    private static Cell SuspectCell(ComparisonRow row) => row.Metric.Suspect is string side ? Cell.Word(side) : Cell.Of(null, MetricDimension.Plain);

    private static string RelativeErrorText(ComparisonRow row)
    {
        if (row.Metric.RelativeError is not double error)
        {
            return PeopleFormat.Missing;
        }

        return row.Metric.RelativeErrorHalfWidth is double half
            ? PeopleFormat.SignedPercent(error) + " \u00B1 " + PeopleFormat.Percent(half)
            : PeopleFormat.SignedPercent(error);
    }

    /// <summary>The long table of <paramref name="simulated"/> against <paramref name="formula"/>, one row per unit and metric.</summary>
    public static ResultTable Table(SimulationResult simulated, NetworkSolution formula)
    {
        ArgumentNullException.ThrowIfNull(simulated);
        return ResultTable.Build(All, ComparisonRow.Of(simulated, formula).AddRange(JourneyComparisonRows.Of(simulated, formula)), simulated.Network.TimeUnit);
    }
}
