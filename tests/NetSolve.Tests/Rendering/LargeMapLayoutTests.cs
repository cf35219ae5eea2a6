using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Model;
using NetSolve.Rendering.Map;
using NetSolve.Solving;

namespace NetSolve.Tests.Rendering;

/// <summary>
/// The layout of a network above <see cref="MapLayoutBuilder.MaxLayeredUnits"/> units: every unit drawn once, no
/// boxes on top of each other, lines from box to box, layers that follow the routes, the same map every time.
/// </summary>
public class LargeMapLayoutTests
{
    public static TheoryData<string> LargeNetworks => ["hospital", "groups"];

    /// <summary>A generated hospital of 400 units, or six separate pathways of 60 units with returns: two shapes of large network.</summary>
    private static NetworkSolution Large(string shape) => shape == "hospital"
        ? RenderingFixtures.Generated(400, 3)
        : NetworkSolver.Solve(Pathways(groups: 6, length: 60));

    [Theory]
    [MemberData(nameof(LargeNetworks))]
    public void Every_unit_is_placed_once_and_no_two_boxes_overlap(string shape)
    {
        var solution = Large(shape);
        foreach (var direction in new[] { MapDirection.TopToBottom, MapDirection.LeftToRight })
        {
            var nodes = MapLayoutBuilder.Build(solution, direction).Nodes;

            Assert.Equal(solution.Units.Select(u => u.Unit.Id), nodes.Select(n => n.UnitId), StringComparer.Ordinal);
            var byLeft = nodes.OrderBy(n => n.Left).ToList();
            for (int i = 0; i < byLeft.Count; i++)
            {
                for (int j = i + 1; j < byLeft.Count && byLeft[j].Left < byLeft[i].Right; j++)
                {
                    bool overlap = byLeft[j].Top < byLeft[i].Bottom && byLeft[i].Top < byLeft[j].Bottom;
                    Assert.False(overlap, $"{byLeft[i].UnitId} and {byLeft[j].UnitId} overlap ({direction})");
                }
            }
        }
    }

    [Theory]
    [MemberData(nameof(LargeNetworks))]
    public void Every_line_leaves_its_source_box_and_its_arrow_points_at_its_target_box(string shape)
    {
        var solution = Large(shape);
        foreach (var direction in new[] { MapDirection.TopToBottom, MapDirection.LeftToRight })
        {
            var layout = MapLayoutBuilder.Build(solution, direction);
            var boxes = layout.Nodes.ToDictionary(n => n.UnitId, StringComparer.Ordinal);
            int routes = solution.Network.Routes.Count(route => route.Probability > 0.0);

            Assert.Equal(routes, layout.Edges.Length);
            foreach (var edge in layout.Edges)
            {
                Assert.True(OnBorder(boxes[edge.From], edge.Start), $"{edge.From} -> {edge.To} starts at {edge.Start}, off its box ({direction})");
                Assert.True(OnBorder(boxes[edge.To], edge.ArrowTip), $"{edge.From} -> {edge.To} ends at {edge.ArrowTip}, off its box ({direction})");
                Assert.False(Inside(boxes[edge.To], edge.ArrowBase), $"{edge.From} -> {edge.To}: the arrow starts inside its target");
            }
        }
    }

    [Fact]
    public void Lines_that_are_not_returns_run_to_a_later_layer_and_every_return_closes_a_cycle()
    {
        // Source: a depth-first search's back edges are exactly the lines that close a cycle with the search's
        // tree (Tarjan, SIAM Journal on Computing 1(2), 1972, pp. 146-160), so removing them leaves no cycle, and
        // longest-path layers then put every remaining line's target below its source.
        var solution = RenderingFixtures.Generated(400, 5);
        var index = solution.Network.BuildIndex();
        var lines = solution.Network.Routes.Where(r => r.Probability > 0.0)
            .Select(r => (index[r.From], index[r.To], solution.Units[index[r.From]].ArrivalsPerHour * r.Probability)).ToList();
        var arrivals = new double[solution.Units.Length];
        foreach (var arrival in solution.Network.Arrivals)
        {
            arrivals[index[arrival.UnitId]] += arrival.PerHour;
        }

        var layering = LargeMapLayering.Compute(solution.Units.Length, lines, arrivals);

        Assert.Contains(true, layering.IsReturn);
        for (int k = 0; k < lines.Count; k++)
        {
            var (from, to, _) = lines[k];
            if (layering.IsReturn[k])
            {
                Assert.True(from == to || Reaches(to, from, lines, layering.IsReturn), FormattableString.Invariant($"return {from} -> {to} closes no cycle"));
            }
            else
            {
                Assert.True(layering.Layer[to] > layering.Layer[from], FormattableString.Invariant($"line {from} -> {to} does not run to a later layer"));
            }

            Assert.Equal(layering.Component[from], layering.Component[to]);
        }

        // Every unit is in exactly one layer of its group.
        var placed = layering.Layers.SelectMany((layers, group) => layers.SelectMany((units, layer) => units.Select(unit => (unit, group, layer)))).ToList();
        Assert.Equal(Enumerable.Range(0, solution.Units.Length), placed.Select(p => p.unit).Order());
        Assert.All(placed, p => Assert.Equal((layering.Component[p.unit], layering.Layer[p.unit]), (p.group, p.layer)));
    }

    [Fact]
    public void The_heaviest_pathway_runs_forward_and_a_small_return_is_the_dashed_line()
    {
        // A pathway of 300 units, each sending 90% on and, at every tenth, 5% back to the unit before: the
        // back lines must be the returns, never the pathway (the fact the map's return routes stand for).
        var solution = NetworkSolver.Solve(Pathways(groups: 1, length: 300));
        var layout = MapLayoutBuilder.Build(solution);

        Assert.All(layout.Edges, edge => Assert.Equal(
            string.CompareOrdinal(edge.To, edge.From) < 0 ? MapEdgeKind.Feedback : MapEdgeKind.Forward,
            edge.Kind));
    }

    [Theory]
    [MemberData(nameof(LargeNetworks))]
    public void The_boxes_cover_a_fair_share_of_the_map(string shape)
    {
        // Measured before wide layers were wrapped (each band as wide as its widest layer): the generated 400-unit
        // hospital's map covered 4.24 times its boxes' area; after, 3.56. The pathways, one unit a layer, had 2.78
        // either way. A box with its share of the gaps between boxes (24 units beside a box 90 to 150 wide) and
        // between layers (50 below one about 77 high) already takes about twice its own area, so no packing goes under 2.
        var layout = MapLayoutBuilder.Build(Large(shape));
        double ratio = layout.Width * layout.Height / layout.Nodes.Sum(node => node.Width * node.Height);

        Assert.InRange(ratio, 2.0, shape == "hospital" ? 3.8 : 2.9);
    }

    [Theory]
    [MemberData(nameof(LargeNetworks))]
    public void A_forward_line_up_to_a_later_band_runs_in_the_gaps_and_crosses_no_box(string shape)
    {
        // A forward line whose target stands above (or, flowing right, left of) its source ends in a later band.
        // Measured before such lines were routed (one curve straight across): every one crossed boxes on the way,
        // 90 of 90 on the hospital and 36 of 36 on the pathways, flowing down.
        var solution = Large(shape);
        foreach (var direction in new[] { MapDirection.TopToBottom, MapDirection.LeftToRight })
        {
            bool down = direction == MapDirection.TopToBottom;
            var layout = MapLayoutBuilder.Build(solution, direction);
            var boxes = layout.Nodes.ToDictionary(n => n.UnitId, StringComparer.Ordinal);
            var later = layout.Edges.Where(edge => edge.Kind == MapEdgeKind.Forward
                && (down ? boxes[edge.To].Top < boxes[edge.From].Top : boxes[edge.To].Left < boxes[edge.From].Left)).ToList();
            Assert.NotEmpty(later);

            foreach (var edge in later)
            {
                var crossed = PathPoints(edge.PathData)
                    .SelectMany(point => layout.Nodes.Where(box => point.X > box.Left + 0.5 && point.X < box.Right - 0.5 && point.Y > box.Top + 0.5 && point.Y < box.Bottom - 0.5))
                    .Select(box => box.UnitId).Distinct(StringComparer.Ordinal).ToList();
                Assert.True(crossed.Count == 0, $"{edge.From} -> {edge.To} crosses {string.Join(", ", crossed)} ({direction})");
            }
        }
    }

    [Fact]
    public void The_same_network_gives_the_same_map()
    {
        var solution = RenderingFixtures.Generated(300, 2);

        Assert.Equal(
            SvgMapWriter.WriteString(MapLayoutBuilder.Build(solution)),
            SvgMapWriter.WriteString(MapLayoutBuilder.Build(RenderingFixtures.Generated(300, 2))));
    }

    [Fact]
    public void The_layered_library_draws_up_to_its_limit_and_the_large_layout_above_it()
    {
        // The full box lists the servers ("2 servers"); the large map's shorter box leaves them to the table.
        var atLimit = SvgMap.Parse(SvgMapWriter.WriteString(MapLayoutBuilder.Build(NetworkSolver.Solve(Pathways(1, MapLayoutBuilder.MaxLayeredUnits)))));
        var above = SvgMap.Parse(SvgMapWriter.WriteString(MapLayoutBuilder.Build(NetworkSolver.Solve(Pathways(1, MapLayoutBuilder.MaxLayeredUnits + 1)))));

        Assert.All(atLimit.Units, unit => Assert.Contains(unit.Texts, text => text.Text == "2 servers"));
        Assert.All(above.Units, unit => Assert.DoesNotContain(unit.Texts, text => text.Text.EndsWith("servers", StringComparison.Ordinal)));
        Assert.All(above.Units, unit => Assert.Contains(unit.Texts, text => text.Text.StartsWith("wait ", StringComparison.Ordinal)));
    }

    [Fact]
    public void Separate_groups_are_laid_out_apart()
    {
        var layout = MapLayoutBuilder.Build(NetworkSolver.Solve(Pathways(groups: 6, length: 60)));
        var areas = layout.Nodes.GroupBy(n => n.UnitId[..1], StringComparer.Ordinal)
            .Select(g => (Left: g.Min(n => n.Left), Top: g.Min(n => n.Top), Right: g.Max(n => n.Right), Bottom: g.Max(n => n.Bottom)))
            .ToList();

        Assert.Equal(6, areas.Count);
        for (int i = 0; i < areas.Count; i++)
        {
            for (int j = i + 1; j < areas.Count; j++)
            {
                bool overlap = areas[i].Left < areas[j].Right && areas[j].Left < areas[i].Right && areas[i].Top < areas[j].Bottom && areas[j].Top < areas[i].Bottom;
                Assert.False(overlap, FormattableString.Invariant($"groups {i} and {j} share ground"));
            }
        }
    }

    /// <summary>
    /// <paramref name="groups"/> separate pathways (ids <c>aNNNN</c>, <c>bNNNN</c>, ...) of <paramref name="length"/>
    /// units: 1 patient an hour arrives at the first, each unit sends 90% on and at every tenth unit 5% back to the one before.
    /// </summary>
    internal static Network Pathways(int groups, int length)
    {
        var units = ImmutableArray.CreateBuilder<Unit>();
        var routes = ImmutableArray.CreateBuilder<Route>();
        var arrivals = ImmutableArray.CreateBuilder<Arrival>();
        for (int g = 0; g < groups; g++)
        {
            string Id(int i) => string.Create(CultureInfo.InvariantCulture, $"{(char)('a' + g)}{i:D4}");
            arrivals.Add(new Arrival(Id(0), 1.0));
            for (int i = 0; i < length; i++)
            {
                units.Add(new Unit(Id(i), "Invented ward " + Id(i), Servers.Of(2), 1.0));
                if (i + 1 < length)
                {
                    routes.Add(new Route(Id(i), Id(i + 1), 0.9));
                }

                if (i % 10 == 9)
                {
                    routes.Add(new Route(Id(i), Id(i - 1), 0.05));
                }
            }
        }

        return new Network("Invented region", TimeUnit.Hour, units.ToImmutable(), arrivals.ToImmutable(), routes.ToImmutable());
    }

    /// <summary>Points every few units along SVG path data of M, L, Q and C commands (absolute), as the SVG draws it.</summary>
    private static IEnumerable<MapPoint> PathPoints(string pathData)
    {
        const int Steps = 40;
        var tokens = pathData.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        var at = new MapPoint(0.0, 0.0);
        int i = 0;
        MapPoint Next()
        {
            var point = new MapPoint(double.Parse(tokens[i], CultureInfo.InvariantCulture), double.Parse(tokens[i + 1], CultureInfo.InvariantCulture));
            i += 2;
            return point;
        }

        while (i < tokens.Length)
        {
            string command = tokens[i++];
            var controls = command switch
            {
                "M" or "L" => new[] { Next() },
                "Q" => [Next(), Next()],
                "C" => [Next(), Next(), Next()],
                _ => throw new InvalidOperationException("Unexpected path command " + command),
            };
            if (command == "M")
            {
                at = controls[0];
                yield return at;
                continue;
            }

            var polygon = controls.Prepend(at).ToArray();
            for (int step = 1; step <= Steps; step++)
            {
                yield return DeCasteljau(polygon, (double)step / Steps);
            }

            at = controls[^1];
        }
    }

    private static MapPoint DeCasteljau(MapPoint[] polygon, double t)
    {
        var points = (MapPoint[])polygon.Clone();
        for (int level = points.Length - 1; level > 0; level--)
        {
            for (int k = 0; k < level; k++)
            {
                points[k] = new MapPoint(points[k].X + (t * (points[k + 1].X - points[k].X)), points[k].Y + (t * (points[k + 1].Y - points[k].Y)));
            }
        }

        return points[0];
    }

    private static bool OnBorder(MapNode box, MapPoint point)
    {
        const double Tolerance = 0.01;
        bool withinX = point.X >= box.Left - Tolerance && point.X <= box.Right + Tolerance;
        bool withinY = point.Y >= box.Top - Tolerance && point.Y <= box.Bottom + Tolerance;
        bool onSide = Math.Abs(point.X - box.Left) < Tolerance || Math.Abs(point.X - box.Right) < Tolerance
            || Math.Abs(point.Y - box.Top) < Tolerance || Math.Abs(point.Y - box.Bottom) < Tolerance;
        return withinX && withinY && onSide;
    }

    private static bool Inside(MapNode box, MapPoint point) =>
        point.X > box.Left && point.X < box.Right && point.Y > box.Top && point.Y < box.Bottom;

    /// <summary>Whether <paramref name="from"/> reaches <paramref name="to"/> along lines that are not returns.</summary>
    private static bool Reaches(int from, int to, List<(int From, int To, double PerHour)> lines, IReadOnlyList<bool> isReturn)
    {
        var seen = new HashSet<int> { from };
        var queue = new Queue<int>([from]);
        while (queue.Count > 0)
        {
            int unit = queue.Dequeue();
            if (unit == to)
            {
                return true;
            }

            for (int k = 0; k < lines.Count; k++)
            {
                if (!isReturn[k] && lines[k].From == unit && seen.Add(lines[k].To))
                {
                    queue.Enqueue(lines[k].To);
                }
            }
        }

        return false;
    }
}
