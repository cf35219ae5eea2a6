using NetSolve.Rendering.Map;

namespace NetSolve.Tests.Rendering;

public sealed class ReturnRoutesTests
{
    [Fact]
    public void A_small_return_to_theatre_is_the_return_and_the_pathway_stays_forward()
    {
        // Units: 0 surgical ward, 1 theatres, 2 pre-op, 3 recovery; the ward sends 5% back to theatre.
        var lines = new List<(int, int, double)> { (2, 1, 0.71), (1, 3, 0.75), (3, 0, 0.75), (0, 1, 0.04) };

        bool[] isReturn = ReturnRoutes.Choose(4, lines);

        // Exact by hand: the only cycle is theatres -> recovery -> ward -> theatres; the lightest line on it is the
        // ward's return (0.04/h), and the greedy order pre-op, theatres, recovery, ward makes it the only back edge.
        bool[] onlyTheWardsReturn = [false, false, false, true];
        Assert.Equal(onlyTheWardsReturn, isReturn);
    }

    [Fact]
    public void A_repeat_visit_is_always_a_return()
    {
        bool[] isReturn = ReturnRoutes.Choose(2, [(0, 1, 1.0), (1, 1, 0.2)]);

        bool[] onlyTheRepeat = [false, true];
        Assert.Equal(onlyTheRepeat, isReturn);
    }

    [Fact]
    public void A_network_without_loops_has_no_return_whatever_its_file_order()
    {
        // Exact by hand: a chain 3 -> 1 -> 0 -> 2 listed out of order has an order with every line forward.
        bool[] isReturn = ReturnRoutes.Choose(4, [(3, 1, 1.0), (1, 0, 1.0), (0, 2, 1.0)]);

        Assert.All(isReturn, Assert.False);
    }

    [Fact]
    public void Of_two_lines_closing_a_loop_the_lighter_one_is_the_return()
    {
        // Exact by hand: a two-unit loop costs one of its lines; keeping the heavier forward costs the lighter.
        bool[] firstLighter = [true, false];
        bool[] secondLighter = [false, true];
        Assert.Equal(firstLighter, ReturnRoutes.Choose(2, [(0, 1, 0.3), (1, 0, 2.0)]));
        Assert.Equal(secondLighter, ReturnRoutes.Choose(2, [(0, 1, 2.0), (1, 0, 0.3)]));
    }

    [Theory]
    [InlineData(12, 1)]
    [InlineData(25, 7)]
    [InlineData(40, 11)]
    public void The_forward_lines_never_close_a_loop_and_the_returns_carry_less_flow_than_the_forward_lines_they_would_replace(int units, int seed)
    {
        var solution = RenderingFixtures.Generated(units, seed);
        var index = solution.Network.BuildIndex();
        var lines = solution.Network.Routes.Where(r => r.Probability > 0)
            .Select(r => (index[r.From], index[r.To], solution.Units[index[r.From]].ArrivalsPerHour * r.Probability)).ToList();

        bool[] isReturn = ReturnRoutes.Choose(units, lines);

        // Exact by hand (definition of a feedback arc set): removing the returns leaves no cycle, checked by a
        // topological sort of the forward lines (Kahn's algorithm).
        var forward = lines.Where((_, k) => !isReturn[k]).ToList();
        var inDegree = new int[units];
        foreach (var (_, to, _) in forward)
        {
            inDegree[to]++;
        }

        var ready = new Queue<int>(Enumerable.Range(0, units).Where(u => inDegree[u] == 0));
        int sorted = 0;
        while (ready.Count > 0)
        {
            int u = ready.Dequeue();
            sorted++;
            foreach (var (from, to, _) in forward.Where(line => line.Item1 == u))
            {
                if (--inDegree[to] == 0)
                {
                    ready.Enqueue(to);
                }
            }
        }

        Assert.Equal(units, sorted);
        // Common practice: the generated hospitals route 50-75% of patients onward and 5-10% back, so the returns
        // must carry less than a quarter of the flow between units.
        double returned = lines.Where((_, k) => isReturn[k]).Sum(line => line.Item3);
        Assert.True(returned < 0.25 * lines.Sum(line => line.Item3), "the returns carry the lighter flow");
    }
}
