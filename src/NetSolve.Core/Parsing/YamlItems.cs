using System.Collections;

namespace NetSolve.Parsing;

/// <summary>The items of a <see cref="YamlSequence"/> in file order, walked with a struct enumerator (no object per walk).</summary>
public readonly struct YamlItems : IEnumerable<YamlNode>
{
    private readonly YamlTree _tree;
    private readonly int _sequence;

    internal YamlItems(YamlTree tree, int sequence)
    {
        _tree = tree;
        _sequence = sequence;
    }

    /// <summary>How many items.</summary>
    public int Count => _tree[_sequence].Length;

    /// <summary>A walk in file order.</summary>
    public Enumerator GetEnumerator() => new(_tree, Count > 0 ? _sequence + 1 : 0);

    IEnumerator<YamlNode> IEnumerable<YamlNode>.GetEnumerator() => GetEnumerator();

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();

    /// <summary>Walks the items, each pointing at the next.</summary>
    public struct Enumerator : IEnumerator<YamlNode>
    {
        private readonly YamlTree _tree;
        private int _next;

        internal Enumerator(YamlTree tree, int first)
        {
            _tree = tree;
            _next = first;
        }

        /// <inheritdoc/>
        public YamlNode Current { get; private set; }

        readonly object IEnumerator.Current => Current;

        /// <inheritdoc/>
        public bool MoveNext()
        {
            if (_next == 0)
            {
                return false;
            }

            Current = new YamlNode(_tree, _next);
            _next = _tree[_next].Next;
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
