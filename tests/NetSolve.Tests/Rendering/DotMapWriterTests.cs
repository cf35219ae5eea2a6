using System.Text.RegularExpressions;
using NetSolve.Rendering.Map;

namespace NetSolve.Tests.Rendering;

public class DotMapWriterTests
{
    [Fact]
    public void Every_unit_route_arrival_and_exit_appears_in_the_dot()
    {
        var solution = RenderingFixtures.Solved("harbourside");
        string dot = DotMapWriter.Write(MapLayoutBuilder.Build(solution));

        // Source: Graphviz DOT language: "digraph ID { stmt_list }", edges "A -> B [attr=value, ...]" (from memory).
        Assert.StartsWith("digraph \"Harbourside Community Hospital, acute pathway\" {\n", dot, StringComparison.Ordinal);
        Assert.EndsWith("}\n", dot, StringComparison.Ordinal);
        foreach (var unit in solution.Network.Units)
        {
            Assert.Contains($"\n  \"{unit.Id}\" [style=", dot, StringComparison.Ordinal);
        }

        foreach (var route in solution.Network.Routes)
        {
            Assert.Contains($"\n  \"{route.From}\" -> \"{route.To}\" [label=", dot, StringComparison.Ordinal);
        }

        Assert.Contains("\"arrivals:emergency\" -> \"emergency\" [label=\"11.50/h\"", dot, StringComparison.Ordinal);
        Assert.Contains("\"emergency\" -> \"exit:emergency\" [label=\"4.301/h\"", dot, StringComparison.Ordinal);
        Assert.Matches("\"imaging\" -> \"emergency\" \\[[^\\]]*style=dashed", dot);
        Assert.Contains("peripheries=2", dot, StringComparison.Ordinal);
    }

    [Fact]
    public void A_large_maps_light_flows_are_pale_in_the_dot_as_in_the_svg()
    {
        var layout = MapLayoutBuilder.Build(RenderingFixtures.Generated(300, 2));
        string dot = DotMapWriter.Write(layout);
        var faint = layout.Edges.Where(edge => edge.Faint).ToList();
        var heavy = layout.Edges.Where(edge => !edge.Faint).ToList();
        Assert.NotEmpty(faint);
        Assert.NotEmpty(heavy);

        // Source: Graphviz colour attribute, "#RRGGBBAA" with alpha last (from memory); 0.3 opacity is 76.5 of 255, 0x4C or 0x4D.
        Assert.All(faint, edge => Assert.Matches($"\n  \"{Regex.Escape(edge.From)}\" -> \"{Regex.Escape(edge.To)}\" \\[[^\\]]*color=\"#[0-9A-F]{{6}}4[CD]\"", dot));
        Assert.All(heavy, edge => Assert.Matches($"\n  \"{Regex.Escape(edge.From)}\" -> \"{Regex.Escape(edge.To)}\" \\[[^\\]]*color=\"#[0-9A-F]{{6}}\"", dot));
    }

    [Fact]
    public void Quotes_backslashes_and_line_breaks_are_escaped()
    {
        // Source: Graphviz DOT language, double-quoted strings escape the quote as \" ; \n is a centred line break.
        Assert.Equal("\"St \\\"Mary\\\" \\\\ East\"", DotMapWriter.Quote("St \"Mary\" \\ East"));
        Assert.Equal("\"a\\nb\"", DotMapWriter.Quote("a\nb"));
    }
}
