using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Parsing.Values;

namespace NetSolve.Parsing;

/// <summary>Turns the located YAML of a network file into a <see cref="Network"/>, collecting every problem.</summary>
internal sealed partial class NetworkFileParser(string fileName, List<Diagnostic> diagnostics) : NodeParser(diagnostics)
{
    private static readonly string[] TopKeys = ["name", "time_unit", "units", "arrivals", "routes", "arrival_profile", "groups", ArrivalCvKey, TargetsKey, JourneysKey];
    private static readonly string[] UnitKeys = ["label", "servers", "service", "service_cv", "service_distribution", "service_samples", "capacity", "when_full", RosterKey];
    private static readonly string[] TimeUnitNames = ["minute", "hour", "day"];

    private readonly Dictionary<string, SourceLocation> _unitLocations = new(StringComparer.Ordinal);
    private readonly Dictionary<string, SourceLocation> _routeLocations = new(StringComparer.Ordinal);

    public (Network Network, NetworkLocations Locations)? Parse(YamlNode root)
    {
        if (root.AsMapping is not YamlMapping top)
        {
            Error(root.Location, null, DiagnosticCodes.WrongShape, "the top level must be a mapping with 'units', 'arrivals' and optionally 'name', 'time_unit', 'routes'");
            return null;
        }

        var fields = Fields(top, TopKeys, null);
        var timeUnit = ParseTimeUnit(Field(fields, "time_unit"));
        string name = Field(fields, "name") is YamlNode nameNode && Scalar(nameNode, null, "name") is YamlScalar nameScalar
            ? nameScalar.Value
            : Path.GetFileNameWithoutExtension(fileName);

        var unitsNode = Field(fields, "units");
        if (unitsNode is null)
        {
            Error(top.Location, null, DiagnosticCodes.MissingKey, "missing 'units': a network file defines at least one unit");
        }

        var arrivalsNode = Field(fields, "arrivals");
        if (arrivalsNode is null)
        {
            Error(top.Location, null, DiagnosticCodes.MissingKey, "missing 'arrivals': at least one unit needs a positive external arrival rate");
        }

        var units = unitsNode is YamlNode unitsValue ? ParseUnits(unitsValue, timeUnit) : [];
        var known = new HashSet<string>(units.Length, StringComparer.Ordinal);
        foreach (var unit in units)
        {
            known.Add(unit.Id);
        }

        var arrivals = arrivalsNode is YamlNode arrivalsValue ? ParseArrivals(arrivalsValue, timeUnit, known) : [];
        if (fields.TryGetValue(ArrivalCvKey, out var arrivalCvNode))
        {
            arrivals = ParseArrivalCv(arrivalCvNode, arrivals, arrivalsNode, known);
        }

        var routes = fields.TryGetValue("routes", out var routesNode) ? ParseRoutes(routesNode, known) : [];
        CheckDiversions(known);
        var profile = fields.TryGetValue("arrival_profile", out var profileNode) ? ParseProfile(profileNode, null) : null;
        var groups = fields.TryGetValue("groups", out var groupsNode) ? ParseGroups(groupsNode, timeUnit, known) : [];
        units = fields.TryGetValue(TargetsKey, out var targetsNode) ? ParseTargets(targetsNode, units, timeUnit) : units;
        var journeys = fields.TryGetValue(JourneysKey, out var journeysNode) ? ParseJourneys(journeysNode, timeUnit) : [];

        if (Diagnostics.Any(d => d.IsError))
        {
            return null;
        }

        var network = new Network(name, timeUnit, units, arrivals, routes) { ArrivalProfile = profile, Groups = groups, Journeys = journeys };
        return (network, new NetworkLocations(_unitLocations, _routeLocations) { Groups = _groupLocations });
    }

    private TimeUnit ParseTimeUnit(YamlNode? node)
    {
        if (node is not YamlNode given || Scalar(given, null, "time_unit") is not YamlScalar scalar)
        {
            return TimeUnit.Hour;
        }

        switch (scalar.Value)
        {
            case "minute": return TimeUnit.Minute;
            case "hour": return TimeUnit.Hour;
            case "day": return TimeUnit.Day;
            default:
                Error(scalar.Location, null, DiagnosticCodes.BadValue,
                    $"time_unit must be minute, hour or day, not '{scalar.Value}'{NearestName.Hint(scalar.Value, TimeUnitNames)}");
                return TimeUnit.Hour;
        }
    }

    private ImmutableArray<Unit> ParseUnits(YamlNode node, TimeUnit timeUnit)
    {
        if (Mapping(node, null, "units") is not YamlMapping mapping)
        {
            return [];
        }

        if (mapping.Entries.Count == 0)
        {
            Error(node.Location, null, DiagnosticCodes.MissingKey, "'units' is empty: define at least one unit");
        }

        // Sized up front: a 100,000-unit file would otherwise regrow both several times.
        var units = ImmutableArray.CreateBuilder<Unit>(mapping.Entries.Count);
        _unitLocations.EnsureCapacity(mapping.Entries.Count);
        foreach (var (key, value) in UniqueEntries(mapping, null))
        {
            string id = key.Value;
            if (!IsUnitId(id))
            {
                Error(key.Location, null, DiagnosticCodes.BadUnitId,
                    $"'{id}' is not a valid unit id: use letters, digits, '_' and '-', starting with a letter");
                continue;
            }

            _unitLocations[id] = key.Location;
            if (ParseUnit(id, value, timeUnit) is Unit unit)
            {
                units.Add(unit);
            }
        }

        return units.Count == units.Capacity ? units.MoveToImmutable() : units.ToImmutable();
    }

    private Unit? ParseUnit(string id, YamlNode node, TimeUnit timeUnit)
    {
        if (Mapping(node, id, "a unit") is not YamlMapping mapping)
        {
            return null;
        }

        var fields = KnownFields(mapping, UnitKeys, id);
        string label = fields.GetValueOrDefault("label") is YamlNode labelNode && Scalar(labelNode, id, "label") is YamlScalar labelScalar
            ? labelScalar.Value
            : id;
        var serversNode = fields.GetValueOrDefault("servers");
        var servers = serversNode is YamlNode serversValue ? ServersField(serversValue, id) : null;
        var service = ParseService(fields, mapping, id, timeUnit);
        if (serversNode is null)
        {
            Error(mapping.Location, id, DiagnosticCodes.MissingKey, "missing 'servers' (a whole number of at least 1, or unlimited)");
        }

        bool hasCapacity = fields.TryGetValue("capacity", out var capacityNode);
        int? capacity = hasCapacity ? ParseCapacity(capacityNode, id, servers) : null;
        bool hasWhenFull = fields.TryGetValue("when_full", out var whenFullNode);
        var whenFull = hasWhenFull ? ParseWhenFull(whenFullNode, id) : WhenFull.TurnAway;
        if (hasWhenFull && !hasCapacity)
        {
            Error(whenFullNode.Location, id, DiagnosticCodes.BadValue, "when_full needs 'capacity': a unit without a capacity is never full");
        }

        var roster = fields.TryGetValue(RosterKey, out var rosterNode) ? ParseRoster(rosterNode, id, servers, capacity) : null;
        return servers is Servers s && service is ParsedService parsed
            ? new Unit(id, label, s, parsed.MeanHours, parsed.Cv) { Service = parsed.Distribution, Capacity = capacity, WhenFull = whenFull, Roster = roster }
            : null;
    }

    private ImmutableArray<Arrival> ParseArrivals(YamlNode node, TimeUnit timeUnit, HashSet<string> known, string? groupId = null)
    {
        var arrivals = ImmutableArray.CreateBuilder<Arrival>();
        if (Mapping(node, null, "arrivals") is YamlMapping mapping)
        {
            arrivals.Capacity = mapping.Entries.Count;
            foreach (var (key, value) in UniqueEntries(mapping, null))
            {
                if (KnownId(key, known, "arrivals") is not string id)
                {
                    continue;
                }

                if (Value(value, id, FieldLabels.ArrivalRate, RateParser(timeUnit)) is double rate)
                {
                    arrivals.Add(new Arrival(id, rate));
                }
            }
        }

        if (!Diagnostics.Any(d => d.IsError) && !arrivals.Any(arrival => arrival.PerHour > 0.0))
        {
            Error(node.Location, null, DiagnosticCodes.NoArrivals, groupId is null
                ? "no positive arrival rate: at least one unit needs patients arriving from outside"
                : $"groups.{groupId}: no positive arrival rate: a group needs patients arriving from outside at one unit at least");
        }

        return arrivals.DrainToImmutable();
    }

    /// <param name="node">The <c>routes</c> mapping.</param>
    /// <param name="known">The unit ids.</param>
    /// <param name="groupId">The patient group whose routes these are, named in an unknown unit's message; null for the top level.</param>
    private ImmutableArray<Route> ParseRoutes(YamlNode node, HashSet<string> known, string? groupId = null)
    {
        string where = groupId is null ? "routes" : string.Concat("group '", groupId, "': routes");
        var routes = ImmutableArray.CreateBuilder<Route>();
        if (node.IsNullScalar || Mapping(node, null, "routes") is not YamlMapping mapping)
        {
            return routes.ToImmutable();
        }

        // Sized up front, as the units are: a 100,000-unit file has hundreds of thousands of routes.
        routes.Capacity = RouteCount(mapping);
        _routeLocations.EnsureCapacity(mapping.Entries.Count);
        foreach (var (sourceKey, targets) in UniqueEntries(mapping, null))
        {
            if (KnownId(sourceKey, known, where) is not string from)
            {
                continue;
            }

            _routeLocations[from] = sourceKey.Location;
            if (targets.IsNullScalar || Mapping(targets, from, "routes") is not YamlMapping targetMap)
            {
                continue;
            }

            double total = 0.0;
            foreach (var (targetKey, value) in UniqueEntries(targetMap, from))
            {
                // The names in messages are built only on error: a 100,000-unit file has hundreds of thousands of routes.
                if (KnownId(targetKey, known, where, groupId is null ? from : null, from) is string to
                    && Value(value, from, FieldLabels.RouteTo, ProbabilityValue.Parse, to) is double probability)
                {
                    routes.Add(new Route(from, to, probability));
                    total += probability;
                }
            }

            if (total > 1.0 + Tolerances.ProbabilitySum)
            {
                Error(sourceKey.Location, from, DiagnosticCodes.RoutesOverOne, string.Create(CultureInfo.InvariantCulture,
                    $"routes add up to {total:0.######}, more than 1"));
            }
        }

        return routes.DrainToImmutable();
    }

    /// <summary>How many routes <paramref name="routes"/> lists at most (repeated and unknown targets included).</summary>
    private static int RouteCount(YamlMapping routes)
    {
        int count = 0;
        foreach (var entry in routes.Entries)
        {
            count += entry.Value.AsMapping is YamlMapping targets ? targets.Entries.Count : 0;
        }

        return count;
    }

    private bool KnownUnit(YamlKey key, HashSet<string> known, string where, string? unitId = null, string? whereUnit = null) =>
        KnownId(key, known, where, unitId, whereUnit) is not null;

    /// <summary>
    /// The id of the unit <paramref name="key"/> names, as the unit's own string (looked up by the key's text, so no
    /// string is made per route or arrival); null after reporting an unknown unit.
    /// </summary>
    private string? KnownId(YamlKey key, HashSet<string> known, string where, string? unitId = null, string? whereUnit = null)
    {
        if (known.GetAlternateLookup<ReadOnlySpan<char>>().TryGetValue(key.Text, out string? id)
            || _unitLocations.GetAlternateLookup<ReadOnlySpan<char>>().TryGetValue(key.Text, out id, out _))
        {
            return id;
        }

        ReportUnknownUnit(key.Location, key.Value, where, unitId, whereUnit);
        return null;
    }

    private bool KnownUnit(SourceLocation location, string id, HashSet<string> known, string where, string? unitId = null, string? whereUnit = null)
    {
        if (known.Contains(id) || _unitLocations.ContainsKey(id))
        {
            return true;
        }

        ReportUnknownUnit(location, id, where, unitId, whereUnit);
        return false;
    }

    private void ReportUnknownUnit(SourceLocation location, string id, string where, string? unitId, string? whereUnit) =>
        Error(location, unitId, DiagnosticCodes.UnknownUnit,
            $"{where}{(whereUnit is null ? string.Empty : "." + whereUnit)}: unknown unit '{id}'{NearestName.Hint(id, _unitLocations.Keys)}");

    /// <summary>Letters, digits, '_' and '-', starting with a letter (ASCII, as the contract's examples).</summary>
    private static bool IsUnitId(string id)
    {
        if (id.Length == 0 || !char.IsAsciiLetter(id[0]))
        {
            return false;
        }

        foreach (char c in id)
        {
            if (!(char.IsAsciiLetterOrDigit(c) || c is '_' or '-'))
            {
                return false;
            }
        }

        return true;
    }
}
