using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>
/// The nodes of one YAML document with their places in the file, built by <see cref="LocatedYamlReader"/>; read it
/// through <see cref="YamlNode"/> and its kin, small views that hold the tree and an index.
/// </summary>
/// <remarks>
/// Compact because network files are large: the nodes are records (<see cref="YamlRecord"/>) in pages of
/// <see cref="PageSize"/>, and a scalar's text is a span of the input, made into a string only when asked for. A
/// 100,000-unit file has about 1.5 million nodes; as objects with a string each they were over a hundred megabytes
/// for the collector to trace. Pages rather than one array: one array of 37 MB lands on the large object heap, which
/// only a full collection frees, and it was still held at the process's peak, long after the read.
/// </remarks>
public sealed class YamlTree
{
    /// <summary>Records per page: 48 KB, under the size at which an array goes to the large object heap.</summary>
    private const int PageBits = 11;
    private const int PageSize = 1 << PageBits;
    private const int PageMask = PageSize - 1;

    private readonly string _text;
    private YamlRecord[][] _pages;
    private int _count;
    private List<string>? _strings;

    internal YamlTree(string text, string fileName, int capacity)
    {
        _text = text;
        FileName = fileName;
        _pages = new YamlRecord[(Math.Max(capacity, 1) >> PageBits) + 1][];
    }

    /// <summary>The file name shown in every location.</summary>
    public string FileName { get; }

    /// <summary>The document's top node; the tree holds at least one.</summary>
    public YamlNode Root => new(this, 0);

    internal int Count => _count;

    internal ref readonly YamlRecord this[int index] => ref _pages[index >> PageBits][index & PageMask];

    /// <summary>Adds a node whose text, for a scalar, is <paramref name="length"/> characters of the input at <paramref name="start"/>.</summary>
    internal int Add(YamlNodeKind kind, int line, int column, int start, int length, bool isPlain)
    {
        if ((_count & PageMask) == 0)
        {
            int page = _count >> PageBits;
            if (page == _pages.Length)
            {
                Array.Resize(ref _pages, _pages.Length * 2);
            }

            _pages[page] = new YamlRecord[PageSize];
        }

        Record(_count) = new YamlRecord { Kind = kind, Line = line, Column = column, Start = start, Length = length, IsPlain = isPlain };
        return _count++;
    }

    /// <summary>Adds a scalar whose text is not a span of the input (the general reader unfolds and unescapes).</summary>
    internal int AddScalar(int line, int column, string value, bool isPlain)
    {
        _strings ??= [];
        _strings.Add(value);
        return Add(YamlNodeKind.Scalar, line, column, ~(_strings.Count - 1), value.Length, isPlain);
    }

    internal void SetNext(int index, int next) => Record(index).Next = next;

    internal void SetLength(int index, int length) => Record(index).Length = length;

    internal SourceLocation Location(int index)
    {
        ref readonly var record = ref this[index];
        return new(FileName, record.Line, record.Column);
    }

    /// <summary>A scalar's text, without making a string.</summary>
    internal ReadOnlySpan<char> Text(int index)
    {
        ref readonly var record = ref this[index];
        return record.Start >= 0 ? _text.AsSpan(record.Start, record.Length) : _strings![~record.Start];
    }

    /// <summary>A scalar's text as a string, made on each call.</summary>
    internal string String(int index)
    {
        ref readonly var record = ref this[index];
        return record.Start >= 0 ? _text.Substring(record.Start, record.Length) : _strings![~record.Start];
    }

    /// <summary>
    /// The index of the first key of the mapping before <paramref name="key"/> with the same text, starting the
    /// search at <paramref name="firstKey"/>; -1 when there is none. A scan: for mappings of a few keys.
    /// </summary>
    internal int EarlierKey(int firstKey, int key)
    {
        var text = Text(key);
        for (int k = firstKey; k != key; k = this[k + 1].Next)
        {
            if (Text(k).SequenceEqual(text))
            {
                return k;
            }
        }

        return -1;
    }

    private ref YamlRecord Record(int index) => ref _pages[index >> PageBits][index & PageMask];
}
