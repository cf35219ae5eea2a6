using System.Collections.Immutable;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Parsing.Values;

namespace NetSolve.Parsing;

/// <summary>
/// The optional <c>targets</c> section (docs/network-file.md, "Targets"): per unit, or for every unit under
/// <c>all_units</c>, the mean wait, the mean time in unit, the chance of waiting over a time and the share turned away.
/// A unit's own target wins over the one for all units, target by target.
/// </summary>
internal sealed partial class NetworkFileParser
{
    private const string TargetsKey = "targets";
    private static readonly string[] TargetFieldKeys = [.. TargetKeys.All];
    private static readonly string[] WaitOverKeys = ["time", "at_most"];

    /// <summary>The units with their targets set; the units unchanged when the section reports a mistake.</summary>
    private ImmutableArray<Unit> ParseTargets(YamlNode node, ImmutableArray<Unit> units, TimeUnit timeUnit)
    {
        if (Mapping(node, null, TargetsKey) is not YamlMapping mapping)
        {
            return units;
        }

        var byUnit = new Dictionary<string, UnitTargets>(StringComparer.Ordinal);
        UnitTargets? everyUnit = null;
        var withCapacity = units.Where(unit => unit.Capacity is not null).Select(unit => unit.Id).ToHashSet(StringComparer.Ordinal);
        foreach (var (key, value) in UniqueEntries(mapping, null))
        {
            bool forAll = key.Value == TargetKeys.AllUnits;
            if (!forAll && !_unitLocations.ContainsKey(key.Value))
            {
                var candidates = _unitLocations.Keys.Append(TargetKeys.AllUnits);
                Error(key.Location, null, DiagnosticCodes.UnknownUnit, $"targets: unknown unit '{key.Value}'{NearestName.Hint(key.Value, candidates)}");
                continue;
            }

            string? unitId = forAll ? null : key.Value;
            if (ParseUnitTargets(value, unitId, timeUnit, forAll || withCapacity.Contains(key.Value)) is not UnitTargets targets)
            {
                continue;
            }

            if (forAll)
            {
                everyUnit = targets;
            }
            else
            {
                byUnit[key.Value] = targets;
            }
        }

        return [.. units.Select(unit => (byUnit.GetValueOrDefault(unit.Id) ?? everyUnit)?.Over(everyUnit) is UnitTargets targets && !targets.IsEmpty
            ? unit with { Targets = targets }
            : unit)];
    }

    private UnitTargets? ParseUnitTargets(YamlNode node, string? unitId, TimeUnit timeUnit, bool fullAllowed)
    {
        string where = unitId is null ? "targets." + TargetKeys.AllUnits : "targets." + unitId;
        if (Mapping(node, unitId, where) is not YamlMapping mapping)
        {
            return null;
        }

        int errors = Diagnostics.Count(d => d.IsError);
        var fields = Fields(mapping, TargetFieldKeys, unitId);
        double? Duration(string key) => fields.TryGetValue(key, out var field) ? Value(field, unitId, where + "." + key, text => DurationValue.Parse(text, timeUnit)) : null;
        double? wait = Duration(TargetKeys.Of(TargetKind.MeanWait));
        double? time = Duration(TargetKeys.Of(TargetKind.MeanTimeInUnit));
        var over = fields.TryGetValue(TargetKeys.Of(TargetKind.WaitOver), out var overNode) ? ParseWaitOver(overNode, unitId, where, timeUnit) : null;
        double? full = null;
        if (fields.TryGetValue(TargetKeys.Of(TargetKind.TurnedAway), out var fullNode))
        {
            full = Value(fullNode, unitId, where + ".turned_away", ProbabilityValue.Parse);
            if (!fullAllowed)
            {
                Error(fullNode.Location, unitId, DiagnosticCodes.BadValue, "targets.turned_away needs 'capacity': a unit without a capacity is never full");
            }
        }

        if (fields.Count == 0 && Diagnostics.Count(d => d.IsError) == errors)
        {
            Error(mapping.Location, unitId, DiagnosticCodes.MissingKey, $"{where} is empty: give at least one of {string.Join(", ", TargetKeys.All)}");
        }

        return Diagnostics.Count(d => d.IsError) == errors ? new UnitTargets(wait, time, over, full) : null;
    }

    private WaitOverTarget? ParseWaitOver(YamlNode node, string? unitId, string where, TimeUnit timeUnit)
    {
        string field = where + ".wait_over";
        if (Mapping(node, unitId, field + " (e.g. { time: 4h, at_most: 5% })") is not YamlMapping mapping)
        {
            return null;
        }

        var fields = Fields(mapping, WaitOverKeys, unitId);
        double? time = fields.TryGetValue("time", out var timeNode) ? Value(timeNode, unitId, field + ".time", text => DurationValue.Parse(text, timeUnit)) : null;
        double? atMost = fields.TryGetValue("at_most", out var atMostNode) ? Value(atMostNode, unitId, field + ".at_most", ProbabilityValue.Parse) : null;
        foreach (string key in WaitOverKeys.Where(key => !fields.ContainsKey(key)))
        {
            Error(mapping.Location, unitId, DiagnosticCodes.MissingKey, $"{field}: missing '{key}' (write e.g. {{ time: 4h, at_most: 5% }})");
        }

        return time is double t && atMost is double p ? new WaitOverTarget(t, p) : null;
    }
}
