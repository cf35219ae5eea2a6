using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>A node of a <see cref="YamlTree"/>: a scalar, a mapping or a sequence, with the place it starts in the file.</summary>
/// <remarks>A view (the tree and an index), not an object per node; <see cref="AsScalar"/> and its kin say what it is.</remarks>
public readonly struct YamlNode : IEquatable<YamlNode>
{
    internal YamlNode(YamlTree tree, int index)
    {
        Tree = tree;
        Index = index;
    }

    internal YamlTree Tree { get; }

    internal int Index { get; }

    /// <summary>What the node is.</summary>
    public YamlNodeKind Kind => Tree[Index].Kind;

    /// <summary>Where the node starts.</summary>
    public SourceLocation Location => Tree.Location(Index);

    /// <summary>The node as a scalar; null for a mapping or sequence.</summary>
    public YamlScalar? AsScalar => Kind == YamlNodeKind.Scalar ? new YamlScalar(Tree, Index) : null;

    /// <summary>The node as a mapping; null for a scalar or sequence.</summary>
    public YamlMapping? AsMapping => Kind == YamlNodeKind.Mapping ? new YamlMapping(Tree, Index) : null;

    /// <summary>The node as a sequence; null for a scalar or mapping.</summary>
    public YamlSequence? AsSequence => Kind == YamlNodeKind.Sequence ? new YamlSequence(Tree, Index) : null;

    /// <summary>True for a scalar that is empty or one of YAML's null words (<see cref="YamlScalar.IsNull"/>).</summary>
    public bool IsNullScalar => Kind == YamlNodeKind.Scalar && new YamlScalar(Tree, Index).IsNull;

    /// <summary>True for the same node of the same tree.</summary>
    public static bool operator ==(YamlNode left, YamlNode right) => left.Equals(right);

    /// <summary>True for different nodes.</summary>
    public static bool operator !=(YamlNode left, YamlNode right) => !left.Equals(right);

    /// <summary>True for the same node of the same tree.</summary>
    public bool Equals(YamlNode other) => ReferenceEquals(Tree, other.Tree) && Index == other.Index;

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is YamlNode other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Tree, Index);
}
