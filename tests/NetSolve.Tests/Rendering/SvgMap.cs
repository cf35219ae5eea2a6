using System.Globalization;
using System.Text.RegularExpressions;
using System.Xml.Linq;

namespace NetSolve.Tests.Rendering;

/// <summary>Reads back what a map SVG draws: unit boxes, their text, flow lines and arrows, in SVG coordinates.</summary>
internal sealed partial class SvgMap
{
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    private SvgMap(XDocument document)
    {
        Document = document;
        var root = document.Root!;
        Width = Number(root.Attribute("width")!.Value);
        Height = Number(root.Attribute("height")!.Value);
        var graph = root.Descendants(Svg + "g").Single(g => (string?)g.Attribute("class") == "graph");
        var shift = TranslateRegex().Match(graph.Attribute("transform")!.Value);
        double dx = Number(shift.Groups[1].Value);
        double dy = Number(shift.Groups[2].Value);

        Units = graph.Descendants(Svg + "g")
            .Where(g => ((string?)g.Attribute("class") ?? string.Empty).StartsWith("unit ", StringComparison.Ordinal))
            .Select(g =>
            {
                var rect = g.Elements(Svg + "rect").First(r => (string?)r.Attribute("class") == "box");
                var box = new Box(Number(rect, "x") + dx, Number(rect, "y") + dy, Number(rect, "width"), Number(rect, "height"));
                var texts = g.Elements(Svg + "text").Select(t => new TextLine(
                    t.Value, Number(t, "x") + dx, Number(t, "y") + dy, Number(t, "font-size"), (string?)t.Attribute("font-weight") == "bold")).ToList();
                var stubs = g.Elements(Svg + "g").Select(s => ((string)s.Attribute("class")!, (string)s.Attribute("data-rate")!)).ToList();
                return new UnitBox((string)g.Attribute("data-unit")!, (string)g.Attribute("data-status")!, box, texts, stubs, rect);
            })
            .ToList();

        Flows = graph.Descendants(Svg + "g")
            .Where(g => ((string?)g.Attribute("class") ?? string.Empty).StartsWith("flow ", StringComparison.Ordinal))
            .Select(g =>
            {
                var path = g.Element(Svg + "path")!;
                var start = PathStartRegex().Match(path.Attribute("d")!.Value);
                var tip = ((string)g.Element(Svg + "polygon")!.Attribute("points")!).Split(' ')[0].Split(',');
                return new Flow(
                    (string)g.Attribute("data-from")!,
                    (string)g.Attribute("data-to")!,
                    (string)g.Attribute("data-kind")!,
                    (string)g.Attribute("data-rate")!,
                    Number(path, "stroke-width"),
                    path.Attribute("stroke-dasharray") is not null,
                    (Number(start.Groups[1].Value) + dx, Number(start.Groups[2].Value) + dy),
                    (Number(tip[0]) + dx, Number(tip[1]) + dy));
            })
            .ToList();

        FontSizes = root.Descendants(Svg + "text").Select(t => Number(t, "font-size")).ToList();
    }

    public XDocument Document { get; }

    public double Width { get; }

    public double Height { get; }

    public List<UnitBox> Units { get; }

    public List<Flow> Flows { get; }

    public List<double> FontSizes { get; }

    public UnitBox Unit(string id) => Units.Single(unit => unit.Id == id);

    public static SvgMap Parse(string svg) => new(XDocument.Parse(svg));

    private static double Number(XElement element, string attribute) => Number(element.Attribute(attribute)!.Value);

    private static double Number(string text) => double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);

    [GeneratedRegex(@"translate\(([-0-9.]+) ([-0-9.]+)\)")]
    private static partial Regex TranslateRegex();

    [GeneratedRegex(@"^M ([-0-9.]+) ([-0-9.]+)")]
    private static partial Regex PathStartRegex();

    internal sealed record Box(double X, double Y, double Width, double Height)
    {
        public double Right => X + Width;

        public double Bottom => Y + Height;

        public (double X, double Y) Centre => (X + (Width / 2), Y + (Height / 2));

        public bool Overlaps(Box other) => X < other.Right && other.X < Right && Y < other.Bottom && other.Y < Bottom;

        /// <summary>Distance from a point to the nearest side of the rectangle (0 on the border).</summary>
        public double DistanceToBorder((double X, double Y) point)
        {
            bool inside = point.X >= X && point.X <= Right && point.Y >= Y && point.Y <= Bottom;
            if (inside)
            {
                return new[] { point.X - X, Right - point.X, point.Y - Y, Bottom - point.Y }.Min();
            }

            double dx = Math.Max(Math.Max(X - point.X, 0), point.X - Right);
            double dy = Math.Max(Math.Max(Y - point.Y, 0), point.Y - Bottom);
            return Math.Sqrt((dx * dx) + (dy * dy));
        }
    }

    internal sealed record TextLine(string Text, double X, double Baseline, double FontSize, bool IsBold);

    internal sealed record UnitBox(string Id, string Status, Box Box, List<TextLine> Texts, List<(string Class, string Rate)> Stubs, XElement Rect);

    internal sealed record Flow(string From, string To, string Kind, string Rate, double StrokeWidth, bool IsDashed, (double X, double Y) Start, (double X, double Y) Tip);
}
