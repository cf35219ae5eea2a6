using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>A sequence of a <see cref="YamlTree"/>, its items in file order.</summary>
public readonly struct YamlSequence : IEquatable<YamlSequence>
{
    internal YamlSequence(YamlTree tree, int index)
    {
        Tree = tree;
        Index = index;
    }

    internal YamlTree Tree { get; }

    internal int Index { get; }

    /// <summary>Where the sequence starts.</summary>
    public SourceLocation Location => Tree.Location(Index);

    /// <summary>The items in file order.</summary>
    public YamlItems Items => new(Tree, Index);

    /// <summary>The sequence as a node.</summary>
    public YamlNode Node => new(Tree, Index);

    /// <summary>True for the same node of the same tree.</summary>
    public static bool operator ==(YamlSequence left, YamlSequence right) => left.Equals(right);

    /// <summary>True for different nodes.</summary>
    public static bool operator !=(YamlSequence left, YamlSequence right) => !left.Equals(right);

    /// <summary>True for the same node of the same tree.</summary>
    public bool Equals(YamlSequence other) => ReferenceEquals(Tree, other.Tree) && Index == other.Index;

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is YamlSequence other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Tree, Index);
}
