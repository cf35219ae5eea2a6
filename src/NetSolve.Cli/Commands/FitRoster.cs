using System.Globalization;
using NetSolve.Cli.Settings;
using NetSolve.Fitting;
using NetSolve.Fitting.Reading;
using NetSolve.Parsing;

namespace NetSolve.Cli.Commands;

/// <summary>
/// <c>fit --servers</c>: servers from the roster or bed count, each entry UNIT=N or a roster CSV file (see
/// <see cref="RosterReader"/>), a unit by its id or by the name the log uses. A unit the log does not have, a bad row
/// of a roster file, or a unit given twice is an <see cref="InputException"/> (exit 1, as for <c>staff --only</c>); an
/// entry that is neither UNIT=N with a whole number of at least 1 nor an existing file is a <see cref="UsageException"/> (exit 2).
/// </summary>
internal static class FitRoster
{
    public static Dictionary<string, int> Read(IEnumerable<string> given, MovementLog log)
    {
        var roster = new Dictionary<string, int>(StringComparer.Ordinal);
        var from = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (string entry in given)
        {
            foreach (var (unitId, servers) in File.Exists(entry) ? ReadFile(entry, log) : [ReadEntry(entry, log)])
            {
                if (!roster.TryAdd(unitId, servers))
                {
                    throw new InputException(Messages.FitServersTwice(unitId, from[unitId], entry));
                }

                from[unitId] = entry;
            }
        }

        return roster;
    }

    private static (string UnitId, int Servers) ReadEntry(string entry, MovementLog log)
    {
        int equals = entry.LastIndexOf('=');
        string name = equals < 0 ? entry : entry[..equals].Trim();
        if (equals < 0 || !int.TryParse(entry.AsSpan(equals + 1), NumberStyles.None, CultureInfo.InvariantCulture, out int servers) || servers < 1)
        {
            throw new UsageException(Messages.FitServersNotCount(entry));
        }

        var unit = log.Units.FirstOrDefault(unit => string.Equals(unit.Id, name, StringComparison.Ordinal) || string.Equals(unit.Label, name, StringComparison.Ordinal))
            ?? throw new InputException(Messages.FitServersUnknownUnit(name, log.Units.Select(unit => unit.Id)));
        return (unit.Id, servers);
    }

    private static List<(string UnitId, int Servers)> ReadFile(string path, MovementLog log)
    {
        using var stream = InputFile.TryOpen(path, "a roster", out var problem) ?? throw new InputException(problem!.ToString());
        var (roster, diagnostics) = RosterReader.Read(stream, path, log.Units);
        return roster?.OrderBy(pair => pair.Key, StringComparer.Ordinal).Select(pair => (UnitId: pair.Key, Servers: pair.Value)).ToList()
            ?? throw new InputException(string.Join("\n", diagnostics.Where(d => d.IsError)));
    }
}
