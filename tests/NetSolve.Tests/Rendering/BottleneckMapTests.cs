using NetSolve.Tests.Support;
using System.Xml;
using NetSolve.Model;
using NetSolve.Presentation;
using NetSolve.Rendering.Map;
using NetSolve.Solving;

namespace NetSolve.Tests.Rendering;

public class BottleneckMapTests
{
    public static TheoryData<string> Examples => new() { "harbourside", "kestrel-general", "fenwick-winter-surge", "millbrook-clinic" };

    private static SvgMap Draw(NetworkSolution solution, MapDirection direction = MapDirection.TopToBottom) =>
        SvgMap.Parse(SvgMapWriter.WriteString(MapLayoutBuilder.Build(solution, direction)));

    [Theory]
    [MemberData(nameof(Examples))]
    public void The_svg_is_well_formed_xml_in_the_svg_namespace(string example)
    {
        string svg = SvgMapWriter.WriteString(MapLayoutBuilder.Build(RenderingFixtures.Solved(example)));

        // Source: XML 1.0 (W3C) well-formedness, checked by a conforming reader; SVG 1.1 root element and namespace.
        using var reader = XmlReader.Create(new StringReader(svg), new XmlReaderSettings { DtdProcessing = DtdProcessing.Prohibit });
        while (reader.Read())
        {
        }

        var root = SvgMap.Parse(svg).Document.Root!;
        Assert.Equal("svg", root.Name.LocalName);
        Assert.Equal("http://www.w3.org/2000/svg", root.Name.NamespaceName);
        Assert.DoesNotContain("href", svg, StringComparison.Ordinal);
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Every_unit_is_drawn_once_with_its_label_and_status(string example)
    {
        var solution = RenderingFixtures.Solved(example);
        var map = Draw(solution);

        Assert.Equal(solution.Units.Select(u => u.Unit.Id), map.Units.Select(u => u.Id), StringComparer.Ordinal);
        foreach (var result in solution.Units)
        {
            var box = map.Unit(result.Unit.Id);
            Assert.Equal(StatusWords.Name(result.Status), box.Status);
            string labelText = string.Join(" ", box.Texts.Where(t => t.IsBold).Select(t => t.Text));
            Assert.StartsWith(result.Unit.Label, labelText, StringComparison.Ordinal);
        }
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Every_route_with_a_positive_probability_is_drawn_once(string example)
    {
        var solution = RenderingFixtures.Solved(example);
        var map = Draw(solution);

        var expected = solution.Network.Routes.Where(r => r.Probability > 0).Select(r => (r.From, r.To)).Order().ToList();
        Assert.Equal(expected, map.Flows.Select(f => (f.From, f.To)).Order().ToList());
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void No_two_unit_boxes_overlap(string example)
    {
        AssertNoOverlap(Draw(RenderingFixtures.Solved(example)));
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Each_flow_starts_on_its_source_box_and_its_arrow_ends_on_its_target_box(string example)
    {
        AssertFlowsTouchTheirBoxes(Draw(RenderingFixtures.Solved(example)));
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Every_line_of_text_fits_inside_its_box_in_the_real_font(string example)
    {
        AssertTextFits(Draw(RenderingFixtures.Solved(example)));
    }

    [Fact]
    public void Routes_back_up_the_page_are_dashed_and_routes_down_it_are_solid()
    {
        var map = Draw(RenderingFixtures.Solved("harbourside"));

        // Geometric fact about the drawing: in a top-to-bottom map a line whose target box lies above its source runs
        // against the flow. Harbourside sends imaging and lab patients back to emergency for review.
        foreach (var flow in map.Flows)
        {
            var from = map.Unit(flow.From).Box.Centre;
            var to = map.Unit(flow.To).Box.Centre;
            bool backwards = to.Y <= from.Y;
            Assert.Equal(backwards, flow.IsDashed);
            Assert.Equal(backwards ? "feedback" : "forward", flow.Kind);
        }

        Assert.Contains(map.Flows, f => f.From == "imaging" && f.To == "emergency" && f.IsDashed);
        Assert.Contains(map.Flows, f => f.From == "lab" && f.To == "emergency" && f.IsDashed);
    }

    [Fact]
    public void In_a_left_to_right_map_forward_routes_point_right()
    {
        var map = Draw(RenderingFixtures.Solved("kestrel-general"), MapDirection.LeftToRight);

        foreach (var flow in map.Flows.Where(f => !f.IsDashed))
        {
            Assert.True(map.Unit(flow.To).Box.Centre.X > map.Unit(flow.From).Box.Centre.X, $"{flow.From} -> {flow.To}");
        }

        AssertNoOverlap(map);
        AssertFlowsTouchTheirBoxes(map);
    }

    [Fact]
    public void Line_width_is_proportional_to_flow_and_the_rate_is_written_on_it()
    {
        var map = Draw(RenderingFixtures.Solved("harbourside"));

        // Source: contract example, emergency arrival_rate 18.699187/h; 35% go to imaging, 30% to lab.
        var toImaging = map.Flows.Single(f => f.From == "emergency" && f.To == "imaging");
        var toLab = map.Flows.Single(f => f.From == "emergency" && f.To == "lab");
        Assert.Equal("6.545/h", toImaging.Rate);   // 18.699187 x 0.35 = 6.5447
        Assert.Equal("5.610/h", toLab.Rate);       // 18.699187 x 0.30 = 5.6098
        Assert.Equal(0.35 / 0.30, toImaging.StrokeWidth / toLab.StrokeWidth, 0.01);

        // The largest single flow is the 11.5/h arriving at emergency (every route carries a share of 18.7/h, the
        // largest 35%), so it alone is drawn at full width and every route is narrower.
        Assert.All(map.Flows, f => Assert.True(f.StrokeWidth < MapTypography.MaxStrokeWidth));
        Assert.Equal(MapTypography.MaxStrokeWidth * (0.35 * 18.699187 / 11.5), toImaging.StrokeWidth, 0.01);
    }

    [Fact]
    public void External_arrivals_and_exits_are_drawn_with_their_rates()
    {
        var map = Draw(RenderingFixtures.Solved("harbourside"));

        // Source: contract example. Arrivals 11.5/h at emergency and 18/d = 0.75/h at the ward; the remainder of
        // emergency's routes (23%) leaves: 0.23 x 18.699 = 4.30/h; the discharge lounge sends everyone home.
        Assert.Contains(("stub arrival", "11.50/h"), map.Unit("emergency").Stubs);
        Assert.Contains(("stub arrival", "0.7500/h"), map.Unit("ward").Stubs);
        Assert.Contains(("stub exit", "4.301/h"), map.Unit("emergency").Stubs);
        Assert.Contains(map.Unit("discharge_lounge").Stubs, s => s.Class == "stub exit");
        Assert.DoesNotContain(map.Unit("lab").Stubs, s => s.Class == "stub arrival");
        Assert.Contains(map.Unit("emergency").Texts, t => t.Text == "in 11.50/h");
    }

    [Theory]
    [InlineData(TimeUnit.Hour)]
    [InlineData(TimeUnit.Minute)]
    [InlineData(TimeUnit.Day)]
    public void The_mean_wait_is_written_in_the_unit_that_reads_best_whatever_the_file_time_unit(TimeUnit unit)
    {
        // Source: contract example (the Jackson network: no service_cv), emergency mean_wait 0.003167 h = 0.19002 min;
        // under an hour, so in minutes.
        const string expected = "wait 0.1900 min";
        var network = TestNetworks.JacksonExample("harbourside.yaml") with { TimeUnit = unit };
        var map = Draw(NetworkSolver.Solve(network));

        Assert.Contains(map.Unit("emergency").Texts, t => t.Text == expected);
    }

    [Fact]
    public void Status_is_carried_by_a_glyph_and_a_word_as_well_as_the_fill()
    {
        var surge = Draw(RenderingFixtures.Solved("fenwick-winter-surge"));
        var harbour = Draw(RenderingFixtures.Solved("harbourside"));

        // Source: the fenwick example says its medical ward is unstable; the contract says harbourside's ward is the bottleneck.
        var ward = surge.Unit("medical_ward");
        Assert.Equal("unstable", ward.Status);
        Assert.Contains(ward.Texts, t => t.Text == "\u2716 unstable");
        Assert.Contains(ward.Texts, t => t.Text == "wait unbounded");
        Assert.Equal(HarbourLightsPalette.For(UnitStatus.Unstable).BorderDash, (string?)ward.Rect.Attribute("stroke-dasharray"));
        Assert.Contains(harbour.Unit("ward").Texts, t => t.Text == "\u25C6 bottleneck");
        Assert.Contains(harbour.Unit("emergency").Texts, t => t.Text == "\u25CB ok");
    }

    [Fact]
    public void The_same_solution_always_gives_the_same_map()
    {
        var solution = RenderingFixtures.Generated(40, 3);
        Assert.Equal(
            SvgMapWriter.WriteString(MapLayoutBuilder.Build(solution)),
            SvgMapWriter.WriteString(MapLayoutBuilder.Build(solution)));
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    public void A_generated_40_unit_hospital_has_no_overlaps_and_legible_text_at_A4_width(int seed)
    {
        var solution = RenderingFixtures.Generated(40, seed);
        Assert.Equal(40, solution.Units.Length);
        string svg = SvgMapWriter.WriteString(MapLayoutBuilder.Build(solution));
        var map = SvgMap.Parse(svg);
        File.WriteAllText(Path.Combine(RenderingFixtures.OutputFolder(), FormattableString.Invariant($"generated-40-seed{seed}.svg")), svg);

        AssertNoOverlap(map);
        AssertFlowsTouchTheirBoxes(map);
        AssertTextFits(map);

        // Source: ISO 216, A4 is 210 mm wide; the report prints with 15 mm side margins, leaving 180 mm.
        // From memory: journal figure guides (Nature's among them) ask for text of at least 5 to 7 pt at final
        // printed size; we hold the map to 6 pt. 1 pt = 25.4/72 mm (PostScript point).
        const double printableMm = 210.0 - (2 * 15.0);
        const double minimumPt = 6.0;
        double smallestPt = map.FontSizes.Min() * (printableMm / map.Width) * (72.0 / 25.4);
        Assert.True(smallestPt >= minimumPt, FormattableString.Invariant($"smallest text prints at {smallestPt:0.00} pt on A4 (map {map.Width:0} wide)"));
    }

    internal static void AssertNoOverlap(SvgMap map)
    {
        for (int i = 0; i < map.Units.Count; i++)
        {
            for (int j = i + 1; j < map.Units.Count; j++)
            {
                Assert.False(map.Units[i].Box.Overlaps(map.Units[j].Box), $"{map.Units[i].Id} overlaps {map.Units[j].Id}");
            }
        }
    }

    internal static void AssertFlowsTouchTheirBoxes(SvgMap map)
    {
        // Coordinates are written with two decimals and MSAGL clips curves at the box outline: 1 map unit covers both.
        const double tolerance = 1.0;
        foreach (var flow in map.Flows)
        {
            double start = map.Unit(flow.From).Box.DistanceToBorder(flow.Start);
            double end = map.Unit(flow.To).Box.DistanceToBorder(flow.Tip);
            Assert.True(start <= tolerance, FormattableString.Invariant($"{flow.From} -> {flow.To} starts {start:0.00} from its source box"));
            Assert.True(end <= tolerance, FormattableString.Invariant($"{flow.From} -> {flow.To} ends {end:0.00} from its target box"));
        }
    }

    internal static void AssertTextFits(SvgMap map)
    {
        foreach (var unit in map.Units)
        {
            foreach (var text in unit.Texts)
            {
                var (width, ascent, descent) = FontMeasure.Measure(text.Text, text.FontSize, text.IsBold);
                string where = $"'{text.Text}' in {unit.Id}";
                Assert.True(text.X >= unit.Box.X && text.X + width <= unit.Box.Right, FormattableString.Invariant($"{where}: {text.X:0.0}+{width:0.0} outside {unit.Box.X:0.0}..{unit.Box.Right:0.0}"));
                Assert.True(text.Baseline - ascent >= unit.Box.Y && text.Baseline + descent <= unit.Box.Bottom, $"{where}: vertical overflow");
            }
        }
    }
}
