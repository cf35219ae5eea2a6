using NetSolve.Diagnostics;
using NetSolve.Model;

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
        bool[] defaultReached = routing.ReachedUnits();
        bool[] reached = (bool[])defaultReached.Clone();
        var groupRoutings = network.Groups
            .Select(group => (Group: group, Routing: RoutingTable.Build(network with { Arrivals = group.Arrivals, Routes = group.Routes ?? network.Routes })))
            .ToList();
        foreach (var (_, groupRouting) in groupRoutings)
        {
            bool[] groupReached = groupRouting.ReachedUnits();
            for (int i = 0; i < reached.Length; i++)
            {
                reached[i] |= groupReached[i];
            }
        }

        for (int i = 0; i < reached.Length; i++)
        {
            if (!reached[i])
            {
                string id = network.Units[i].Id;
                diagnostics.Add(Diagnostic.Warning(DiagnosticCodes.Unreached, locations.Units[id], id,
                    "no patient reaches this unit (no arrivals and no route into it from a reached unit); it is reported with arrival rate 0"));
            }
        }

        var reported = new HashSet<string>(StringComparer.Ordinal);
        ReportClosedSets(network, routing, defaultReached, null, locations.For, reported, diagnostics);
        foreach (var (group, groupRouting) in groupRoutings)
        {
            // A group with its own routes is pointed at by its key; one that follows the network's routes, by those routes.
            Func<string, SourceLocation> at = group.Routes is null ? locations.For : _ => locations.Groups[group.Id];
            ReportClosedSets(network, groupRouting, groupRouting.ReachedUnits(), group.Id, at, reported, diagnostics);
        }
    }

    private static void ReportClosedSets(
        Network network, RoutingTable routing, bool[] reached, string? groupId, Func<string, SourceLocation> locate,
        HashSet<string> reported, List<Diagnostic> diagnostics)
    {
        foreach (var closedSet in ClosedUnitSets.Find(routing, reached))
        {
            var ids = closedSet.Select(i => network.Units[i].Id).ToList();
            string subject = ids.Count == 1
                ? $"unit '{ids[0]}'"
                : "units " + string.Join(", ", ids.Select(id => $"'{id}'"));
            string message = ids.Count == 1
                ? "patients who reach this unit can never leave the network; let its routes add up to less than 1"
                : "patients who reach these units can never leave the network; let the routes of at least one of them add up to less than 1";
            string key = (groupId is not null && network.Groups.First(g => g.Id == groupId).Routes is not null ? groupId : string.Empty) + ":" + subject;
            if (!reported.Add(key))
            {
                continue;
            }

            if (groupId is not null)
            {
                message = $"groups.{groupId}: {message}";
            }

            diagnostics.Add(new Diagnostic(DiagnosticSeverity.Error, DiagnosticCodes.NoExit, locate(ids[0]), subject, message));
        }
    }
}
