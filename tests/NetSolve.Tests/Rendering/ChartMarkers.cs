using System.Globalization;
using System.Text.RegularExpressions;
using System.Xml.Linq;

namespace NetSolve.Tests.Rendering;

/// <summary>
/// Reads the point markers of one series out of a ScottPlot SVG chart: small shapes (ellipses, or closed paths no
/// larger than a marker) in the series' colour whose centre lies in the plot's data area (the legend's keys lie outside).
/// </summary>
internal static partial class ChartMarkers
{
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    /// <summary>A marker is at most this many SVG units across; ScottPlot draws them 5 units wide here.</summary>
    private const double MaxMarkerSize = 8.0;

    /// <summary>Slack, in SVG units, for a marker centred on the edge of the data area (a queue of 0 sits on the axis).</summary>
    private const double EdgeSlack = 1.0;

    /// <summary>Marker centres (x, y) of the series drawn in <paramref name="colour"/>, left to right.</summary>
    public static List<(double X, double Y)> Centres(XDocument chart, string colour)
    {
        // The data area is the first bare rectangle (a clip shape: position and size, no paint).
        var area = chart.Descendants(Svg + "rect").First(r => r.Attribute("fill") is null && r.Attribute("stroke") is null && r.Attribute("x") is not null);
        double left = Attr(area, "x"), top = Attr(area, "y"), right = left + Attr(area, "width"), bottom = top + Attr(area, "height");
        var centres = new List<(double X, double Y)>();
        foreach (var element in chart.Descendants())
        {
            bool painted = string.Equals((string?)element.Attribute("fill"), colour, StringComparison.OrdinalIgnoreCase)
                || string.Equals((string?)element.Attribute("stroke"), colour, StringComparison.OrdinalIgnoreCase);
            if (!painted)
            {
                continue;
            }

            (double X, double Y)? centre = element.Name.LocalName switch
            {
                "ellipse" => (Attr(element, "cx"), Attr(element, "cy")),
                "path" => SmallPathCentre((string)element.Attribute("d")!),
                _ => null,
            };
            if (centre is (double x, double y) && x >= left - EdgeSlack && x <= right + EdgeSlack && y >= top - EdgeSlack && y <= bottom + EdgeSlack)
            {
                centres.Add((x, y));
            }
        }

        return [.. centres.OrderBy(c => c.X)];
    }

    private static (double X, double Y)? SmallPathCentre(string d)
    {
        if (d.Count(c => c == 'M') != 1 || !d.TrimEnd().EndsWith('Z'))
        {
            return null;
        }

        var numbers = NumberRegex().Matches(d).Select(m => double.Parse(m.Value, CultureInfo.InvariantCulture)).ToList();
        var xs = numbers.Where((_, i) => i % 2 == 0).ToList();
        var ys = numbers.Where((_, i) => i % 2 == 1).ToList();
        if (xs.Max() - xs.Min() > MaxMarkerSize || ys.Max() - ys.Min() > MaxMarkerSize)
        {
            return null;
        }

        return ((xs.Max() + xs.Min()) / 2.0, (ys.Max() + ys.Min()) / 2.0);
    }

    private static double Attr(XElement element, string name) =>
        double.Parse((string)element.Attribute(name)!, NumberStyles.Float, CultureInfo.InvariantCulture);

    [GeneratedRegex(@"-?[0-9]+(?:\.[0-9]+)?(?:[eE][-+]?[0-9]+)?")]
    private static partial Regex NumberRegex();
}
