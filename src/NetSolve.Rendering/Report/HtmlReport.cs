using System.Globalization;
using System.Text;
using System.Xml.Linq;
using NetSolve.Fitting.Estimation;
using NetSolve.Model;
using NetSolve.Presentation;
using NetSolve.Presentation.Formats;
using NetSolve.Rendering.Map;
using NetSolve.Simulation;
using NetSolve.Solving;
using static NetSolve.Rendering.Report.ReportText;

namespace NetSolve.Rendering.Report;

/// <summary>
/// The leadership report: one self-contained HTML page (inline SVG and CSS, no scripts, fonts or requests) with the
/// finding, the bottleneck map, the unit table, mean wait against demand growth, an optional scenario comparison,
/// the model's assumptions and the planning caution; with a simulation, also the mean queue by hour of day and
/// the formula against the simulation per unit.
/// </summary>
/// <remarks>
/// A Content-Security-Policy of <c>default-src 'none'</c> makes browsers refuse any request the page might
/// still try. The output depends only on its inputs and the provenance handed in (the date included), so the same
/// solutions and provenance give the same bytes.
/// </remarks>
public static class HtmlReport
{
    /// <summary>The assumptions of a Jackson network; the report lists those of its own network (<see cref="ReportAssumptions.For"/>).</summary>
    public static IReadOnlyList<string> Assumptions { get; } =
    [
        "Steady state: demand and capacity stay as given long enough for queues to settle; no daily or seasonal pattern.",
        "Poisson arrivals: patients arrive one at a time, independently, at the given mean rates.",
        "Exponential service: each unit's service time is exponential with the given mean (service_cv is not used).",
        "Independent routing: where a patient goes next depends only on the unit just left, by the given probabilities.",
        "First come, first served at every unit; no priorities, no blocking, no abandonment; unlimited waiting room.",
    ];

    /// <summary>The planning caution, as the report states it.</summary>
    public const string PlanningCaution =
        "These are planning estimates under stated assumptions; decisions follow local clinical governance and safe-staffing rules.";

    /// <summary>The map is drawn at most this many times its own size on screen.</summary>
    private const double MaxMapEnlargement = 1.25;

    /// <summary>The report for <paramref name="baseline"/>, compared with <paramref name="scenarios"/> when any are given.</summary>
    /// <param name="baseline">The solved network the report is about.</param>
    /// <param name="scenarios">Alternatives compared with it; none when null.</param>
    /// <param name="simulation">
    /// A simulation of <paramref name="baseline"/>'s network (same units in the same order): adds the "Time of day" and
    /// "Formula against simulation" sections. Without it the report has neither, byte for byte as before.
    /// </param>
    /// <param name="provenance">Date, version and input files, shown under the title; none when null.</param>
    /// <param name="baselineChanges">What the baseline changes from its own base when FILE is a scenario file or has <c>--set</c> changes; none when null.</param>
    /// <param name="fitEvidence">For a network fitted from a movement log: how sure the fit is (<see cref="FitEvidenceSection"/>), its predicted waits from <paramref name="baseline"/>; none when null.</param>
    public static string Write(
        NetworkSolution baseline,
        IReadOnlyList<ReportScenario>? scenarios = null,
        SimulationResult? simulation = null,
        ReportProvenance? provenance = null,
        IReadOnlyList<string>? baselineChanges = null,
        NetworkEvidence? fitEvidence = null)
    {
        ArgumentNullException.ThrowIfNull(baseline);
        if (simulation is not null && !simulation.Units.Select(u => u.Unit.Id).SequenceEqual(baseline.Units.Select(u => u.Unit.Id), StringComparer.Ordinal))
        {
            throw new ArgumentException("The simulation must be of the baseline's network, with every unit, in the same order.", nameof(simulation));
        }

        scenarios ??= [];
        var network = baseline.Network;
        var timeUnit = network.TimeUnit;
        string unit = TimeConstants.Name(timeUnit);
        var html = new StringBuilder();
        html.Append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
            .Append("<meta http-equiv=\"Content-Security-Policy\" content=\"default-src 'none'; style-src 'unsafe-inline'\">\n")
            .Append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
            .Append("<title>Capacity report: ").Append(Short(network.Name, MaxHeadingLength)).Append("</title>\n")
            .Append("<style>\n").Append(ReportStyles.Css);
        if (HasLargeMap(baseline))
        {
            html.Append(ReportStyles.LargeMapCss);
        }

        html.Append("</style>\n</head>\n<body>\n");

        html.Append("<header>\n<h1").Append(Heading(network.Name, MaxHeadingLength)).Append("</h1>\n")
            .Append("<p class=\"subtitle\">Capacity report from a queueing-network model. Rates per ").Append(unit)
            .Append("; each time is written with its unit (min, h or d).</p>\n");
        if (baselineChanges is { Count: > 0 })
        {
            html.Append("<p class=\"what-changed\" id=\"baseline-changes\">Changes from the base network: ").Append(HtmlEncode(string.Join("; ", baselineChanges))).Append("</p>\n");
        }

        if (provenance is not null)
        {
            AppendProvenance(html, provenance);
        }

        html.Append("</header>\n");
        html.Append("<p class=\"finding\" id=\"finding\"><strong>Finding:</strong> ").Append(HtmlEncode(Finding.Summarise(baseline))).Append("</p>\n");

        if (baseline.Units.Length > MapLayoutBuilder.MaxUnits)
        {
            // A map of a network this large would be too big to open or print legibly (MapLayoutBuilder.MaxUnits); the table still lists every unit.
            html.Append("<section id=\"map\">\n<h2>Bottleneck map</h2>\n<p class=\"map-left-out\" id=\"map-left-out\">The network has ")
                .Append(baseline.Units.Length.ToString(CultureInfo.InvariantCulture)).Append(" units; a map is drawn for at most ")
                .Append(MapLayoutBuilder.MaxUnits.ToString(CultureInfo.InvariantCulture))
                .Append(", so it is left out here. The table below lists every unit.</p>\n</section>\n");
        }
        else
        {
            AppendMap(html, baseline, unit);
        }

        html.Append("<section id=\"units\">\n<h2>Units</h2>\n");
        UnitTable.Append(html, baseline);
        html.Append("</section>\n");
        JourneySection.Append(html, baseline, null);

        HourByHourSection.Append(html, baseline);
        AppendGrowth(html, baseline);

        if (scenarios.Count > 0)
        {
            ScenarioTable.Append(html, baseline, scenarios);
        }

        if (simulation is not null)
        {
            TimeOfDaySection.Append(html, simulation);
            SimulationComparisonTable.Append(html, baseline, simulation);
            JourneySection.Append(html, baseline, simulation);
        }

        if (fitEvidence is not null)
        {
            FitEvidenceSection.Append(html, fitEvidence, baseline.Units.ToDictionary(u => u.Unit.Id, u => u.MeanWaitHours, StringComparer.Ordinal), timeUnit);
        }

        html.Append("<section id=\"assumptions\">\n<h2>Assumptions and caution</h2>\n<p>")
            .Append(HtmlEncode(ReportAssumptions.Introduction)).Append("</p>\n<ul>\n");
        foreach (string assumption in ReportAssumptions.For(baseline))
        {
            html.Append("<li>").Append(HtmlEncode(assumption)).Append("</li>\n");
        }

        html.Append("</ul>\n<p class=\"caution\" id=\"caution\"><strong>Planning caution:</strong> ").Append(HtmlEncode(PlanningCaution)).Append("</p>\n</section>\n");
        html.Append("<footer>Made with NetSolve. A unit is strained at ")
            .Append(PeopleFormat.Percent(baseline.StrainThreshold)).Append(" utilisation or more.</footer>\n</body>\n</html>\n");
        return html.ToString();
    }

    /// <summary>The date, the version and every input file with its SHA-256, so a printed report can be traced to its inputs.</summary>
    private static void AppendProvenance(StringBuilder html, ReportProvenance provenance)
    {
        html.Append("<p class=\"provenance\" id=\"provenance\">Made on ")
            .Append(provenance.Date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture))
            .Append(" with NetSolve ").Append(HtmlEncode(provenance.Version)).Append(" from ");
        html.Append(string.Join(", ", provenance.Inputs.Select(input =>
            "<span class=\"input\">" + HtmlEncode(input.Name) + " (SHA-256 <code>" + HtmlEncode(input.Sha256) + "</code>)</span>")));
        html.Append(".</p>\n");
    }

    /// <summary>
    /// In print the map is reduced to fit one page; when its smallest text then falls below a readable size, a note
    /// (hidden on screen) says so and points to the HTML file, rather than letting the map run over several pages.
    /// </summary>
    private static void AppendPrintNote(StringBuilder html, XElement map, double mapWidth, double maxWidthPx)
    {
        double mapHeight = double.Parse(map.Attribute("height")!.Value, CultureInfo.InvariantCulture);
        double smallestFont = map.Descendants().Attributes("font-size").Min(size => double.Parse(size.Value, CultureInfo.InvariantCulture));
        double printedPt = MapPrintFit.PrintedPoints(mapWidth, mapHeight, maxWidthPx, smallestFont);
        if (printedPt >= MapPrintFit.MinReadablePt)
        {
            return;
        }

        html.Append("<p class=\"map-print-note\" id=\"map-print-note\">This map is too large for one page, so the printout shrinks it to fit: its smallest text comes out at about ")
            .Append(printedPt.ToString("0.0", CultureInfo.InvariantCulture))
            .Append(" pt, which may be hard to read. Open the report's HTML file on a screen to see the map at full size.</p>\n");
    }

    /// <summary>The bottleneck map, as inline SVG with its caption.</summary>
    private static void AppendMap(StringBuilder html, NetworkSolution baseline, string unit)
    {
        var layout = MapLayoutBuilder.Build(baseline);
        bool large = HasLargeMap(baseline);
        // A large map scrolls in its frame; its header is drawn apart, above the frame, so the legend stays in view.
        var map = large ? SvgMapWriter.Graph(layout) : SvgMapWriter.Write(layout).Root!;
        // Never enlarged past 125% of its own size: a small network should not fill the page with giant boxes.
        double mapWidth = double.Parse(map.Attribute("width")!.Value, CultureInfo.InvariantCulture);
        double maxWidthPx = Math.Ceiling(mapWidth * MaxMapEnlargement);
        html.Append("<section id=\"map\">\n<h2>Bottleneck map</h2>\n<figure id=\"map-figure\">\n");
        AppendPrintNote(html, map, mapWidth, maxWidthPx);
        if (large)
        {
            html.Append("<div class=\"map-legend\" id=\"map-legend\">\n").Append(SvgMapWriter.Header(layout, MapTypography.MaxTitleWidth).ToString()).Append("\n</div>\n");
        }

        html.Append("<div class=\"map-frame\" style=\"max-width:").Append(Coordinates.Format(maxWidthPx)).Append("px\">\n")
            .Append(map.ToString()).Append("\n</div>\n")
            .Append("<figcaption>Patients flow from top to bottom; dashed lines return against the flow. Box fill, border, glyph and word give each unit's status (")
            .Append(HtmlEncode(HarbourLightsPalette.Name)).Append(" palette). Line width is proportional to patients per ").Append(unit)
            .Append('.');
        if (large)
        {
            html.Append(" On screen the map is shown at its own size in a frame that scrolls, under its legend; on a map this large each box shows the label, status, utilisation and mean wait, pale lines carry under a fifth of the largest flow, and rates are written on the heavier lines only; the table below gives every number.");
        }

        html.Append("</figcaption>\n</figure>\n</section>\n");
    }

    /// <summary>Whether the report draws its map with the large layout (more units than MSAGL lays out, no more than a map is drawn for).</summary>
    private static bool HasLargeMap(NetworkSolution baseline) =>
        baseline.Units.Length > MapLayoutBuilder.MaxLayeredUnits && baseline.Units.Length <= MapLayoutBuilder.MaxUnits;

    private static void AppendGrowth(StringBuilder html, NetworkSolution baseline)
    {
        var growth = WaitGrowth.Compute(baseline);
        html.Append("<section id=\"growth\">\n<h2>Mean wait as demand grows</h2>\n");
        string? chart = WaitChart.Svg(growth);
        if (chart is null)
        {
            html.Append("<p>No chart: ").Append(baseline.IsStable
                ? "no unit with a finite number of servers receives patients, so nothing saturates."
                : "a unit is already over capacity, so there is no growth left to show.").Append("</p>\n</section>\n");
            return;
        }

        var shown = WaitChart.Shown(growth);
        html.Append("<figure id=\"growth-figure\">\n<div class=\"chart-frame\">\n").Append(StripDeclaration(chart)).Append("\n</div>\n")
            .Append("<figcaption>Every arrival rate multiplied by the same factor, from today's demand (1.0) to ")
            .Append(PeopleFormat.Factor(growth.Factors[^1])).Append(", just below the first saturation at ")
            .Append(PeopleFormat.Factor(growth.SaturationFactor!.Value)).Append(". ");
        if (shown.Count < growth.Curves.Length)
        {
            html.Append(string.Create(CultureInfo.InvariantCulture, $"Showing the {shown.Count} units with the longest waits at the last factor; the other {growth.Curves.Length - shown.Count} wait less. "));
        }

        html.Append("Units with unlimited servers never wait and are not drawn.</figcaption>\n</figure>\n</section>\n");
    }

    internal static string StripDeclaration(string svg)
    {
        int start = svg.IndexOf("<svg", StringComparison.Ordinal);
        return start > 0 ? svg[start..] : svg;
    }

    /// <summary>The colours and border of a status cell, as the map draws the unit's box.</summary>
    internal static IEnumerable<KeyValuePair<string, string>> StatusAttributes(UnitStatus status)
    {
        var style = HarbourLightsPalette.For(status);
        string border = style.DoubleBorder ? "double" : style.BorderDash.Length == 0 ? "solid" : style.BorderDash.StartsWith('2') ? "dotted" : "dashed";
        yield return new("class", "status");
        yield return new("data-status", StatusWords.Name(status));
        yield return new("style", $"background:{style.Fill};color:{style.Text};border:3px {border} {style.Border}");
    }

    internal static string Cell(string text) => "<td>" + HtmlEncode(text) + "</td>";
}
