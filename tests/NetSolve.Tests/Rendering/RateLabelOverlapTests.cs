using System.Globalization;
using System.Xml.Linq;
using NetSolve.Rendering.Map;
using NetSolve.Solving;

namespace NetSolve.Tests.Rendering;

/// <summary>Route rate labels never cover each other or a unit box, on the bundled examples' maps and on generated hospitals.</summary>
public sealed class RateLabelOverlapTests
{
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    public static TheoryData<string> Examples => new() { "larkspur-simulation", "kestrel-general", "harbourside", "fenwick-winter-surge", "millbrook-clinic" };

    public static TheoryData<int, int> GeneratedHospitals => new() { { 12, 1 }, { 18, 5 }, { 25, 7 }, { 40, 11 } };

    // Common practice (legibility): a label covered by another cannot be read. Each label's background rectangle is
    // its footprint; no two may share any area. Larkspur once drew "1.858/h" under "0.0785/h" above the CT scanner.
    [Theory]
    [MemberData(nameof(Examples))]
    public void No_two_rate_labels_share_any_area(string example)
    {
        var (labels, _) = Read(RenderingFixtures.Solved(example));

        Assert.True(labels.Count >= 3, "the map has route labels");
        AssertApart(labels, labels, example, "labels");
    }

    // Common practice (legibility): a rate label over a unit box hides the unit's name or figures.
    [Theory]
    [MemberData(nameof(Examples))]
    public void No_rate_label_covers_a_unit_box(string example)
    {
        var (labels, boxes) = Read(RenderingFixtures.Solved(example));

        AssertApart(labels, boxes, example, "label and box");
    }

    // Common practice (legibility), as above, on generated hospitals with forward, crossing and return routes.
    [Theory]
    [MemberData(nameof(GeneratedHospitals))]
    public void On_generated_hospitals_no_rate_label_covers_a_unit_box_or_another_label(int units, int seed)
    {
        var (labels, boxes) = Read(RenderingFixtures.Generated(units, seed));

        AssertApart(labels, boxes, string.Create(CultureInfo.InvariantCulture, $"generated {units}/{seed}"), "label and box");
        AssertApart(labels, labels, string.Create(CultureInfo.InvariantCulture, $"generated {units}/{seed}"), "labels");
    }

    private static (List<Rect> Labels, List<Rect> Boxes) Read(NetworkSolution solution)
    {
        var svg = XDocument.Parse(SvgMapWriter.WriteString(MapLayoutBuilder.Build(solution, MapDirection.TopToBottom)));
        var labels = svg.Descendants(Svg + "g").Where(g => (string?)g.Attribute("class") == "rate")
            .Select(g => Rect.Of(g.Element(Svg + "rect")!))
            .ToList();
        var boxes = svg.Descendants(Svg + "rect").Where(r => (string?)r.Attribute("class") == "box").Select(Rect.Of).ToList();
        return (labels, boxes);
    }

    private static void AssertApart(List<Rect> first, List<Rect> second, string map, string what)
    {
        bool same = ReferenceEquals(first, second);
        for (int i = 0; i < first.Count; i++)
        {
            for (int j = same ? i + 1 : 0; j < second.Count; j++)
            {
                Assert.False(first[i].Overlaps(second[j]), string.Create(CultureInfo.InvariantCulture, $"{what} {i} and {j} overlap on the {map} map"));
            }
        }
    }

    private sealed record Rect(double X, double Y, double W, double H)
    {
        public static Rect Of(XElement r) => new(Read(r, "x"), Read(r, "y"), Read(r, "width"), Read(r, "height"));

        public bool Overlaps(Rect b) => X < b.X + b.W && b.X < X + W && Y < b.Y + b.H && b.Y < Y + H;

        private static double Read(XElement element, string name) => double.Parse((string)element.Attribute(name)!, CultureInfo.InvariantCulture);
    }
}
