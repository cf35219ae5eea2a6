using System.Globalization;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using ScottPlot;

namespace NetSolve.Rendering.Report;

/// <summary>Draws mean wait against demand growth with ScottPlot, as SVG.</summary>
/// <remarks>
/// Shows the units that saturate first (the finding's), then those with the longest waits at the last factor, at
/// most <see cref="ChartSeriesStyles.Count"/>; the legend sits below the plot and the axes end at the data. The wait axis is in the unit
/// that reads best for the longest wait drawn, by the rule every time for people follows (<see cref="PeopleFormat.Time"/>):
/// minutes below an hour, hours below <see cref="PeopleFormat.HoursBeforeDays"/>, days beyond.
/// </remarks>
public static partial class WaitChart
{
    /// <summary>Chart width in SVG units.</summary>
    public const int Width = 720;

    /// <summary>Chart height in SVG units.</summary>
    public const int Height = 400;

    /// <summary>
    /// The curves chosen for the chart: the units the finding names (those that saturate first) first, so the
    /// chart's first colour and first legend entry are the finding's; then the longest final waits.
    /// </summary>
    public static IReadOnlyList<WaitCurve> Shown(WaitGrowth growth)
    {
        ArgumentNullException.ThrowIfNull(growth);
        return growth.Curves.OrderByDescending(curve => IsFirst(growth, curve))
            .ThenByDescending(curve => curve.WaitHours[^1])
            .Take(ChartSeriesStyles.Count)
            .ToList();
    }

    private static bool IsFirst(WaitGrowth growth, WaitCurve curve) => growth.FirstToSaturate.Contains(curve.UnitId, StringComparer.Ordinal);

    /// <summary>The chart as an SVG document; null when <paramref name="growth"/> has no curves.</summary>
    public static string? Svg(WaitGrowth growth)
    {
        ArgumentNullException.ThrowIfNull(growth);
        if (growth.Curves.IsEmpty || growth.SaturationFactor is not double saturation)
        {
            return null;
        }

        var plot = new Plot();
        plot.Font.Set("DejaVu Sans");
        double[] factors = [.. growth.Factors];
        var shown = Shown(growth);
        var timeUnit = AxisUnit(shown.Max(curve => curve.WaitHours.Max()));
        for (int i = 0; i < shown.Count; i++)
        {
            double[] waits = shown[i].WaitHours.Select(hours => TimeConstants.FromHours(hours, timeUnit)).ToArray();
            var series = plot.Add.Scatter(factors, waits);
            series.LegendText = ReportText.Legend(shown[i].Label) + (IsFirst(growth, shown[i]) ? " (saturates first)" : string.Empty);
            ChartSeriesStyles.Apply(series, i);
        }

        // The axes end at the data: the growth axis at the last factor drawn, just below saturation (named in its
        // title rather than drawn as a line past the data), the wait axis at the longest wait shown.
        plot.XLabel("Demand growth factor (\u00D7 today's arrivals; first saturation at \u00D7" + PeopleFormat.Factor(saturation) + ")");
        plot.YLabel("Mean wait (" + TimeConstants.Name(timeUnit) + "s)");
        plot.Axes.SetLimitsX(1.0, factors[^1]);
        plot.Axes.SetLimitsY(0.0, TimeConstants.FromHours(shown.Max(curve => curve.WaitHours.Max()), timeUnit));
        plot.Axes.Bottom.TickGenerator = new ScottPlot.TickGenerators.NumericAutomatic
        {
            LabelFormatter = value => value.ToString("0.###", CultureInfo.InvariantCulture),
        };
        plot.Axes.Left.TickGenerator = new ScottPlot.TickGenerators.NumericAutomatic
        {
            LabelFormatter = value => value.ToString("0.###", CultureInfo.InvariantCulture),
        };
        // Below the plot, never over the lines it names.
        plot.ShowLegend(Edge.Bottom);
        return WithViewBox(RenumberIds(plot.GetSvgXml(Width, Height), "wait-chart-clip-"));
    }

    /// <summary>The unit of the wait axis: the one <see cref="PeopleFormat.Time"/> would write <paramref name="longestHours"/> in.</summary>
    internal static TimeUnit AxisUnit(double longestHours) =>
        longestHours < 1.0 ? TimeUnit.Minute : longestHours < PeopleFormat.HoursBeforeDays ? TimeUnit.Hour : TimeUnit.Day;

    /// <summary>Adds a viewBox when the SVG has none, so the page can scale the chart to its column.</summary>
    internal static string WithViewBox(string svg)
    {
        int root = svg.IndexOf("<svg", StringComparison.Ordinal);
        int end = svg.IndexOf('>', root);
        if (root < 0 || svg.AsSpan(root, end - root).Contains("viewBox", StringComparison.Ordinal))
        {
            return svg;
        }

        return svg.Insert(root + 4, string.Create(CultureInfo.InvariantCulture, $" viewBox=\"0 0 {Width} {Height}\""));
    }

    /// <summary>
    /// ScottPlot numbers clip paths from a process-wide counter; renumbering them from 1 with a chart prefix makes the
    /// output depend on the data alone and keeps the ids apart from anything else on the page.
    /// </summary>
    internal static string RenumberIds(string svg, string prefix)
    {
        var names = new Dictionary<string, string>(StringComparer.Ordinal);
        return ClipIdRegex().Replace(svg, match =>
        {
            if (!names.TryGetValue(match.Value, out string? name))
            {
                name = prefix + (names.Count + 1).ToString(CultureInfo.InvariantCulture);
                names[match.Value] = name;
            }

            return name;
        });
    }

    [System.Text.RegularExpressions.GeneratedRegex(@"\bcl_[0-9a-f]+\b", System.Text.RegularExpressions.RegexOptions.None, matchTimeoutMilliseconds: 1000)]
    private static partial System.Text.RegularExpressions.Regex ClipIdRegex();
}
