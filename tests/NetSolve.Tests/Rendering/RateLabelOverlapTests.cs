using System.Globalization;
using System.Xml.Linq;
using NetSolve.Rendering.Map;

namespace NetSolve.Tests.Rendering;

/// <summary>Route rate labels never cover each other on the bundled examples' maps.</summary>
public sealed class RateLabelOverlapTests
{
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    // Common practice (legibility): a label covered by another cannot be read. Each label's background rectangle is
    // its footprint; no two may share any area. Larkspur once drew "1.858/h" under "0.0785/h" above the CT scanner.
    [Theory]
    [InlineData("larkspur-simulation")]
    [InlineData("kestrel-general")]
    [InlineData("harbourside")]
    public void No_two_rate_labels_share_any_area(string example)
    {
        var svg = XDocument.Parse(SvgMapWriter.WriteString(MapLayoutBuilder.Build(RenderingFixtures.Solved(example), MapDirection.TopToBottom)));
        var rects = svg.Descendants(Svg + "g").Where(g => (string?)g.Attribute("class") == "rate")
            .Select(g => g.Element(Svg + "rect")!)
            .Select(r => (X: Read(r, "x"), Y: Read(r, "y"), W: Read(r, "width"), H: Read(r, "height")))
            .ToList();

        Assert.True(rects.Count > 3, "the map has route labels");
        for (int i = 0; i < rects.Count; i++)
        {
            for (int j = i + 1; j < rects.Count; j++)
            {
                var (a, b) = (rects[i], rects[j]);
                bool overlap = a.X < b.X + b.W && b.X < a.X + a.W && a.Y < b.Y + b.H && b.Y < a.Y + a.H;
                Assert.False(overlap, string.Create(CultureInfo.InvariantCulture, $"labels {i} and {j} overlap on the {example} map"));
            }
        }
    }

    private static double Read(XElement element, string name) => double.Parse((string)element.Attribute(name)!, CultureInfo.InvariantCulture);
}
