using System.Globalization;
using System.Xml.Linq;
using NetSolve.Model;
using NetSolve.Presentation;

namespace NetSolve.Rendering.Map;

/// <summary>Draws a <see cref="MapLayout"/> as a standalone SVG document: title, legend, flow lines, unit boxes, rates.</summary>
/// <remarks>
/// Output is well-formed XML built with LINQ to XML, numbers in the invariant culture, no external references,
/// so it can be inlined in HTML or rasterised as it is. Unit groups carry <c>data-unit</c> and <c>data-status</c>;
/// flow groups carry <c>data-from</c>, <c>data-to</c> and <c>data-kind</c>.
/// </remarks>
public static class SvgMapWriter
{
    /// <summary>The SVG namespace.</summary>
    public static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    private const double TitleSize = 16.0;
    private const double LegendSwatchWidth = 30.0;
    private const double LegendSwatchHeight = 18.0;
    private const double LegendGap = 16.0;
    private const double MinArrowHalfWidth = 4.5;
    private const double ArrowHalfWidthPerStroke = 1.1;

    /// <summary>The map as an SVG document.</summary>
    public static XDocument Write(MapLayout layout)
    {
        ArgumentNullException.ThrowIfNull(layout);
        return new XDocument(Root(layout, header: true, graph: true, wrapWidth: layout.Width));
    }

    /// <summary>
    /// The map's header alone (title, changes line and legend), wrapped to <paramref name="wrapWidth"/> or the
    /// header's widest item: for a page that shows a large map's graph in a frame that scrolls, so the legend stays in view.
    /// </summary>
    internal static XElement Header(MapLayout layout, double wrapWidth) => Root(layout, header: true, graph: false, wrapWidth);

    /// <summary>The map without its header, as wide as <see cref="Write"/> draws it: the part a scrolling frame shows.</summary>
    internal static XElement Graph(MapLayout layout) => Root(layout, header: false, graph: true, wrapWidth: layout.Width);

    private static XElement Root(MapLayout layout, bool header, bool graph, double wrapWidth)
    {
        var legend = MapLegend.Lay(layout, wrapWidth, out double headerHeight, out double minWidth);
        // Whole-unit sizes, so a raster at an integer scale has exactly the SVG's size.
        double width = Math.Ceiling(Math.Max(graph ? layout.Width : Math.Min(layout.Width, wrapWidth), minWidth));
        double top = header ? headerHeight : 0.0;
        double height = Math.Ceiling((graph ? layout.Height : 0.0) + top);
        double offsetX = (width - layout.Width) / 2.0;

        var root = new XElement(
            Svg + "svg",
            new XAttribute("viewBox", FormattableString.Invariant($"0 0 {Coordinates.Format(width)} {Coordinates.Format(height)}")),
            new XAttribute("width", Coordinates.Format(width)),
            new XAttribute("height", Coordinates.Format(height)),
            new XAttribute("role", "img"),
            new XAttribute("class", graph ? "bottleneck-map" : "bottleneck-map-legend"),
            new XAttribute("font-family", MapTypography.FontFamily),
            new XElement(Svg + "title", (graph ? "Bottleneck map: " : "Legend of the bottleneck map: ") + layout.Title),
            new XElement(Svg + "desc", Description(layout)),
            new XElement(Svg + "rect", Attr("x", 0), Attr("y", 0), Attr("width", width), Attr("height", height), new XAttribute("fill", MapColours.Background)));
        if (header)
        {
            root.Add(legend);
        }

        if (graph)
        {
            root.Add(new XElement(
                Svg + "g",
                new XAttribute("class", "graph"),
                new XAttribute("transform", FormattableString.Invariant($"translate({Coordinates.Format(offsetX)} {Coordinates.Format(top)})")),
                new XElement(Svg + "g", new XAttribute("class", "flows"), layout.Edges.Select(Flow)),
                new XElement(Svg + "g", new XAttribute("class", "nodes"), layout.Nodes.Select(Node)),
                new XElement(Svg + "g", new XAttribute("class", "rates"), layout.Edges.Where(edge => edge.ShowsRate).Select(Rate))));
        }

        return root;
    }

    /// <summary>The map as SVG text, without an XML declaration so it can also be inlined in HTML.</summary>
    public static string WriteString(MapLayout layout) => Write(layout).Root!.ToString(SaveOptions.None);

    internal static XAttribute Attr(string name, double value) => new(name, Coordinates.Format(value));

    private static string Description(MapLayout layout)
    {
        int units = layout.Nodes.Length;
        return string.Create(CultureInfo.InvariantCulture,
            $"{units} units; boxes filled by status ({HarbourLightsPalette.Name} palette) with a glyph and word; line width proportional to patients per {TimeConstants.Name(layout.TimeUnit)}; dashed lines return against the main flow{(layout.Edges.Any(edge => edge.Kind == MapEdgeKind.Diversion) ? "; short dashes carry patients diverted from a full unit" : string.Empty)}.");
    }

    private static XElement Flow(MapEdge edge)
    {
        string stroke = edge.Kind switch
        {
            MapEdgeKind.Feedback or MapEdgeKind.Diversion => MapColours.FeedbackLine,
            _ => MapColours.ForwardLine,
        };
        var path = new XElement(
            Svg + "path",
            new XAttribute("d", edge.PathData),
            new XAttribute("fill", "none"),
            new XAttribute("stroke", stroke),
            Attr("stroke-width", edge.StrokeWidth),
            new XAttribute("stroke-linecap", "butt"));
        if (edge.Kind != MapEdgeKind.Forward)
        {
            path.Add(new XAttribute("stroke-dasharray", edge.Kind == MapEdgeKind.Diversion ? MapColours.DiversionDash : MapColours.FeedbackDash));
        }

        var arrow = Arrow(edge, stroke);
        if (edge.Faint)
        {
            path.Add(new XAttribute("stroke-opacity", MapColours.FaintOpacity));
            arrow.Add(new XAttribute("fill-opacity", MapColours.FaintOpacity));
        }

        return new XElement(
            Svg + "g",
            new XAttribute("class", "flow " + KindName(edge.Kind) + (edge.Faint ? " faint" : string.Empty)),
            new XAttribute("data-from", edge.From),
            new XAttribute("data-to", edge.To),
            new XAttribute("data-kind", KindName(edge.Kind)),
            new XAttribute("data-rate", edge.RateText),
            new XElement(Svg + "title", FormattableString.Invariant($"{edge.From} to {edge.To}: {edge.RateText}")),
            path,
            arrow);
    }

    private static XElement Arrow(MapEdge edge, string fill)
    {
        double dx = edge.ArrowTip.X - edge.ArrowBase.X;
        double dy = edge.ArrowTip.Y - edge.ArrowBase.Y;
        double length = Math.Sqrt((dx * dx) + (dy * dy));
        double half = Math.Max(MinArrowHalfWidth, ArrowHalfWidthPerStroke * edge.StrokeWidth);
        double nx = length > 0.0 ? -dy / length : 0.0;
        double ny = length > 0.0 ? dx / length : 0.0;
        string points = string.Join(' ', new[]
        {
            edge.ArrowTip,
            new MapPoint(edge.ArrowBase.X + (nx * half), edge.ArrowBase.Y + (ny * half)),
            new MapPoint(edge.ArrowBase.X - (nx * half), edge.ArrowBase.Y - (ny * half)),
        }.Select(p => Coordinates.Format(p.X) + "," + Coordinates.Format(p.Y)));
        return new XElement(Svg + "polygon", new XAttribute("class", "arrowhead"), new XAttribute("points", points), new XAttribute("fill", fill));
    }

    private static XElement Node(MapNode node)
    {
        var style = HarbourLightsPalette.For(node.Status);
        var group = new XElement(
            Svg + "g",
            new XAttribute("class", "unit status-" + StatusWords.Name(node.Status)),
            new XAttribute("data-unit", node.UnitId),
            new XAttribute("data-status", StatusWords.Name(node.Status)),
            new XElement(Svg + "title", Tooltip(node)));
        if (node.TargetsMissed is string missed)
        {
            group.Add(new XAttribute("data-targets-missed", missed));
        }

        foreach (var (stub, kind) in new[] { (node.Arrival, "arrival"), (node.Exit, "exit"), (node.TurnedAway, "turned-away") })
        {
            if (stub is not null)
            {
                group.Add(Stub(stub, kind));
            }
        }

        var box = Box(node.Left, node.Top, node.Width, node.Height, style.Fill, style.Border, style.BorderWidth, style.BorderDash);
        box.Add(new XAttribute("class", "box"));
        group.Add(box);
        if (style.DoubleBorder)
        {
            double inset = style.BorderWidth + 1.5;
            group.Add(Box(node.Left + inset, node.Top + inset, node.Width - (2 * inset), node.Height - (2 * inset), "none", style.Border, 1.5, string.Empty));
        }

        double lineTop = node.Top + MapTypography.Padding;
        foreach (var line in node.Lines)
        {
            double baseline = lineTop + (line.FontSize * 1.02);
            var text = new XElement(
                Svg + "text",
                Attr("x", node.Left + MapTypography.Padding),
                Attr("y", baseline),
                Attr("font-size", line.FontSize),
                new XAttribute("fill", style.Text),
                line.Text);
            if (line.IsBold)
            {
                text.Add(new XAttribute("font-weight", "bold"));
            }

            group.Add(text);
            lineTop += line.FontSize * MapTypography.LineSpacing;
        }

        return group;
    }

    /// <summary>The box's tooltip: its id and every line of text, the label whole even where the box shows it shortened.</summary>
    internal static string Tooltip(MapNode node)
    {
        var lines = node.FullLabel is null
            ? node.Lines.Select(line => line.Text)
            : node.Lines.Where(line => !IsLabelLine(line)).Select(line => line.Text).Prepend(node.FullLabel);
        return node.UnitId + ": " + string.Join("; ", lines);
    }

    private static bool IsLabelLine(MapTextLine line) => line.IsBold && line.FontSize.Equals(MapTypography.LabelSize);

    private static XElement Stub(MapStub stub, string kind)
    {
        double dx = stub.Tip.X - stub.Start.X;
        double dy = stub.Tip.Y - stub.Start.Y;
        double length = Math.Sqrt((dx * dx) + (dy * dy));
        double arrow = Math.Min(length * 0.6, Math.Max(7.0, 1.4 * stub.StrokeWidth));
        var arrowBase = new MapPoint(stub.Tip.X - (dx / length * arrow), stub.Tip.Y - (dy / length * arrow));
        var edge = new MapEdge(kind, kind, MapEdgeKind.Forward, stub.PerHour, stub.RateText, stub.StrokeWidth, string.Empty, stub.Start, arrowBase, stub.Tip, stub.Tip);
        return new XElement(
            Svg + "g",
            new XAttribute("class", "stub " + kind),
            new XAttribute("data-rate", stub.RateText),
            new XElement(
                Svg + "line",
                Attr("x1", stub.Start.X),
                Attr("y1", stub.Start.Y),
                Attr("x2", arrowBase.X),
                Attr("y2", arrowBase.Y),
                new XAttribute("stroke", MapColours.BoundaryLine),
                Attr("stroke-width", stub.StrokeWidth)),
            Arrow(edge, MapColours.BoundaryLine));
    }

    private static XElement Rate(MapEdge edge)
    {
        double width = TextWidth.Of(edge.RateText, MapTypography.RateSize) + 4.0;
        double height = MapTypography.RateSize * MapTypography.LineSpacing;
        return new XElement(
            Svg + "g",
            new XAttribute("class", "rate"),
            new XAttribute("data-from", edge.From),
            new XAttribute("data-to", edge.To),
            new XElement(
                Svg + "rect",
                Attr("x", edge.LabelCentre.X - (width / 2.0)),
                Attr("y", edge.LabelCentre.Y - (height / 2.0)),
                Attr("width", width),
                Attr("height", height),
                Attr("rx", 3.0),
                new XAttribute("fill", MapColours.Background),
                new XAttribute("fill-opacity", "0.85")),
            new XElement(
                Svg + "text",
                Attr("x", edge.LabelCentre.X),
                Attr("y", edge.LabelCentre.Y + (MapTypography.RateSize * 0.36)),
                Attr("font-size", MapTypography.RateSize),
                new XAttribute("text-anchor", "middle"),
                new XAttribute("fill", MapColours.Ink),
                edge.RateText));
    }

    internal static XElement Box(double x, double y, double width, double height, string fill, string stroke, double strokeWidth, string dash)
    {
        var rect = new XElement(
            Svg + "rect",
            Attr("x", x),
            Attr("y", y),
            Attr("width", width),
            Attr("height", height),
            new XAttribute("fill", fill),
            new XAttribute("stroke", stroke),
            Attr("stroke-width", strokeWidth));
        if (dash.Length > 0)
        {
            rect.Add(new XAttribute("stroke-dasharray", dash));
        }

        return rect;
    }

    internal static string KindName(MapEdgeKind kind) => kind switch
    {
        MapEdgeKind.Forward => "forward",
        MapEdgeKind.Feedback => "feedback",
        MapEdgeKind.Diversion => "diversion",
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "Unknown flow kind."),
    };

    internal static XElement Text(double x, double y, double size, string content, bool bold = false)
    {
        var text = new XElement(Svg + "text", Attr("x", x), Attr("y", y), Attr("font-size", size), new XAttribute("fill", MapColours.Ink), content);
        if (bold)
        {
            text.Add(new XAttribute("font-weight", "bold"));
        }

        return text;
    }

    internal static double TitleFontSize => TitleSize;

    internal static double SwatchWidth => LegendSwatchWidth;

    internal static double SwatchHeight => LegendSwatchHeight;

    internal static double Gap => LegendGap;
}
