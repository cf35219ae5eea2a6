using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>
/// The entries of a mapping whose key did not appear earlier in it, in file order; each repeated key is reported
/// to the parser as it is passed over.
/// </summary>
/// <remarks>
/// A struct with a struct enumerator rather than an iterator method: it is asked for once per unit's routes, and an
/// iterator object each time is 100,000 objects for a 100,000-unit file.
/// </remarks>
internal readonly struct UniqueEntryList(NodeParser parser, YamlMapping mapping, string? unitId)
{
    public Enumerator GetEnumerator() => new(parser, mapping.Entries, unitId);

    /// <summary>Walks the entries; mappings of more than <see cref="NodeParser.ScanLimit"/> keys look repeats up in a dictionary.</summary>
    internal struct Enumerator(NodeParser parser, IReadOnlyList<YamlEntry> entries, string? unitId)
    {
        private readonly Dictionary<string, SourceLocation>? _seen = entries.Count > NodeParser.ScanLimit
            ? new Dictionary<string, SourceLocation>(entries.Count, StringComparer.Ordinal)
            : null;

        private int _index = -1;

        public (YamlKey Key, YamlNode Value) Current { get; private set; }

        public bool MoveNext()
        {
            while (++_index < entries.Count)
            {
                var (key, value) = entries[_index];
                if (NodeParser.FirstOccurrence(entries, _index, _seen) is SourceLocation first)
                {
                    parser.ReportDuplicate(key, first, unitId);
                    continue;
                }

                _seen?.Add(key.Value, key.Location);
                Current = (key, value);
                return true;
            }

            return false;
        }
    }
}
