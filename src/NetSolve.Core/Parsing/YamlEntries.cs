using System.Collections;

namespace NetSolve.Parsing;

/// <summary>The entries of a <see cref="YamlMapping"/> in file order, walked with a struct enumerator (no object per walk).</summary>
public readonly struct YamlEntries : IEnumerable<YamlEntry>
{
    private readonly YamlTree _tree;
    private readonly int _mapping;

    internal YamlEntries(YamlTree tree, int mapping)
    {
        _tree = tree;
        _mapping = mapping;
    }

    internal YamlTree Tree => _tree;

    /// <summary>How many entries, duplicates included; none for the default value.</summary>
    public int Count => _tree is null ? 0 : _tree[_mapping].Length;

    /// <summary>The index of the first key; 0 for an empty mapping.</summary>
    internal int FirstKey => Count > 0 ? _mapping + 1 : 0;

    /// <summary>A walk in file order.</summary>
    public Enumerator GetEnumerator() => new(_tree, FirstKey);

    IEnumerator<YamlEntry> IEnumerable<YamlEntry>.GetEnumerator() => GetEnumerator();

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();

    /// <summary>Walks the keys: each value follows its key, and points at the next key.</summary>
    public struct Enumerator : IEnumerator<YamlEntry>
    {
        private readonly YamlTree _tree;
        private int _next;

        internal Enumerator(YamlTree tree, int firstKey)
        {
            _tree = tree;
            _next = firstKey;
        }

        /// <inheritdoc/>
        public YamlEntry Current { get; private set; }

        readonly object IEnumerator.Current => Current;

        /// <inheritdoc/>
        public bool MoveNext()
        {
            if (_next == 0)
            {
                return false;
            }

            int key = _next;
            Current = new YamlEntry(new YamlKey(_tree, key), new YamlNode(_tree, key + 1));
            _next = _tree[key + 1].Next;
            return true;
        }

        /// <inheritdoc/>
        public readonly void Reset() => throw new NotSupportedException();

        /// <inheritdoc/>
        public readonly void Dispose()
        {
        }
    }
}
