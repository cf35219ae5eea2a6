using QuikGraph;
using QuikGraph.Algorithms;

namespace NetSolve.Model;

/// <summary>
/// Sets of reached units that patients enter and can never leave: the routing structure for which the traffic
/// equations have no solution. A valid network has none.
/// </summary>
/// <remarks>Thread-safe: reads the routing table only.</remarks>
public static class ClosedUnitSets
{
    /// <summary>
    /// Strongly connected sets of <paramref name="reached"/> units with no exit probability and no route out of the
    /// set, as unit positions: each set sorted, the sets in the order of their first unit. Empty when patients can leave.
    /// </summary>
    public static IReadOnlyList<IReadOnlyList<int>> Find(RoutingTable routing, bool[] reached)
    {
        ArgumentNullException.ThrowIfNull(routing);
        ArgumentNullException.ThrowIfNull(reached);
        // A closed set exists only if some reached unit cannot reach an exit. Checking that with plain arrays is
        // linear and allocation-light; the graph library's components are needed only to name the sets.
        if (EveryReachedUnitCanLeave(routing, reached))
        {
            return [];
        }

        var graph = new AdjacencyGraph<int, SEquatableEdge<int>>(allowParallelEdges: false);
        for (int i = 0; i < routing.UnitCount; i++)
        {
            if (reached[i])
            {
                graph.AddVertex(i);
            }
        }

        for (int from = 0; from < routing.UnitCount; from++)
        {
            for (int k = routing.Offsets[from]; k < routing.Offsets[from + 1]; k++)
            {
                if (reached[from] && routing.Probabilities[k] > 0.0)
                {
                    graph.AddEdge(new SEquatableEdge<int>(from, routing.Targets[k]));
                }
            }
        }

        var componentOf = new Dictionary<int, int>();
        graph.StronglyConnectedComponents(componentOf);
        var leaks = new HashSet<int>();
        foreach (var (unit, component) in componentOf)
        {
            if (routing.ExitProbability(unit) > 0.0)
            {
                leaks.Add(component);
            }

            foreach (var edge in graph.OutEdges(unit))
            {
                if (componentOf[edge.Target] != component)
                {
                    leaks.Add(component);
                }
            }
        }

        return componentOf
            .Where(pair => !leaks.Contains(pair.Value))
            .GroupBy(pair => pair.Value)
            .Select(group => (IReadOnlyList<int>)[.. group.Select(pair => pair.Key).Order()])
            .OrderBy(set => set[0])
            .ToList();
    }

    /// <summary>True when from every reached unit some path of positive routes leads to a unit with an exit.</summary>
    private static bool EveryReachedUnitCanLeave(RoutingTable routing, bool[] reached)
    {
        int n = routing.UnitCount;
        var incomingStart = new int[n + 1];
        for (int from = 0; from < n; from++)
        {
            for (int k = routing.Offsets[from]; k < routing.Offsets[from + 1]; k++)
            {
                if (routing.Probabilities[k] > 0.0)
                {
                    incomingStart[routing.Targets[k] + 1]++;
                }
            }
        }

        for (int i = 0; i < n; i++)
        {
            incomingStart[i + 1] += incomingStart[i];
        }

        var fill = (int[])incomingStart.Clone();
        var sources = new int[incomingStart[n]];
        for (int from = 0; from < n; from++)
        {
            for (int k = routing.Offsets[from]; k < routing.Offsets[from + 1]; k++)
            {
                if (routing.Probabilities[k] > 0.0)
                {
                    sources[fill[routing.Targets[k]]++] = from;
                }
            }
        }

        // Walk backwards from every unit with an exit: whoever is found can leave.
        var canLeave = new bool[n];
        var pending = new Stack<int>();
        for (int i = 0; i < n; i++)
        {
            if (routing.ExitProbability(i) > 0.0)
            {
                canLeave[i] = true;
                pending.Push(i);
            }
        }

        while (pending.Count > 0)
        {
            int unit = pending.Pop();
            for (int k = incomingStart[unit]; k < incomingStart[unit + 1]; k++)
            {
                if (!canLeave[sources[k]])
                {
                    canLeave[sources[k]] = true;
                    pending.Push(sources[k]);
                }
            }
        }

        for (int i = 0; i < n; i++)
        {
            if (reached[i] && !canLeave[i])
            {
                return false;
            }
        }

        return true;
    }
}
