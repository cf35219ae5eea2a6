using System.Collections.Immutable;
using System.Globalization;
using System.Text;

namespace NetSolve.Fitting.Reading;

/// <summary>
/// Gives every unit name in a log a valid unit id (letters, digits, '_' and '-', starting with a letter): the id the
/// unit map gives it, or one made from the name; the name itself stays the label. The result does not depend on the
/// order names were met in: names are taken in ordinal order, and a clash is settled by numbering in that order.
/// </summary>
internal static class UnitNaming
{
    /// <summary>
    /// The units for <paramref name="names"/> (each a distinct key as read) and, for each name's position, the unit's
    /// number in the returned list, which is ordered by id.
    /// </summary>
    public static (ImmutableArray<LogUnit> Units, int[] UnitOfName) Name(IReadOnlyList<string> names, MovementLogOptions options)
    {
        var map = options.IgnoreCase
            ? options.UnitMap.WithComparers(StringComparer.OrdinalIgnoreCase)
            : options.UnitMap;
        var byName = Enumerable.Range(0, names.Count).OrderBy(i => names[i], StringComparer.Ordinal).ToList();
        var labels = new Dictionary<string, string>(StringComparer.Ordinal);
        var idOfName = new string[names.Count];
        foreach (int i in byName.Where(i => map.ContainsKey(names[i])))
        {
            var entry = map[names[i]];
            idOfName[i] = entry.Id;
            labels.TryAdd(entry.Id, entry.Label ?? names[i]);
        }

        var taken = new HashSet<string>(labels.Keys, StringComparer.Ordinal);
        foreach (int i in byName.Where(i => idOfName[i] is null))
        {
            string id = Unique(MakeId(names[i]), taken);
            idOfName[i] = id;
            labels[id] = names[i];
        }

        var ordered = labels.Keys.Order(StringComparer.Ordinal).ToList();
        var number = ordered.Select((id, k) => (id, k)).ToDictionary(pair => pair.id, pair => pair.k, StringComparer.Ordinal);
        var units = ordered.Select(id => new LogUnit(id, labels[id])).ToImmutableArray();
        int[] unitOfName = idOfName.Select(id => number[id]).ToArray();
        return (units, unitOfName);
    }

    /// <summary>
    /// An id made from <paramref name="name"/>: ASCII letters, digits, '_' and '-' kept, every run of anything else one
    /// '_', no '_' at either end, and <c>unit_</c> in front when it would not start with a letter.
    /// </summary>
    public static string MakeId(string name)
    {
        var id = new StringBuilder(name.Length);
        foreach (char c in name)
        {
            if (char.IsAsciiLetterOrDigit(c) || c is '_' or '-')
            {
                id.Append(c);
            }
            else if (id.Length > 0 && id[^1] != '_')
            {
                id.Append('_');
            }
        }

        string made = id.ToString().Trim('_');
        return made.Length > 0 && char.IsAsciiLetter(made[0]) ? made : "unit_" + made;
    }

    /// <summary>Whether <paramref name="id"/> is a valid unit id, as the network file requires.</summary>
    public static bool IsValidId(string id) =>
        id.Length > 0 && char.IsAsciiLetter(id[0]) && id.All(c => char.IsAsciiLetterOrDigit(c) || c is '_' or '-');

    private static string Unique(string id, HashSet<string> taken)
    {
        string candidate = id;
        for (int n = 2; !taken.Add(candidate); n++)
        {
            candidate = string.Create(CultureInfo.InvariantCulture, $"{id}_{n}");
        }

        return candidate;
    }
}
