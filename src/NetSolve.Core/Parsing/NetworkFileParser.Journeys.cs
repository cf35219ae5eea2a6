using System.Collections.Immutable;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Parsing.Values;

namespace NetSolve.Parsing;

/// <summary>
/// The optional <c>journeys</c> section (docs/network-file.md, "Journeys"): named sets of units, each with the times
/// over which the share of journeys is reported.
/// </summary>
internal sealed partial class NetworkFileParser
{
    private const string JourneysKey = "journeys";
    private static readonly string[] JourneyKeys = ["label", "units", "over"];

    private ImmutableArray<Journey> ParseJourneys(YamlNode node, TimeUnit timeUnit)
    {
        if (node.IsNullScalar || Mapping(node, null, JourneysKey) is not YamlMapping mapping)
        {
            return [];
        }

        var journeys = ImmutableArray.CreateBuilder<Journey>();
        foreach (var (key, value) in UniqueEntries(mapping, null))
        {
            if (!IsUnitId(key.Value))
            {
                Error(key.Location, null, DiagnosticCodes.BadUnitId,
                    $"journeys: '{key.Value}' is not a valid journey name: use letters, digits, '_' and '-', starting with a letter");
                continue;
            }

            if (ParseJourney(key.Value, value, timeUnit) is Journey journey)
            {
                journeys.Add(journey);
            }
        }

        return journeys.ToImmutable();
    }

    private Journey? ParseJourney(string id, YamlNode node, TimeUnit timeUnit)
    {
        string where = "journeys." + id;
        if (Mapping(node, null, where + " (e.g. { units: [emergency, lab], over: [4h] })") is not YamlMapping mapping)
        {
            return null;
        }

        int errors = Diagnostics.Count(d => d.IsError);
        var fields = Fields(mapping, JourneyKeys, null);
        string label = Field(fields, "label") is YamlNode labelNode && Scalar(labelNode, null, where + ".label") is YamlScalar labelScalar
            ? labelScalar.Value
            : id;
        var unitIds = ImmutableArray<string>.Empty;
        if (fields.TryGetValue("units", out var unitsNode))
        {
            unitIds = ParseJourneyUnits(unitsNode, where);
        }
        else
        {
            Error(mapping.Location, null, DiagnosticCodes.MissingKey, $"{where}: missing 'units' (the list of units the journey covers, e.g. [emergency, lab])");
        }

        var over = fields.TryGetValue("over", out var overNode) ? ParseJourneyTimes(overNode, where, timeUnit) : [];
        return Diagnostics.Count(d => d.IsError) == errors ? new Journey(id, label, unitIds, over) : null;
    }

    private ImmutableArray<string> ParseJourneyUnits(YamlNode node, string where)
    {
        string field = where + ".units";
        if (node.AsSequence is not YamlSequence sequence)
        {
            Error(node.Location, null, DiagnosticCodes.WrongShape, $"{field} must be a list of unit ids, e.g. [emergency, lab]");
            return [];
        }

        if (sequence.Items.Count == 0)
        {
            Error(node.Location, null, DiagnosticCodes.MissingKey, $"{field} is empty: a journey covers at least one unit");
            return [];
        }

        var ids = ImmutableArray.CreateBuilder<string>(sequence.Items.Count);
        foreach (var item in sequence.Items)
        {
            if (Scalar(item, null, field + " item") is not YamlScalar scalar)
            {
                continue;
            }

            if (!_unitLocations.ContainsKey(scalar.Value))
            {
                Error(scalar.Location, null, DiagnosticCodes.UnknownUnit, $"{field}: unknown unit '{scalar.Value}'{NearestName.Hint(scalar.Value, _unitLocations.Keys)}");
            }
            else if (ids.Contains(scalar.Value, StringComparer.Ordinal))
            {
                Error(scalar.Location, null, DiagnosticCodes.DuplicateKey, $"{field}: unit '{scalar.Value}' is listed twice");
            }
            else
            {
                ids.Add(scalar.Value);
            }
        }

        return ids.ToImmutable();
    }

    private ImmutableArray<double> ParseJourneyTimes(YamlNode node, string where, TimeUnit timeUnit)
    {
        string field = where + ".over";
        IReadOnlyList<YamlNode> items = node.AsSequence is YamlSequence sequence ? [.. sequence.Items] : [node];
        var hours = ImmutableArray.CreateBuilder<double>(items.Count);
        foreach (var item in items)
        {
            if (Value(item, null, field, text => DurationValue.Parse(text, timeUnit)) is double t)
            {
                hours.Add(t);
            }
        }

        return hours.ToImmutable();
    }
}
