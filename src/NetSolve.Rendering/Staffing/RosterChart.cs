using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Staffing;
using NetSolve.Rendering.Map;
using NetSolve.Rendering.Report;
using ScottPlot;

namespace NetSolve.Rendering.Staffing;

/// <summary>
/// Draws an hour-by-hour roster with ScottPlot: per unit, its demand (offered load by hour) against the roster's servers
/// (a step line) and the flat staffing that meets the same targets (dashed), over the cycle (00:00 to 24:00, or a week).
/// </summary>
/// <remarks>
/// A unit keeps one colour for its three lines (the report's colours, <see cref="ChartSeriesStyles"/>), so a reader
/// matches a roster to its demand by colour, and the three quantities differ by line: demand solid with the unit's
/// marker at the middle of each hour (its mean over the hour), the roster a thicker solid step that changes on the hour,
/// the flat staffing dashed. At most <see cref="ChartSeriesStyles.Count"/> units are drawn, in network order; the title
/// says when there were more. Same fonts and conventions as the report's charts.
/// </remarks>
public static class RosterChart
{
    /// <summary>Chart width in SVG units: the report charts' width.</summary>
    public const int Width = WaitChart.Width;

    /// <summary>Chart height in SVG units: taller than the report's charts, for a legend of three lines per unit.</summary>
    public const int Height = 520;

    /// <summary>The x-axis of a day is labelled every this many hours.</summary>
    private const int TickEveryHours = 3;

    /// <summary>Demand is the mean over its hour, so it is drawn at the hour's middle.</summary>
    private const double HourMiddle = 0.5;

    /// <summary>The y-axis ends this far above the highest line (relative), so it never runs along the frame.</summary>
    private const double Headroom = 1.15;

    /// <summary>A roster line is this much wider than demand, so the steps read as the answer.</summary>
    private const float RosterLineWidth = 3;

    private static readonly string[] DayNames = ["Mon", "Tue", "Wed", "Thu", "Fri", "Sat", "Sun"];

    /// <summary>The chart's lines: three per unit drawn (demand, roster, flat staffing), unit by unit in network order.</summary>
    public static IReadOnlyList<RosterChartSeries> Series(HourlyStaffingPlan plan, Network network)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(network);
        var series = new List<RosterChartSeries>();
        var shown = plan.Units.Take(ChartSeriesStyles.Count).ToList();
        for (int i = 0; i < shown.Count; i++)
        {
            var unit = shown[i];
            string label = ReportText.Legend(network.Units.FirstOrDefault(u => string.Equals(u.Id, unit.UnitId, StringComparison.Ordinal))?.Label ?? unit.UnitId);
            int hours = unit.ServersByHour.Length;
            series.Add(new RosterChartSeries(
                i,
                RosterChartQuantity.Demand,
                label + ": demand (offered load, erlangs)",
                [.. Enumerable.Range(0, hours).Select(hour => hour + HourMiddle)],
                [.. unit.OfferedLoadByHour]));

            // Steps change on the hour: each hour's servers from its start to the next hour, the last held to the cycle's end.
            series.Add(new RosterChartSeries(
                i,
                RosterChartQuantity.Roster,
                label + string.Create(CultureInfo.InvariantCulture, $": servers on the roster ({unit.StaffHours} staff-hours)"),
                [.. Enumerable.Range(0, hours + 1).Select(hour => (double)hour)],
                [.. unit.ServersByHour.Select(servers => (double)servers), unit.ServersByHour[^1]]));
            series.Add(new RosterChartSeries(
                i,
                RosterChartQuantity.Flat,
                label + string.Create(CultureInfo.InvariantCulture, $": {unit.FlatServers} servers all the time ({unit.FlatStaffHours} staff-hours)"),
                [0.0, hours],
                [unit.FlatServers, unit.FlatServers]));
        }

        return series;
    }

    /// <summary>The chart's title: the network and the targets every hour meets, and how many units were left out.</summary>
    public static string Title(HourlyStaffingPlan plan, Network network)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(network);
        string omitted = plan.Units.Length > ChartSeriesStyles.Count
            ? string.Create(CultureInfo.InvariantCulture, $" (first {ChartSeriesStyles.Count} of {plan.Units.Length} units)")
            : string.Empty;
        return ReportText.Legend(network.Name) + omitted + "\nroster so that every hour is " + StaffingOutput.Describe(plan.Targets, network.TimeUnit);
    }

    /// <summary>The chart as an SVG document; null when no unit has a roster (every unit has unlimited servers).</summary>
    public static string? Svg(HourlyStaffingPlan plan, Network network)
    {
        var series = Series(plan, network);
        if (series.Count == 0)
        {
            return null;
        }

        var plot = new Plot();
        plot.Font.Set("DejaVu Sans");
        foreach (var line in series)
        {
            var scatter = plot.Add.Scatter(line.Hours.ToArray(), line.Values.ToArray());
            scatter.LegendText = line.Legend;
            Style(scatter, line);
        }

        int cycleHours = plan.CycleHours;
        plot.Title(Title(plan, network));
        plot.XLabel(cycleHours == ArrivalProfile.HoursPerDay ? "Hour of day" : "Day and hour of the week");
        plot.YLabel("Servers (demand: erlangs)");
        plot.Axes.SetLimitsX(0.0, cycleHours);
        plot.Axes.SetLimitsY(0.0, series.Max(line => line.Values.Max()) * Headroom);
        double[] ticks = Ticks(cycleHours);
        plot.Axes.Bottom.SetTicks(ticks, [.. ticks.Select(hour => HourLabel(hour, cycleHours))]);
        plot.Axes.Left.TickGenerator = new ScottPlot.TickGenerators.NumericAutomatic
        {
            LabelFormatter = value => value.ToString("0.###", CultureInfo.InvariantCulture),
        };
        plot.ShowLegend(Edge.Bottom);
        return WithViewBox(WaitChart.RenumberIds(plot.GetSvgXml(Width, Height), "roster-chart-clip-"));
    }

    /// <summary>The chart as PNG, rasterised from its SVG so both files show the same picture; null as for <see cref="Svg"/>.</summary>
    public static byte[]? Png(HourlyStaffingPlan plan, Network network) =>
        Svg(plan, network) is string svg ? PngMapRenderer.Render(svg) : null;

    /// <summary>Adds a viewBox when the SVG has none, so a page or viewer can scale the chart.</summary>
    private static string WithViewBox(string svg)
    {
        int root = svg.IndexOf("<svg", StringComparison.Ordinal);
        int end = root < 0 ? -1 : svg.IndexOf('>', root);
        return end < 0 || svg.AsSpan(root, end - root).Contains("viewBox", StringComparison.Ordinal)
            ? svg
            : svg.Insert(root + 4, string.Create(CultureInfo.InvariantCulture, $" viewBox=\"0 0 {Width} {Height}\""));
    }

    private static void Style(ScottPlot.Plottables.Scatter scatter, RosterChartSeries line)
    {
        scatter.Color = Color.FromHex(ChartSeriesStyles.Colours[line.UnitIndex]);
        switch (line.Quantity)
        {
            case RosterChartQuantity.Demand:
                scatter.LineWidth = 1.5f;
                scatter.MarkerShape = ChartSeriesStyles.Markers[line.UnitIndex];
                scatter.MarkerSize = 5;
                break;
            case RosterChartQuantity.Roster:
                scatter.LineWidth = RosterLineWidth;
                scatter.ConnectStyle = ConnectStyle.StepHorizontal;
                scatter.MarkerSize = 0;
                break;
            default:
                scatter.LineWidth = 2;
                scatter.LinePattern = LinePattern.Dashed;
                scatter.MarkerSize = 0;
                break;
        }
    }

    /// <summary>Every 3 hours of a day (a label at 24:00 would run off the chart), or each day's start of a week.</summary>
    internal static double[] Ticks(int cycleHours)
    {
        int step = cycleHours == ArrivalProfile.HoursPerDay ? TickEveryHours : ArrivalProfile.HoursPerDay;
        return [.. Enumerable.Range(0, cycleHours / step).Select(k => (double)(k * step))];
    }

    internal static string HourLabel(double hour, int cycleHours)
    {
        int whole = (int)hour;
        string clock = (whole % ArrivalProfile.HoursPerDay).ToString("00", CultureInfo.InvariantCulture) + ":00";
        return cycleHours == ArrivalProfile.HoursPerDay ? clock : DayNames[whole / ArrivalProfile.HoursPerDay % DayNames.Length] + " " + clock;
    }
}
