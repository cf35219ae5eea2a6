namespace NetSolve.Solving;

/// <summary>
/// The sparse path of <see cref="TrafficEquations"/>: Gauss-Seidel on λ_j = γ_j + Σ_i p_ij λ_i, one strongly
/// connected set of units at a time, in topological order.
/// </summary>
/// <remarks>
/// Units outside any loop are solved exactly in one step (all their inflows are already known); a loop is
/// swept until the largest change falls below the tolerance. Gauss-Seidel converges here because validation has
/// rejected closed sets: I − Pᵀ restricted to a set with an exit is an irreducibly diagonally dominant M-matrix.
/// Unlike a Krylov method it cannot break down, and each sweep costs one pass over the routes. Memory is
/// O(units + routes). Not thread-safe per call only in the sense that it allocates its own arrays; pure otherwise.
/// </remarks>
internal static class SparseTrafficSolver
{
    /// <summary>Flows of the reached units, by local position.</summary>
    /// <param name="routing">All routes.</param>
    /// <param name="members">Unit position of each reached unit, by local position.</param>
    /// <param name="position">Local position of each unit, −1 when unreached.</param>
    /// <param name="maxSweeps">Most sweeps over one loop before giving up.</param>
    /// <param name="tolerance">Relative to the largest flow in the loop: the largest change accepted as converged.</param>
    /// <exception cref="TrafficEquationsException">A loop did not converge within <paramref name="maxSweeps"/>.</exception>
    public static double[] Solve(RoutingTable routing, List<int> members, int[] position, int maxSweeps, double tolerance)
    {
        int n = members.Count;
        var incoming = BuildIncoming(routing, members, position, out var selfRoute);
        var (componentStarts, componentMembers) = ComponentsInTopologicalOrder(routing, members, position);
        var flows = new double[n];
        for (int c = 0; c < componentStarts.Length - 1; c++)
        {
            int start = componentStarts[c];
            int end = componentStarts[c + 1];
            if (end - start == 1)
            {
                int unit = componentMembers[start];
                flows[unit] = Update(unit, routing, members, incoming, selfRoute, flows);
                continue;
            }

            double change = double.PositiveInfinity;
            double scale = 1.0;
            for (int sweep = 0; sweep < maxSweeps && !(change <= tolerance * scale); sweep++)
            {
                change = 0.0;
                for (int k = start; k < end; k++)
                {
                    int unit = componentMembers[k];
                    double updated = Update(unit, routing, members, incoming, selfRoute, flows);
                    change = Math.Max(change, Math.Abs(updated - flows[unit]));
                    scale = Math.Max(scale, updated);
                    flows[unit] = updated;
                }
            }

            if (!(change <= tolerance * scale))
            {
                throw new TrafficEquationsException(change / scale);
            }
        }

        return flows;
    }

    private static double Update(int unit, RoutingTable routing, List<int> members, Incoming incoming, double[] selfRoute, double[] flows)
    {
        double inflow = routing.ExternalPerHour[members[unit]];
        for (int e = incoming.Offsets[unit]; e < incoming.Offsets[unit + 1]; e++)
        {
            inflow += incoming.Probabilities[e] * flows[incoming.Sources[e]];
        }

        return inflow / (1.0 - selfRoute[unit]);
    }

    private sealed record Incoming(int[] Offsets, int[] Sources, double[] Probabilities);

    /// <summary>Routes into each reached unit from other reached units, in compressed rows; self-routes apart.</summary>
    private static Incoming BuildIncoming(RoutingTable routing, List<int> members, int[] position, out double[] selfRoute)
    {
        int n = members.Count;
        selfRoute = new double[n];
        var offsets = new int[n + 1];
        for (int k = 0; k < n; k++)
        {
            int from = members[k];
            for (int e = routing.Offsets[from]; e < routing.Offsets[from + 1]; e++)
            {
                int to = position[routing.Targets[e]];
                if (to == k)
                {
                    selfRoute[k] += routing.Probabilities[e];
                }
                else if (to >= 0 && routing.Probabilities[e] > 0.0)
                {
                    offsets[to + 1]++;
                }
            }
        }

        for (int k = 0; k < n; k++)
        {
            offsets[k + 1] += offsets[k];
        }

        var next = (int[])offsets.Clone();
        var sources = new int[offsets[n]];
        var probabilities = new double[offsets[n]];
        for (int k = 0; k < n; k++)
        {
            int from = members[k];
            for (int e = routing.Offsets[from]; e < routing.Offsets[from + 1]; e++)
            {
                int to = position[routing.Targets[e]];
                if (to != k && to >= 0 && routing.Probabilities[e] > 0.0)
                {
                    int slot = next[to]++;
                    sources[slot] = k;
                    probabilities[slot] = routing.Probabilities[e];
                }
            }
        }

        return new Incoming(offsets, sources, probabilities);
    }

    /// <summary>
    /// Strongly connected sets of reached units (Tarjan's algorithm without recursion, so 100,000-unit chains do
    /// not overflow the stack), sources first: a set comes after every set that routes into it.
    /// </summary>
    private static (int[] Starts, int[] Members) ComponentsInTopologicalOrder(RoutingTable routing, List<int> members, int[] position)
    {
        int n = members.Count;
        var index = new int[n];
        var low = new int[n];
        var onStack = new bool[n];
        Array.Fill(index, -1);
        var stack = new int[n];
        int stackTop = 0;
        var callUnit = new int[n];
        var callEdge = new int[n];
        int callTop = 0;
        int counter = 0;

        // Tarjan emits each set after every set reachable from it: reverse topological order.
        var emitted = new int[n];
        int emittedCount = 0;
        var emittedEnds = new List<int>();

        for (int root = 0; root < n; root++)
        {
            if (index[root] >= 0)
            {
                continue;
            }

            Visit(root);
            while (callTop > 0)
            {
                int unit = callUnit[callTop - 1];
                int edge = callEdge[callTop - 1];
                int from = members[unit];
                if (edge < routing.Offsets[from + 1])
                {
                    callEdge[callTop - 1]++;
                    int target = position[routing.Targets[edge]];
                    if (target < 0 || !(routing.Probabilities[edge] > 0.0))
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

                callTop--;
                if (low[unit] == index[unit])
                {
                    int member;
                    do
                    {
                        member = stack[--stackTop];
                        onStack[member] = false;
                        emitted[emittedCount++] = member;
                    }
                    while (member != unit);
                    emittedEnds.Add(emittedCount);
                }

                if (callTop > 0)
                {
                    int parent = callUnit[callTop - 1];
                    low[parent] = Math.Min(low[parent], low[unit]);
                }
            }
        }

        var starts = new int[emittedEnds.Count + 1];
        var ordered = new int[n];
        int written = 0;
        for (int c = emittedEnds.Count - 1; c >= 0; c--)
        {
            int begin = c == 0 ? 0 : emittedEnds[c - 1];
            starts[emittedEnds.Count - 1 - c] = written;
            for (int k = begin; k < emittedEnds[c]; k++)
            {
                ordered[written++] = emitted[k];
            }
        }

        starts[emittedEnds.Count] = written;
        return (starts, ordered);

        void Visit(int unit)
        {
            index[unit] = counter;
            low[unit] = counter;
            counter++;
            stack[stackTop++] = unit;
            onStack[unit] = true;
            callUnit[callTop] = unit;
            callEdge[callTop] = routing.Offsets[members[unit]];
            callTop++;
        }
    }
}
