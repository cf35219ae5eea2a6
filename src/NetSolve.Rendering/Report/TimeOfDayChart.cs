using System.Globalization;
using NetSolve.Presentation.Simulation;
using NetSolve.Simulation;
using ScottPlot;

namespace NetSolve.Rendering.Report;

/// <summary>Draws the simulated mean queue by hour of day with ScottPlot, as SVG: one line per unit, 24 points each.</summary>
/// <remarks>
/// Shows the units of <see cref="TimeOfDayQueues.Shown"/> (highest peak first, at most <see cref="ChartSeriesStyles.Count"/>),
/// styled as the wait chart. Each hour's mean is drawn at the middle of its hour (00:00–01:00 at 00:30); an hour the
/// run never measured is left out. Same size and conventions as <see cref="WaitChart"/>.
/// </remarks>
public static class TimeOfDayChart
{
    /// <summary>The x-axis is labelled every this many hours.</summary>
    private const int TickEveryHours = 3;

    /// <summary>The x position of an hour's point: its middle.</summary>
    private const double HourMiddle = 0.5;

    /// <summary>The y-axis ends this far above the highest peak (relative), so the top line never touches the frame.</summary>
    private const double HeadroomAbovePeak = 1.15;

    /// <summary>The chart as an SVG document; null when no unit had a queue.</summary>
    public static string? Svg(SimulationResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        var shown = TimeOfDayQueues.Shown(result, ChartSeriesStyles.Count);
        if (shown.Count == 0)
        {
            return null;
        }

        var plot = new Plot();
        plot.Font.Set("DejaVu Sans");
        for (int i = 0; i < shown.Count; i++)
        {
            var measured = Enumerable.Range(0, TimeOfDayQueues.HoursOfDay)
                .Where(hour => shown[i].MeanQueueByHour[hour] is not null)
                .ToList();
            double[] hours = measured.Select(hour => hour + HourMiddle).ToArray();
            double[] queues = measured.Select(hour => shown[i].MeanQueueByHour[hour]!.Value.Mean).ToArray();
            var series = plot.Add.Scatter(hours, queues);
            series.LegendText = ReportText.Legend(shown[i].Unit.Label);
            ChartSeriesStyles.Apply(series, i);
        }

        plot.XLabel("Hour of day (each point is the mean over its hour)");
        plot.YLabel("Mean queue (patients waiting)");
        plot.Axes.SetLimitsX(0.0, TimeOfDayQueues.HoursOfDay);
        // 00:00 to 21:00: a label at 24:00 would run off the right edge of the chart.
        double[] ticks = Enumerable.Range(0, TimeOfDayQueues.HoursOfDay / TickEveryHours).Select(k => (double)(k * TickEveryHours)).ToArray();
        plot.Axes.Bottom.SetTicks(ticks, ticks.Select(HourLabel).ToArray());
        plot.Axes.Left.TickGenerator = new ScottPlot.TickGenerators.NumericAutomatic
        {
            LabelFormatter = value => value.ToString("0.###", CultureInfo.InvariantCulture),
        };
        plot.Axes.SetLimitsY(0.0, shown.Max(TimeOfDayQueues.Peak) * HeadroomAbovePeak);
        // Below the plot: queues run high at both ends of the day, where a legend inside would cover them.
        plot.ShowLegend(Edge.Bottom);
        return WaitChart.WithViewBox(WaitChart.RenumberIds(plot.GetSvgXml(WaitChart.Width, WaitChart.Height), "time-of-day-clip-"));
    }

    private static string HourLabel(double hour) =>
        ((int)hour).ToString("00", CultureInfo.InvariantCulture) + ":00";
}
