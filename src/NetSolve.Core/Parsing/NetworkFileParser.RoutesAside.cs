using System.Collections.Immutable;
using System.Diagnostics.CodeAnalysis;
using NetSolve.Diagnostics;
using NetSolve.Model;

namespace NetSolve.Parsing;

internal sealed partial class NetworkFileParser
{
    /// <summary>Units from which a file's routes are read on the machine's second core while its units are read.</summary>
    private const int RoutesAsideFromUnits = 10_000;

    /// <summary>
    /// Starts reading the top-level routes on another thread, for a large file: they need only the unit ids, which a
    /// silent pass over the <c>units</c> keys gives in the order and with the places <see cref="ParseUnits"/> records
    /// them. False for a small file or one without routes, whose routes are read in turn.
    /// </summary>
    private bool TryStartRoutesAside(YamlNode? unitsNode, YamlNode? routesNode, [NotNullWhen(true)] out Task<RoutesRead>? reading)
    {
        reading = null;
        if (routesNode is null || unitsNode is not YamlMapping units || units.Entries.Count < RoutesAsideFromUnits)
        {
            return false;
        }

        // As ParseUnits: the first of each key, when it is a valid unit id (the later ones and bad ids are reported there).
        var ids = new Dictionary<string, SourceLocation>(units.Entries.Count, StringComparer.Ordinal);
        foreach (var (key, _) in units.Entries)
        {
            if (IsUnitId(key.Value))
            {
                ids.TryAdd(key.Value, key.Location);
            }
        }

        reading = Task.Run(() =>
        {
            var found = new List<Diagnostic>();
            var aside = new NetworkFileParser(fileName, found);
            foreach (var (id, location) in ids)
            {
                aside._unitLocations.Add(id, location);
            }

            var routes = aside.ParseRoutes(routesNode, []);
            return new RoutesRead(routes, found, aside._routeLocations);
        });
        return true;
    }

    /// <summary>Takes in what <see cref="TryStartRoutesAside"/> read, as if the routes had been read here at this point.</summary>
    private ImmutableArray<Route> TakeRoutes(Task<RoutesRead> reading)
    {
        var read = reading.GetAwaiter().GetResult();
        Diagnostics.AddRange(read.Diagnostics);
        foreach (var (from, location) in read.Locations)
        {
            _routeLocations[from] = location;
        }

        return read.Routes;
    }

    /// <summary>The routes read aside, the problems found in them in the order found, and where each unit's routes start.</summary>
    private sealed record RoutesRead(ImmutableArray<Route> Routes, List<Diagnostic> Diagnostics, Dictionary<string, SourceLocation> Locations);
}
