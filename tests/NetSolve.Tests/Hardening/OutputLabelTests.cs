using System.Globalization;
using System.Xml.Linq;
using NetSolve.Rendering.Map;
using NetSolve.Rendering.Report;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening;

/// <summary>Very long labels are shortened where space is short and kept whole in tooltips and tables; control characters never reach an output.</summary>
public class OutputLabelTests
{
    private const string Yaml = """
        name: Invented Ashgrove clinic
        units:
          reception:
            label: Reception
            servers: 2
            service: 5min
          clinic:
            label: Clinic rooms
            servers: 4
            service: 20min
        arrivals:
          reception: 10/h
        routes:
          reception:
            clinic: 1.0
        """;

    private static readonly string LongWord = new('W', 10_000);

    private static readonly string LongWords = string.Join(' ', Enumerable.Repeat("ward", 2_000));

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void A_ten_thousand_character_label_gives_a_map_of_normal_width(bool withSpaces)
    {
        string label = withSpaces ? LongWords : LongWord;
        double shortWidth = MapWidth(Solve("Reception"));
        double longWidth = MapWidth(Solve(label));

        // Common practice: the bound, a map at most half again as wide as with a short label.
        Assert.True(longWidth <= 1.5 * shortWidth, string.Create(CultureInfo.InvariantCulture, $"{longWidth} against {shortWidth}"));
    }

    [Fact]
    public void A_shortened_label_ends_with_an_ellipsis_on_the_map_and_is_whole_in_the_tooltip_and_the_dot_file()
    {
        var layout = MapLayoutBuilder.Build(Solve(LongWords));
        var svg = SvgMapWriter.Write(layout);
        var unit = svg.Descendants(SvgMapWriter.Svg + "g").Single(g => (string?)g.Attribute("data-unit") == "reception");

        var labelLines = unit.Elements(SvgMapWriter.Svg + "text").Where(text => (string?)text.Attribute("font-weight") == "bold").Select(text => text.Value).ToList();
        Assert.InRange(labelLines.Count, 2, MapTypography.MaxLabelLines + 1);
        Assert.Contains(labelLines, line => line.EndsWith('\u2026'));
        Assert.Contains(LongWords, unit.Element(SvgMapWriter.Svg + "title")!.Value, StringComparison.Ordinal);
        Assert.Contains("tooltip=\"reception: " + LongWords, DotMapWriter.Write(layout), StringComparison.Ordinal);
    }

    [Fact]
    public void A_long_network_name_is_shortened_in_the_map_title_and_the_report_heading_and_whole_in_their_tooltips()
    {
        string name = string.Join(' ', Enumerable.Repeat("Ashgrove", 1_000));
        var solution = NetworkSolver.Solve(TestNetworks.Parse(Yaml) with { Name = name });

        double width = MapWidth(solution);
        string html = HtmlReport.Write(solution);

        Assert.True(width < 1_100.0, width.ToString(CultureInfo.InvariantCulture));
        Assert.Contains("<h1 title=\"" + name + "\">", html, StringComparison.Ordinal);
        Assert.Matches("<h1 title=\"[^\"]*\">[^<]{1,120}</h1>", html);
    }

    [Fact]
    public void The_report_keeps_a_long_label_whole_in_its_unit_table()
    {
        string html = HtmlReport.Write(Solve(LongWords));

        Assert.Contains(">" + LongWords + "</td>", html, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("\0")]
    [InlineData("\u0001")]
    [InlineData("\u001B[31m")]
    [InlineData("\uFFFE")]
    [InlineData("\u202E")]
    public void A_control_character_in_a_label_or_name_never_reaches_the_map_the_dot_file_or_the_report(string hostile)
    {
        var network = TestNetworks.Parse(Yaml);
        network = network with
        {
            Name = "Ashgrove" + hostile,
            Units = [.. network.Units.Select(unit => unit with { Label = "Room" + hostile + "one" })],
        };
        var solution = NetworkSolver.Solve(network);
        var layout = MapLayoutBuilder.Build(solution);

        string svg = SvgMapWriter.WriteString(layout);
        string dot = DotMapWriter.Write(layout);
        string html = HtmlReport.Write(solution);

        XDocument.Parse(svg);
        Assert.DoesNotContain(hostile, svg, StringComparison.Ordinal);
        Assert.DoesNotContain(hostile, dot, StringComparison.Ordinal);
        Assert.DoesNotContain(hostile, html, StringComparison.Ordinal);
    }

    private static NetworkSolution Solve(string receptionLabel)
    {
        var network = TestNetworks.Parse(Yaml);
        return NetworkSolver.Solve(network with
        {
            Units = [.. network.Units.Select(unit => unit.Id == "reception" ? unit with { Label = receptionLabel } : unit)],
        });
    }

    private static double MapWidth(NetworkSolution solution) =>
        double.Parse((string)SvgMapWriter.Write(MapLayoutBuilder.Build(solution)).Root!.Attribute("width")!, CultureInfo.InvariantCulture);
}
