using System.Globalization;
using NetSolve.Presentation.ByHour;
using NetSolve.Rendering.Staffing;
using ScottPlot;

namespace NetSolve.Rendering.Report;

/// <summary>
/// Draws the mean queue by hour from the time-varying formulas with ScottPlot, as SVG: one line per unit over the
/// cycle (a day, or a week with a day-of-week profile), no simulation needed.
/// </summary>
/// <remarks>
/// Shows the units whose arrivals or servers vary and that have a queue, longest worst-hour wait first, at most
/// <see cref="ChartSeriesStyles.Count"/>, styled as the simulated time-of-day chart so the two read alike; the hour
/// axis is the roster chart's (<see cref="RosterChart"/>). Each hour's mean is drawn at the middle of its hour.
/// </remarks>
public static class ByHourChart
{
    /// <summary>The x position of an hour's point: its middle.</summary>
    private const double HourMiddle = 0.5;

    /// <summary>The y-axis ends this far above the highest peak (relative), so the top line never touches the frame.</summary>
    private const double HeadroomAbovePeak = 1.15;

    /// <summary>The units drawn, longest worst-hour wait first.</summary>
    public static IReadOnlyList<ByHourUnit> Shown(IEnumerable<ByHourUnit> units) =>
        [.. units.Where(unit => unit.Varies && unit.Waits.IsStable && unit.Waits.MeanQueueByHour.Max() > 0.0)
            .OrderByDescending(unit => unit.MeanWaitHours(unit.WorstHour!.Value))
            .ThenBy(unit => unit.UnitId, StringComparer.Ordinal)
            .Take(ChartSeriesStyles.Count)];

    /// <summary>The chart as an SVG document; null when no unit that varies by hour has a queue.</summary>
    /// <param name="units">Every unit's hour-by-hour values (<see cref="ByHourUnit.All"/>).</param>
    /// <param name="labelOf">The label to show for a unit id.</param>
    public static string? Svg(IReadOnlyList<ByHourUnit> units, Func<string, string> labelOf)
    {
        ArgumentNullException.ThrowIfNull(units);
        ArgumentNullException.ThrowIfNull(labelOf);
        var shown = Shown(units);
        if (shown.Count == 0)
        {
            return null;
        }

        int cycleHours = shown[0].CycleHours;
        var plot = new Plot();
        plot.Font.Set("DejaVu Sans");
        for (int i = 0; i < shown.Count; i++)
        {
            double[] hours = [.. Enumerable.Range(0, cycleHours).Select(hour => hour + HourMiddle)];
            var series = plot.Add.Scatter(hours, shown[i].Waits.MeanQueueByHour.ToArray());
            series.LegendText = ReportText.Legend(labelOf(shown[i].UnitId));
            ChartSeriesStyles.Apply(series, i);
            if (cycleHours > Model.ArrivalProfile.HoursPerDay)
            {
                series.MarkerSize = 0;
            }
        }

        plot.XLabel(cycleHours == Model.ArrivalProfile.HoursPerDay
            ? "Hour of day (each point is the mean over its hour)"
            : "Day and hour of the week (each point is the mean over its hour)");
        plot.YLabel("Mean queue (patients waiting)");
        plot.Axes.SetLimitsX(0.0, cycleHours);
        double[] ticks = RosterChart.Ticks(cycleHours);
        plot.Axes.Bottom.SetTicks(ticks, [.. ticks.Select(hour => RosterChart.HourLabel(hour, cycleHours))]);
        plot.Axes.Left.TickGenerator = new ScottPlot.TickGenerators.NumericAutomatic
        {
            LabelFormatter = value => value.ToString("0.###", CultureInfo.InvariantCulture),
        };
        plot.Axes.SetLimitsY(0.0, shown.Max(unit => unit.Waits.MeanQueueByHour.Max()) * HeadroomAbovePeak);
        plot.ShowLegend(Edge.Bottom);
        return WaitChart.WithViewBox(WaitChart.RenumberIds(plot.GetSvgXml(WaitChart.Width, WaitChart.Height), "by-hour-clip-"));
    }
}
