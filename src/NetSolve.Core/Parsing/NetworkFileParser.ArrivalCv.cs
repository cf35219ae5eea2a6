using System.Collections.Immutable;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Parsing.Values;

namespace NetSolve.Parsing;

/// <summary>
/// The optional top-level <c>arrival_cv</c>: unit id → coefficient of variation of the times between external
/// arrivals at that unit (0 or more; 1, the default, is Poisson). See docs/network-file.md.
/// </summary>
internal sealed partial class NetworkFileParser
{
    private const string ArrivalCvKey = "arrival_cv";

    private ImmutableArray<Arrival> ParseArrivalCv(YamlNode node, ImmutableArray<Arrival> arrivals, YamlNode? arrivalsNode, HashSet<string> known)
    {
        if (node.IsNullScalar || Mapping(node, null, ArrivalCvKey) is not YamlMapping mapping)
        {
            return arrivals;
        }

        // Units listed under 'arrivals', whether or not their rate parsed: a bad rate is reported once, there.
        var listed = arrivalsNode?.AsMapping is YamlMapping arrivalsMapping
            ? arrivalsMapping.Entries.Select(entry => entry.Key.Value).ToHashSet(StringComparer.Ordinal)
            : new HashSet<string>(StringComparer.Ordinal);
        var cvs = new Dictionary<string, double>(StringComparer.Ordinal);
        foreach (var (key, value) in UniqueEntries(mapping, null))
        {
            if (!KnownUnit(key, known, ArrivalCvKey) || Value(value, key.Value, ArrivalCvKey, CvValue.Parse) is not double cv)
            {
                continue;
            }

            if (cv < 0.0)
            {
                Error(value.Location, key.Value, DiagnosticCodes.BadValue, "arrival_cv must be 0 or more (1 is Poisson arrivals, 0 evenly spaced)");
                continue;
            }

            if (!listed.Contains(key.Value))
            {
                Error(key.Location, key.Value, DiagnosticCodes.BadValue,
                    "arrival_cv: the unit has no arrivals from outside; give it a rate under 'arrivals' or remove it here");
                continue;
            }

            cvs[key.Value] = cv;
        }

        return [.. arrivals.Select(arrival => cvs.TryGetValue(arrival.UnitId, out double cv) ? arrival with { Cv = cv } : arrival)];
    }
}
