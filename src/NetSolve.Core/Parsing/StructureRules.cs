using NetSolve.Model;
using NetSolve.Solving;
using QuikGraph;
using QuikGraph.Algorithms;

namespace NetSolve.Parsing;

/// <summary>
/// Checks the routing structure: every set of reached units that patients enter and never leave is an error
/// (the traffic equations have no solution there); every unit no patient reaches is a warning.
/// </summary>
internal static class StructureRules
{
    public static void Check(Network network, NetworkLocations locations, List<Diagnostic> diagnostics)
    {
        var routing = RoutingTable.Build(network);
        bool[] reached = routing.ReachedUnits();
        for (int i = 0; i < reached.Length; i++)
        {
            if (!reached[i])
            {
                string id = network.Units[i].Id;
                diagnostics.Add(Diagnostic.Warning(DiagnosticCodes.Unreached, locations.Units[id], id,
                    "no patient reaches this unit (no arrivals and no route into it from a reached unit); it is reported with arrival rate 0"));
            }
        }

        foreach (var closedSet in ClosedSets(routing, reached))
        {
            var ids = closedSet.Select(i => network.Units[i].Id).ToList();
            string subject = ids.Count == 1
                ? $"unit '{ids[0]}'"
                : "units " + string.Join(", ", ids.Select(id => $"'{id}'"));
            string message = ids.Count == 1
                ? "patients who reach this unit can never leave the network; let its routes add up to less than 1"
                : "patients who reach these units can never leave the network; let the routes of at least one of them add up to less than 1";
            diagnostics.Add(new Diagnostic(DiagnosticSeverity.Error, DiagnosticCodes.NoExit, locations.For(ids[0]), subject, message));
        }
    }

    /// <summary>Strongly connected sets of reached units with no exit probability and no route out of the set, each sorted by file order.</summary>
    private static IEnumerable<List<int>> ClosedSets(RoutingTable routing, bool[] reached)
    {
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
            .Select(group => group.Select(pair => pair.Key).Order().ToList())
            .OrderBy(set => set[0]);
    }
}
