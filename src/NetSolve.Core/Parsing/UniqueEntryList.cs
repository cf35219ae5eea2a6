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

    /// <summary>
    /// Walks the entries; mappings of more than <see cref="NodeParser.ScanLimit"/> keys look repeats up in a set of
    /// the keys' places, compared by their text in the file.
    /// </summary>
    internal struct Enumerator(NodeParser parser, YamlEntries entries, string? unitId)
    {
        private readonly HashSet<int>? _seen = entries.Count > NodeParser.ScanLimit
            ? new HashSet<int>(entries.Count, new YamlKeyComparer(entries.Tree))
            : null;

        private YamlEntries.Enumerator _entries = entries.GetEnumerator();

        public (YamlKey Key, YamlNode Value) Current { get; private set; }

        public bool MoveNext()
        {
            while (_entries.MoveNext())
            {
                var (key, value) = _entries.Current;
                if (NodeParser.FirstOccurrence(entries, key, _seen) is SourceLocation first)
                {
                    parser.ReportDuplicate(key, first, unitId);
                    continue;
                }

                _seen?.Add(key.Index);
                Current = (key, value);
                return true;
            }

            return false;
        }
    }
}
