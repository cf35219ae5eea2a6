namespace NetSolve.Parsing;

/// <summary>
/// One node of a <see cref="YamlTree"/>: 24 bytes in one array instead of an object per node. Nodes are stored in
/// the order they are met (a node, then its children), so a mapping's or sequence's first child follows it; each
/// child points at its next sibling. A mapping's children alternate key and value, the value just after its key.
/// </summary>
internal struct YamlRecord
{
    /// <summary>The line the node starts on, from 1.</summary>
    public int Line;

    /// <summary>The column the node starts at, from 1 (for a quoted scalar, its opening quote).</summary>
    public int Column;

    /// <summary>A scalar's text: where it starts in the tree's input, or the complement of its place among the tree's own strings.</summary>
    public int Start;

    /// <summary>A scalar's length in characters; a mapping's number of entries or a sequence's number of items.</summary>
    public int Length;

    /// <summary>The next sibling's index; 0 for none (the root, at 0, is nobody's sibling).</summary>
    public int Next;

    public YamlNodeKind Kind;

    /// <summary>True for a scalar written without quotes (and, for a scalar from the general reader, without a tag).</summary>
    public bool IsPlain;
}
