using System.Globalization;
using System.Text.RegularExpressions;
using NetSolve.Diagnostics;
using NetSolve.Model;

namespace NetSolve.Parsing;

/// <summary>
/// The <c>roster</c> unit key (docs/network-file.md, "Servers by hour"): 24 or 168 whole numbers, or shift blocks
/// such as <c>{ "07-15": 6, "15-23": 5, "23-07": 3 }</c> that cover the day once.
/// </summary>
internal sealed partial class NetworkFileParser
{
    private const string RosterKey = "roster";

    private Roster? ParseRoster(YamlNode node, string id, Servers? servers, int? capacity)
    {
        if (servers is Servers { IsUnlimited: true })
        {
            Error(node.Location, id, DiagnosticCodes.BadValue, "roster on a unit with unlimited servers: nobody waits there, so there is nothing to roster; give servers a number or remove the roster");
            return null;
        }

        int[]? hours = node.AsSequence is YamlSequence sequence ? RosterList(sequence, id)
            : node.AsMapping is YamlMapping mapping ? RosterBlocks(mapping, id)
            : RosterShapeError(node, id);
        if (hours is null)
        {
            return null;
        }

        if (hours.All(count => count == 0))
        {
            Error(node.Location, id, DiagnosticCodes.BadValue, "roster: every hour has 0 servers; at least one hour needs a server");
            return null;
        }

        var roster = Roster.Create(hours);
        if (capacity is int limit && limit < roster.Max)
        {
            Error(node.Location, id, DiagnosticCodes.BadValue, string.Create(CultureInfo.InvariantCulture,
                $"capacity {limit} is below the roster's {roster.Max} servers; capacity counts patients in service and waiting"));
            return null;
        }

        if (servers is Servers { IsUnlimited: false } given)
        {
            Warning(node.Location, id, DiagnosticCodes.IgnoredByFormulas, string.Create(CultureInfo.InvariantCulture,
                $"roster averages {roster.Mean:0.##} servers; the steady-state formulas use servers {given.Count} all day, while simulate and staff --by-hour follow the roster"));
        }

        return roster;
    }

    private int[]? RosterShapeError(YamlNode node, string id)
    {
        Error(node.Location, id, DiagnosticCodes.WrongShape, "roster must be a list of 24 (or 168) whole numbers, hour 00-01 first, or shift blocks such as { \"07-15\": 6, \"15-07\": 3 }");
        return null;
    }

    private int[]? RosterList(YamlSequence sequence, string id)
    {
        int count = sequence.Items.Count;
        if (count is not (ArrivalProfile.HoursPerDay or Roster.HoursPerWeek))
        {
            Error(sequence.Location, id, DiagnosticCodes.WrongShape, string.Create(CultureInfo.InvariantCulture,
                $"roster has {count} entries; give 24 (hour 00-01 first) or 168 (Monday 00-01 first)"));
            return null;
        }

        var hours = new int[count];
        bool valid = true;
        int h = 0;
        foreach (var item in sequence.Items)
        {
            valid &= RosterCount(item, id, out hours[h++]);
        }

        return valid ? hours : null;
    }

    private int[]? RosterBlocks(YamlMapping mapping, string id)
    {
        var hours = new int[ArrivalProfile.HoursPerDay];
        var covered = new bool[ArrivalProfile.HoursPerDay];
        bool valid = true;
        foreach (var (key, value) in UniqueEntries(mapping, id))
        {
            var match = ShiftBlockRegex().Match(key.Value);
            int start = match.Success ? int.Parse(match.Groups["from"].Value, CultureInfo.InvariantCulture) : -1;
            int end = match.Success ? int.Parse(match.Groups["to"].Value, CultureInfo.InvariantCulture) : -1;
            if (start is < 0 or > 23 || end is < 0 or > 24 || start == end % ArrivalProfile.HoursPerDay)
            {
                Error(key.Location, id, DiagnosticCodes.BadValue, $"roster: '{key.Value}' is not a shift block; write the start and end hour, e.g. \"07-15\" or \"23-07\" across midnight");
                valid = false;
                continue;
            }

            valid &= RosterCount(value, id, out int servers);
            for (int h = start; h != end % ArrivalProfile.HoursPerDay; h = (h + 1) % ArrivalProfile.HoursPerDay)
            {
                if (covered[h])
                {
                    Error(key.Location, id, DiagnosticCodes.BadValue, string.Create(CultureInfo.InvariantCulture,
                        $"roster: block '{key.Value}' overlaps another block at hour {h:00}"));
                    valid = false;
                    break;
                }

                covered[h] = true;
                hours[h] = servers;
            }
        }

        int gap = Array.IndexOf(covered, false);
        if (valid && gap >= 0)
        {
            Error(mapping.Location, id, DiagnosticCodes.BadValue, string.Create(CultureInfo.InvariantCulture,
                $"roster: no block covers hour {gap:00}-{gap + 1:00}; the blocks must cover the day once"));
            valid = false;
        }

        return valid ? hours : null;
    }

    private bool RosterCount(YamlNode node, string id, out int servers)
    {
        servers = 0;
        if (Scalar(node, id, "a roster entry") is not YamlScalar scalar)
        {
            return false;
        }

        if (!scalar.IsPlain || scalar.Value.Length == 0 || scalar.Value.AsSpan().ContainsAnyExceptInRange('0', '9')
            || !int.TryParse(scalar.Value, NumberStyles.None, CultureInfo.InvariantCulture, out servers) || servers > Servers.MaxCount)
        {
            Error(scalar.Location, id, DiagnosticCodes.BadValue, $"roster: '{scalar.Value}' is not a number of servers; write a whole number from 0 to 1000000");
            return false;
        }

        return true;
    }

    [GeneratedRegex("^(?<from>[0-9]{2})-(?<to>[0-9]{2})$", RegexOptions.CultureInvariant, matchTimeoutMilliseconds: 1000)]
    private static partial Regex ShiftBlockRegex();
}
