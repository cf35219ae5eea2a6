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

        // The routes' places go straight into this parser's table, which nothing here touches before TakeRoutes.
        reading = Task.Run(() =>
        {
            var found = new List<Diagnostic>();
            var routes = new NetworkFileParser(fileName, found, ids, _routeLocations).ParseRoutes(routesNode, []);
            return new RoutesRead(routes, found);
        });
        return true;
    }

    /// <summary>A parser for the routes alone, with the unit ids known beforehand and the table their places go into.</summary>
    private NetworkFileParser(string fileName, List<Diagnostic> diagnostics, Dictionary<string, SourceLocation> unitLocations,
        Dictionary<string, SourceLocation> routeLocations)
        : this(fileName, diagnostics)
    {
        _unitLocations = unitLocations;
        _routeLocations = routeLocations;
    }

    /// <summary>Takes in what <see cref="TryStartRoutesAside"/> read, as if the routes had been read here at this point.</summary>
    private ImmutableArray<Route> TakeRoutes(Task<RoutesRead> reading)
    {
        var read = reading.GetAwaiter().GetResult();
        Diagnostics.AddRange(read.Diagnostics);
        return read.Routes;
    }

    /// <summary>The routes read aside and the problems found in them, in the order found.</summary>
    private sealed record RoutesRead(ImmutableArray<Route> Routes, List<Diagnostic> Diagnostics);
}
