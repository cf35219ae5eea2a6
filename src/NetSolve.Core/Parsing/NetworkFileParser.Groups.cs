using System.Collections.Immutable;
using NetSolve.Diagnostics;
using NetSolve.Model;

namespace NetSolve.Parsing;

/// <summary>Patient groups: each with its own arrivals and optionally its own routes, profile and service per unit.</summary>
internal sealed partial class NetworkFileParser
{
    private ImmutableArray<PatientGroup> ParseGroups(YamlNode node, TimeUnit timeUnit, HashSet<string> known)
    {
        if (node.IsNullScalar || Mapping(node, null, "groups") is not YamlMapping mapping)
        {
            return [];
        }

        var groups = ImmutableArray.CreateBuilder<PatientGroup>();
        foreach (var (key, value) in UniqueEntries(mapping, null))
        {
            string id = key.Value;
            if (!IsUnitId(id))
            {
                Error(key.Location, null, DiagnosticCodes.BadUnitId,
                    $"groups: '{id}' is not a valid group id: use letters, digits, '_' and '-', starting with a letter");
                continue;
            }

            _groupLocations[id] = key.Location;
            if (ParseGroup(id, key.Location, value, timeUnit, known) is PatientGroup group)
            {
                groups.Add(group);
            }
        }

        return groups.ToImmutable();
    }

    private PatientGroup? ParseGroup(string id, SourceLocation location, YamlNode node, TimeUnit timeUnit, HashSet<string> known)
    {
        if (Mapping(node, null, $"groups.{id}") is not YamlMapping mapping)
        {
            return null;
        }

        int errorsBefore = Diagnostics.Count(d => d.IsError);
        var fields = Fields(mapping, GroupKeys, null);
        string label = Field(fields, "label") is YamlNode labelNode && Scalar(labelNode, null, $"groups.{id}.label") is YamlScalar labelScalar
            ? labelScalar.Value
            : id;
        var arrivalsNode = Field(fields, "arrivals");
        if (arrivalsNode is null)
        {
            Error(location, null, DiagnosticCodes.MissingKey, $"groups.{id}: missing 'arrivals' (where this group's patients arrive from outside)");
        }

        var arrivals = arrivalsNode is YamlNode arrivalsValue ? ParseArrivals(arrivalsValue, timeUnit, known, id) : [];
        ImmutableArray<Route>? routes = null;
        if (fields.TryGetValue("routes", out var routesNode))
        {
            // The top-level routes' locations serve later rules; a group's routes must not replace them.
            var topLevel = new Dictionary<string, SourceLocation>(_routeLocations, StringComparer.Ordinal);
            routes = ParseRoutes(routesNode, known, id);
            _routeLocations.Clear();
            foreach (var (unit, at) in topLevel)
            {
                _routeLocations[unit] = at;
            }
        }

        var profile = fields.TryGetValue("arrival_profile", out var profileNode) ? ParseProfile(profileNode, id) : null;
        var services = fields.TryGetValue("services", out var servicesNode) ? ParseGroupServices(servicesNode, id, timeUnit, known) : [];
        if (Diagnostics.Count(d => d.IsError) > errorsBefore)
        {
            return null;
        }

        return new PatientGroup(id, label, arrivals) { Routes = routes, ArrivalProfile = profile, Services = services };
    }

    private ImmutableArray<GroupService> ParseGroupServices(YamlNode node, string groupId, TimeUnit timeUnit, HashSet<string> known)
    {
        var services = ImmutableArray.CreateBuilder<GroupService>();
        if (Mapping(node, null, $"groups.{groupId}.services") is not YamlMapping mapping)
        {
            return services.ToImmutable();
        }

        foreach (var (key, value) in UniqueEntries(mapping, null))
        {
            if (!KnownUnit(key, known, $"groups.{groupId}.services") || Mapping(value, key.Value, $"groups.{groupId}.services") is not YamlMapping serviceMapping)
            {
                continue;
            }

            var fields = KnownFields(serviceMapping, ServiceKeys, key.Value);
            if (ParseService(fields, serviceMapping, key.Value, timeUnit) is ParsedService parsed)
            {
                services.Add(new GroupService(key.Value, parsed.Distribution ?? ServiceDistribution.FromMeanAndCv(parsed.MeanHours, parsed.Cv)));
            }
        }

        return services.ToImmutable();
    }
}
