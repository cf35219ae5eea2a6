using System.Xml.Linq;
using NetSolve.Model;
using NetSolve.Presentation;
using NetSolve.Presentation.Scenarios;

namespace NetSolve.Rendering.Map;

/// <summary>The header of the map: the network's name and a legend of statuses, line styles and units, wrapped to the map's width.</summary>
internal static class MapLegend
{
    private static readonly XNamespace Svg = SvgMapWriter.Svg;

    /// <summary>The header, its items wrapped to <paramref name="wrapWidth"/> (the map's width) or the widest item, whichever is wider.</summary>
    public static XElement Lay(MapLayout layout, double wrapWidth, out double headerHeight, out double minWidth)
    {
        double margin = MapTypography.Margin;
        string title = ShownTitle(layout);
        double titleWidth = TextWidth.Of(title, SvgMapWriter.TitleFontSize, bold: true);
        var items = Items(layout.TimeUnit, layout.Edges.Any(edge => edge.Kind == MapEdgeKind.Diversion));
        if (layout.Nodes.Any(node => node.TargetsMissed is not null))
        {
            items.Add(TextItem(TargetWords.BreachMarker + " missed: a unit target not met"));
        }

        if (layout.Edges.Any(edge => edge.Faint))
        {
            items.Add(TextItem("pale line: under a fifth of the largest flow; every rate in the line's tooltip"));
        }

        double widestItem = items.Max(item => item.Width);
        string? subtitle = ShownSubtitle(layout);
        double subtitleWidth = subtitle is null ? 0.0 : TextWidth.Of(subtitle, MapTypography.DetailSize, bold: false);
        minWidth = Math.Max(Math.Max(titleWidth, subtitleWidth), widestItem) + (2.0 * margin);
        double available = Math.Max(wrapWidth, minWidth) - (2.0 * margin);

        var header = new XElement(Svg + "g", new XAttribute("class", "legend"));
        double y = margin + SvgMapWriter.TitleFontSize;
        header.Add(SvgMapWriter.Text(margin, y, SvgMapWriter.TitleFontSize, title, bold: true));
        if (subtitle is not null)
        {
            y += MapTypography.DetailSize * 1.5;
            var line = SvgMapWriter.Text(margin, y, MapTypography.DetailSize, subtitle);
            line.Add(new XAttribute("class", "changes"));
            header.Add(line);
        }

        y += SvgMapWriter.TitleFontSize * 0.6;

        double rowHeight = SvgMapWriter.SwatchHeight + 8.0;
        double x = margin;
        double rowTop = y;
        foreach (var item in items)
        {
            if (x > margin && x + item.Width > margin + available)
            {
                x = margin;
                rowTop += rowHeight;
            }

            header.Add(item.Draw(x, rowTop));
            x += item.Width + SvgMapWriter.Gap;
        }

        headerHeight = rowTop + rowHeight + 4.0;
        return header;
    }

    /// <summary>
    /// The title as drawn: cut with an ellipsis beyond the graph's width or <see cref="MapTypography.MaxTitleWidth"/>,
    /// whichever is wider, so a very long network name cannot widen the map (the SVG's title element keeps it whole).
    /// </summary>
    internal static string ShownTitle(MapLayout layout) => Ellipsis.Fit(
        layout.Title,
        Math.Max(layout.Width - (2.0 * MapTypography.Margin), MapTypography.MaxTitleWidth),
        SvgMapWriter.TitleFontSize,
        bold: true);

    /// <summary>
    /// The changes line under the title (<c>changes: imaging: +1 server; ...</c>), cut as the title is; null when the
    /// network is drawn as written.
    /// </summary>
    internal static string? ShownSubtitle(MapLayout layout) => layout.Changes.IsDefaultOrEmpty
        ? null
        : Ellipsis.Fit(
            ChangesHeader.Line(layout.Changes),
            Math.Max(layout.Width - (2.0 * MapTypography.Margin), MapTypography.MaxTitleWidth),
            MapTypography.DetailSize,
            bold: false);

    private static List<LegendItem> Items(TimeUnit timeUnit, bool hasDiversion)
    {
        var items = new List<LegendItem>();
        foreach (var status in HarbourLightsPalette.Order)
        {
            var style = HarbourLightsPalette.For(status);
            string text = HarbourLightsPalette.Text(status);
            items.Add(new LegendItem(text, (x, y) =>
            {
                var swatch = SvgMapWriter.Box(x, y, SvgMapWriter.SwatchWidth, SvgMapWriter.SwatchHeight, style.Fill, style.Border, Math.Min(style.BorderWidth, 2.5), style.BorderDash);
                return new XElement(
                    Svg + "g",
                    new XAttribute("class", "legend-status"),
                    new XAttribute("data-status", StatusWords.Name(status)),
                    swatch,
                    SvgMapWriter.Text(x + SvgMapWriter.SwatchWidth + 6.0, y + 13.0, MapTypography.DetailSize, text, bold: true));
            }));
        }

        items.Add(LineItem("route", MapColours.ForwardLine, string.Empty));
        items.Add(LineItem("return route", MapColours.FeedbackLine, MapColours.FeedbackDash));
        if (hasDiversion)
        {
            items.Add(LineItem("diverted when full", MapColours.FeedbackLine, MapColours.DiversionDash));
        }

        items.Add(LineItem("in from outside / out", MapColours.BoundaryLine, string.Empty));
        string unit = TimeConstants.Name(timeUnit);
        items.Add(TextItem("line width \u221D patients per " + unit));
        items.Add(TextItem("wait = mean wait before service"));
        return items;
    }

    private static LegendItem TextItem(string text) =>
        new(text, (x, y) => SvgMapWriter.Text(x, y + 13.0, MapTypography.DetailSize, text), swatch: false);

    private static LegendItem LineItem(string text, string colour, string dash) => new(text, (x, y) =>
    {
        double mid = y + (SvgMapWriter.SwatchHeight / 2.0);
        var line = new XElement(
            Svg + "line",
            SvgMapWriter.Attr("x1", x),
            SvgMapWriter.Attr("y1", mid),
            SvgMapWriter.Attr("x2", x + SvgMapWriter.SwatchWidth),
            SvgMapWriter.Attr("y2", mid),
            new XAttribute("stroke", colour),
            SvgMapWriter.Attr("stroke-width", 3.0));
        if (dash.Length > 0)
        {
            line.Add(new XAttribute("stroke-dasharray", dash));
        }

        return new XElement(
            Svg + "g",
            new XAttribute("class", "legend-line"),
            line,
            SvgMapWriter.Text(x + SvgMapWriter.SwatchWidth + 6.0, y + 13.0, MapTypography.DetailSize, text));
    });

    private sealed class LegendItem(string text, Func<double, double, XElement> draw, bool swatch = true)
    {
        public double Width { get; } = (swatch ? SvgMapWriter.SwatchWidth + 6.0 : 0.0) + TextWidth.Of(text, MapTypography.DetailSize, bold: true);

        public XElement Draw(double x, double y) => draw(x, y);
    }
}
