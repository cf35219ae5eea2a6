using System.Globalization;
using System.Text.RegularExpressions;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Parsing.Values;

namespace NetSolve.Parsing;

/// <summary>
/// The extension keys (docs/simulation.md): service distributions, capacity and diversion, arrival profiles and
/// patient groups. All are optional; a v1 file never reaches this code except for <c>service_cv</c>.
/// </summary>
internal sealed partial class NetworkFileParser
{
    private static readonly string[] DistributionNames = ["exponential", "lognormal", "gamma", "deterministic", "empirical"];
    private static readonly string[] ProfileKeys = ["hour_of_day", "day_of_week"];
    private static readonly string[] GroupKeys = ["label", "arrivals", "routes", "arrival_profile", "services"];
    private static readonly string[] ServiceKeys = ["service", "service_cv", "service_distribution", "service_samples"];

    private readonly List<(string UnitId, string Target, SourceLocation Location)> _diversions = [];
    private readonly Dictionary<string, SourceLocation> _groupLocations = new(StringComparer.Ordinal);

    private ParsedService? ParseService(FieldValues fields, YamlMapping owner, string id, TimeUnit timeUnit)
    {
        ServiceKind? kind = null;
        SourceLocation? keyLocation = null;
        if (fields.TryGetValue("service_distribution", out var kindNode) && Scalar(kindNode, id, "service_distribution") is YamlScalar kindScalar)
        {
            keyLocation = kindScalar.Location;
            int index = Array.IndexOf(DistributionNames, kindScalar.Value);
            if (index < 0)
            {
                Error(kindScalar.Location, id, DiagnosticCodes.BadValue,
                    $"service_distribution must be exponential, lognormal, gamma, deterministic or empirical, not '{kindScalar.Value}'{NearestName.Hint(kindScalar.Value, DistributionNames)}");
                return null;
            }

            kind = (ServiceKind)index;
        }

        var serviceNode = fields.GetValueOrDefault("service");
        var cvNode = fields.GetValueOrDefault("service_cv");
        var samplesNode = fields.GetValueOrDefault("service_samples");
        if (samplesNode is YamlNode samples)
        {
            keyLocation ??= samples.Location;
            kind ??= ServiceKind.Empirical;
            if (kind != ServiceKind.Empirical)
            {
                Error(samples.Location, id, DiagnosticCodes.BadValue, "service_samples needs service_distribution empirical (or no service_distribution)");
                return null;
            }
        }

        if (kind == ServiceKind.Empirical)
        {
            return ParseEmpirical(samplesNode, serviceNode, cvNode, owner, id, timeUnit, keyLocation);
        }

        double? mean = serviceNode is YamlNode service ? Value(service, id, FieldLabels.Service, DurationParser(timeUnit)) : null;
        if (serviceNode is null)
        {
            Error(owner.Location, id, DiagnosticCodes.MissingKey, "missing 'service' (the mean time a patient holds a server, e.g. 45min)");
        }

        double defaultCv = kind == ServiceKind.Deterministic ? 0.0 : 1.0;
        double? cv = cvNode is YamlNode cvValue ? Value(cvValue, id, "service_cv", CvValue.Parse) : defaultCv;
        if (cv < 0.0)
        {
            Error(cvNode!.Value.Location, id, DiagnosticCodes.BadValue, "service_cv must be 0 or more");
            return null;
        }

        if (cvNode is YamlNode cvGiven && cv is double given && given != defaultCv && kind is ServiceKind.Deterministic or ServiceKind.Exponential)
        {
            Error(cvGiven.Location, id, DiagnosticCodes.BadValue, string.Create(CultureInfo.InvariantCulture,
                $"service_cv of a {DistributionNames[(int)kind]} service is {defaultCv}; choose lognormal or gamma for another value"));
            return null;
        }

        if (mean is not double m || cv is not double c)
        {
            return null;
        }

        var distribution = kind switch
        {
            ServiceKind.Exponential => ServiceDistribution.Exponential(m),
            ServiceKind.Deterministic => ServiceDistribution.Deterministic(m),
            ServiceKind.Lognormal => ServiceDistribution.Lognormal(m, c),
            ServiceKind.Gamma => ServiceDistribution.Gamma(m, c),
            _ => null,
        };
        return new ParsedService(m, c, distribution, keyLocation);
    }

    /// <summary>One rate parser per time unit, made once: a lambda over the time unit would be a closure per arrivals mapping.</summary>
    private static Func<ReadOnlySpan<char>, ValueResult<double>> RateParser(TimeUnit timeUnit) => timeUnit switch
    {
        TimeUnit.Minute => static text => RateValue.Parse(text, TimeUnit.Minute),
        TimeUnit.Day => static text => RateValue.Parse(text, TimeUnit.Day),
        _ => static text => RateValue.Parse(text, TimeUnit.Hour),
    };

    /// <summary>One duration parser per time unit, made once: a lambda over the time unit here would be a closure per unit.</summary>
    private static Func<ReadOnlySpan<char>, ValueResult<double>> DurationParser(TimeUnit timeUnit) => timeUnit switch
    {
        TimeUnit.Minute => static text => DurationValue.Parse(text, TimeUnit.Minute),
        TimeUnit.Day => static text => DurationValue.Parse(text, TimeUnit.Day),
        _ => static text => DurationValue.Parse(text, TimeUnit.Hour),
    };

    private ParsedService? ParseEmpirical(YamlNode? samplesNode, YamlNode? serviceNode, YamlNode? cvNode, YamlMapping owner, string id, TimeUnit timeUnit, SourceLocation? keyLocation)
    {
        foreach (var (node, key) in new[] { (serviceNode, "service"), (cvNode, "service_cv") })
        {
            if (node is YamlNode given)
            {
                Error(given.Location, id, DiagnosticCodes.BadValue, $"{key} comes from service_samples for an empirical service; remove it");
            }
        }

        if (samplesNode is not YamlNode samples)
        {
            Error(owner.Location, id, DiagnosticCodes.MissingKey, "missing 'service_samples' (a list of observed durations, e.g. [40min, 55min, 2h])");
            return null;
        }

        if (samples.AsSequence is not YamlSequence sequence || sequence.Items.Count == 0)
        {
            Error(samples.Location, id, DiagnosticCodes.WrongShape, "service_samples must be a non-empty list of durations, e.g. [40min, 55min, 2h]");
            return null;
        }

        var durations = new List<double>();
        foreach (var item in sequence.Items)
        {
            if (Value(item, id, "service_samples", text => DurationValue.Parse(text, timeUnit)) is double hours)
            {
                durations.Add(hours);
            }
        }

        if (durations.Count < sequence.Items.Count || serviceNode is not null || cvNode is not null)
        {
            return null;
        }

        var distribution = ServiceDistribution.Empirical(durations);
        return new ParsedService(distribution.MeanHours, distribution.Cv, distribution, keyLocation);
    }

    private int? ParseCapacity(YamlNode node, string id, Servers? servers)
    {
        if (Scalar(node, id, "capacity") is not YamlScalar scalar)
        {
            return null;
        }

        if (!scalar.IsPlain || scalar.Value.Length == 0 || scalar.Value.AsSpan().ContainsAnyExceptInRange('0', '9')
            || !int.TryParse(scalar.Value, NumberStyles.None, CultureInfo.InvariantCulture, out int capacity) || capacity < 1)
        {
            Error(scalar.Location, id, DiagnosticCodes.BadValue, $"capacity must be a whole number of at least 1 (patients in the unit, in service and waiting), not '{scalar.Value}'");
            return null;
        }

        if (servers is Servers { IsUnlimited: false } finite && capacity < finite.Count)
        {
            Error(scalar.Location, id, DiagnosticCodes.BadValue, string.Create(CultureInfo.InvariantCulture,
                $"capacity {capacity} is below servers {finite.Count}; capacity counts patients in service and waiting"));
            return null;
        }

        return capacity;
    }

    private WhenFull ParseWhenFull(YamlNode node, string id)
    {
        if (Scalar(node, id, "when_full") is not YamlScalar scalar)
        {
            return WhenFull.TurnAway;
        }

        if (scalar.Value == "turn_away")
        {
            return WhenFull.TurnAway;
        }

        var match = DivertRegex().Match(scalar.Value);
        if (!match.Success)
        {
            Error(scalar.Location, id, DiagnosticCodes.BadValue, $"when_full must be turn_away or 'divert to UNIT', not '{scalar.Value}'");
            return WhenFull.TurnAway;
        }

        string target = match.Groups["unit"].Value;
        if (target == id)
        {
            Error(scalar.Location, id, DiagnosticCodes.BadValue, "when_full: a unit cannot divert to itself");
            return WhenFull.TurnAway;
        }

        _diversions.Add((id, target, scalar.Location));
        return WhenFull.DivertTo(target);
    }

    private void CheckDiversions(HashSet<string> known)
    {
        foreach (var (unitId, target, location) in _diversions)
        {
            KnownUnit(location, target, known, "when_full", unitId);
        }

        DiversionLoops.Check(_diversions, Diagnostics);
    }

    private ArrivalProfile? ParseProfile(YamlNode node, string? groupId)
    {
        string where = groupId is null ? "arrival_profile" : $"groups.{groupId}.arrival_profile";
        if (Mapping(node, null, where) is not YamlMapping mapping)
        {
            return null;
        }

        var fields = Fields(mapping, ProfileKeys, null);
        if (!fields.TryGetValue("hour_of_day", out var hoursNode))
        {
            Error(mapping.Location, null, DiagnosticCodes.MissingKey, $"{where}: missing 'hour_of_day' (24 multipliers, 00-01 first)");
            return null;
        }

        var hours = Multipliers(hoursNode, ArrivalProfile.HoursPerDay, $"{where}.hour_of_day");
        bool hasDays = fields.TryGetValue("day_of_week", out var daysNode);
        var days = hasDays ? Multipliers(daysNode, ArrivalProfile.DaysPerWeek, $"{where}.day_of_week") : null;
        if (hours is null || (hasDays && days is null))
        {
            return null;
        }

        // No warning: solve shows the hour-by-hour formulas beside the daily-average steady state, and simulate follows the profile.
        return ArrivalProfile.Create(hours, days);
    }

    private double[]? Multipliers(YamlNode node, int count, string where)
    {
        if (node.AsSequence is not YamlSequence sequence || sequence.Items.Count != count)
        {
            Error(node.Location, null, DiagnosticCodes.WrongShape, string.Create(CultureInfo.InvariantCulture, $"{where} must be a list of {count} numbers"));
            return null;
        }

        var values = new List<double>();
        foreach (var item in sequence.Items)
        {
            if (Value(item, null, where, NumberValue.Parse) is double value)
            {
                if (value < 0.0)
                {
                    Error(item.Location, null, DiagnosticCodes.BadValue, $"{where}: a multiplier is 0 or more");
                    return null;
                }

                values.Add(value);
            }
        }

        if (values.Count != count)
        {
            return null;
        }

        if (values.Sum() <= 0.0)
        {
            Error(node.Location, null, DiagnosticCodes.BadValue, $"{where}: the multipliers are all 0; at least one must be positive");
            return null;
        }

        return [.. values];
    }

    [GeneratedRegex("^divert to (?<unit>[A-Za-z][A-Za-z0-9_-]*)$", RegexOptions.CultureInvariant, matchTimeoutMilliseconds: 1000)]
    private static partial Regex DivertRegex();
}
