using NetSolve.Parsing;
using NetSolve.Rendering.Map;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Rendering;

/// <summary>The map dashes only the return routes, the back edges of the order that keeps the heaviest flow forward.</summary>
public sealed class ReturnRouteMapTests
{
    private static NetworkSolution Ashgrove()
    {
        var read = NetworkReader.ReadFile(TestFiles.TestData("Map", "ashgrove-return-to-theatre.yaml"));
        Assert.True(read.Network is not null, string.Join("\n", read.Diagnostics));
        return NetworkSolver.Solve(read.Network!);
    }

    private static SvgMap Draw(NetworkSolution solution) => SvgMap.Parse(SvgMapWriter.WriteString(MapLayoutBuilder.Build(solution)));

    [Fact]
    public void A_five_percent_return_to_theatre_is_dashed_and_the_elective_pathway_is_solid()
    {
        var map = Draw(Ashgrove());

        // Exact by hand: pre-op -> theatres -> recovery -> surgical ward carries every elective patient; the ward's 5%
        // back to theatres is the only line against it. The ward is listed first in the file, which once made the
        // layout turn recovery -> surgical ward into a dashed return.
        string[] onlyTheReturn = ["surgical_ward->theatres"];
        Assert.Equal(onlyTheReturn, map.Flows.Where(f => f.IsDashed).Select(f => f.From + "->" + f.To), StringComparer.Ordinal);
        Assert.All(map.Flows.Where(f => f.To != "theatres" || f.From == "preop"), f => Assert.Equal("forward", f.Kind));
    }

    [Fact]
    public void The_return_to_theatre_runs_up_the_page_and_the_pathway_runs_down_it()
    {
        var map = Draw(Ashgrove());

        // Geometric fact about the drawing: forward lines end below where they start, the return above.
        foreach (var flow in map.Flows)
        {
            double drop = map.Unit(flow.To).Box.Centre.Y - map.Unit(flow.From).Box.Centre.Y;
            Assert.True(flow.IsDashed ? drop < 0 : drop > 0, flow.From + " -> " + flow.To);
        }
    }

    [Theory]
    [InlineData(12, 1)]
    [InlineData(25, 7)]
    [InlineData(40, 11)]
    public void On_generated_hospitals_a_line_is_dashed_exactly_when_it_is_a_back_edge_of_the_chosen_order(int units, int seed)
    {
        var solution = RenderingFixtures.Generated(units, seed);
        var index = solution.Network.BuildIndex();
        var routes = solution.Network.Routes.Where(r => r.Probability > 0).ToList();
        var lines = routes.Select(r => (index[r.From], index[r.To], solution.Units[index[r.From]].ArrivalsPerHour * r.Probability)).ToList();
        bool[] isReturn = ReturnRoutes.Choose(units, lines);

        var map = Draw(solution);

        // Exact by hand: the map draws the feedback set chosen from the flows, nothing else dashed.
        var expected = routes.Where((_, k) => isReturn[k]).Select(r => r.From + "->" + r.To).Order(StringComparer.Ordinal);
        Assert.Equal(expected, map.Flows.Where(f => f.IsDashed).Select(f => f.From + "->" + f.To).Order(StringComparer.Ordinal));
    }
}
