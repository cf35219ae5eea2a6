using System.Globalization;
using NetSolve.Cli.Settings;
using NetSolve.Fitting;

namespace NetSolve.Cli.Commands;

/// <summary>
/// <c>fit --servers UNIT=N</c>: servers from the roster or bed count, by unit id or by the name the log uses. A unit
/// the log does not have is an <see cref="InputException"/> (exit 1, as for <c>staff --only</c>); an entry that is not
/// UNIT=N with a whole number of at least 1 is a <see cref="UsageException"/> (exit 2).
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
                throw new UsageException(Messages.FitServersNotCount(entry));
            }

            var unit = log.Units.FirstOrDefault(unit => string.Equals(unit.Id, name, StringComparison.Ordinal) || string.Equals(unit.Label, name, StringComparison.Ordinal))
                ?? throw new InputException(Messages.FitServersUnknownUnit(name, log.Units.Select(unit => unit.Id)));
            roster[unit.Id] = servers;
        }

        return roster;
    }
}
