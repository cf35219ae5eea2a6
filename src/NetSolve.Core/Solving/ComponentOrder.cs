using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// Orders units so that every strongly connected set of units comes after all the sets that route into it
/// (a topological order of the condensation), by Tarjan's algorithm without recursion.
/// </summary>
/// <remarks>
/// Tarjan (1972), "Depth-first search and linear graph algorithms", SIAM J. Computing 1(2). Linear in units plus
/// routes; an explicit stack keeps 100,000-unit networks clear of stack overflow.
/// </remarks>
internal static class ComponentOrder
{
    /// <summary>The included units, upstream sets first; within a set, in discovery order.</summary>
    public static int[] Upstream(RoutingTable routing, bool[] include) => Upstream(routing, include, setSizes: null);

    /// <summary>
    /// As <see cref="Upstream(RoutingTable, bool[])"/>, and adds to <paramref name="setSizes"/> the number of units of
    /// each strongly connected set, in the order the sets appear.
    /// </summary>
    public static int[] Upstream(RoutingTable routing, bool[] include, List<int>? setSizes)
    {
        int n = routing.UnitCount;
        var index = new int[n];
        var low = new int[n];
        var onStack = new bool[n];
        var nextEdge = new int[n];
        Array.Fill(index, -1);
        var stack = new Stack<int>();
        var call = new Stack<int>();
        var emitted = new List<int>(n);
        int counter = 0;

        for (int start = 0; start < n; start++)
        {
            if (!include[start] || index[start] >= 0)
            {
                continue;
            }

            Visit(start);
            while (call.Count > 0)
            {
                int unit = call.Peek();
                if (nextEdge[unit] < routing.Offsets[unit + 1])
                {
                    int edge = nextEdge[unit]++;
                    int target = routing.Targets[edge];
                    if (!include[target] || routing.Probabilities[edge] <= 0.0)
                    {
                        continue;
                    }

                    if (index[target] < 0)
                    {
                        Visit(target);
                    }
                    else if (onStack[target])
                    {
                        low[unit] = Math.Min(low[unit], index[target]);
                    }

                    continue;
                }

                call.Pop();
                if (call.Count > 0)
                {
                    low[call.Peek()] = Math.Min(low[call.Peek()], low[unit]);
                }

                if (low[unit] == index[unit])
                {
                    int member;
                    int first = emitted.Count;
                    do
                    {
                        member = stack.Pop();
                        onStack[member] = false;
                        emitted.Add(member);
                    }
                    while (member != unit);

                    emitted.Reverse(first, emitted.Count - first);
                    setSizes?.Add(emitted.Count - first);
                }
            }
        }

        // Tarjan emits sets downstream first; reverse the sets, keeping each set's members together.
        emitted.Reverse();
        setSizes?.Reverse();
        return [.. emitted];

        void Visit(int unit)
        {
            index[unit] = low[unit] = counter++;
            nextEdge[unit] = routing.Offsets[unit];
            stack.Push(unit);
            onStack[unit] = true;
            call.Push(unit);
        }
    }
}
