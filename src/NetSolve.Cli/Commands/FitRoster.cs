using System.Globalization;
using NetSolve.Fitting;

namespace NetSolve.Cli.Commands;

/// <summary>
/// <c>fit --servers UNIT=N</c>: servers from the roster or bed count, by unit id or by the name the log uses. A unit
/// the log does not have, or a count that is not a whole number of at least 1, is an <see cref="InputException"/>.
/// </summary>
internal static class FitRoster
{
    public static Dictionary<string, int> Read(IEnumerable<string> given, MovementLog log)
    {
        var roster = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (string entry in given)
        {
            int equals = entry.LastIndexOf('=');
            string name = equals < 0 ? entry : entry[..equals].Trim();
            if (equals < 0 || !int.TryParse(entry.AsSpan(equals + 1), NumberStyles.None, CultureInfo.InvariantCulture, out int servers) || servers < 1)
            {
                throw new InputException(Messages.FitServersNotCount(entry));
            }

            var unit = log.Units.FirstOrDefault(unit => string.Equals(unit.Id, name, StringComparison.Ordinal) || string.Equals(unit.Label, name, StringComparison.Ordinal))
                ?? throw new InputException(Messages.FitServersUnknownUnit(name, log.Units.Select(unit => unit.Id)));
            roster[unit.Id] = servers;
        }

        return roster;
    }
}
