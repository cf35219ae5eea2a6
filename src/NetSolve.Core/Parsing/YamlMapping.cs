using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>A mapping of a <see cref="YamlTree"/>, its entries in file order (duplicates kept so the reader can report them).</summary>
public readonly struct YamlMapping : IEquatable<YamlMapping>
{
    internal YamlMapping(YamlTree tree, int index)
    {
        Tree = tree;
        Index = index;
    }

    internal YamlTree Tree { get; }

    internal int Index { get; }

    /// <summary>Where the mapping starts.</summary>
    public SourceLocation Location => Tree.Location(Index);

    /// <summary>The entries in file order.</summary>
    public YamlEntries Entries => new(Tree, Index);

    /// <summary>The mapping as a node.</summary>
    public YamlNode Node => new(Tree, Index);

    /// <summary>The node under the first key <paramref name="key"/>; null when there is none.</summary>
    public YamlNode? Find(string key)
    {
        foreach (var (entryKey, value) in Entries)
        {
            if (entryKey.Is(key))
            {
                return value;
            }
        }

        return null;
    }

    /// <summary>True for the same node of the same tree.</summary>
    public static bool operator ==(YamlMapping left, YamlMapping right) => left.Equals(right);

    /// <summary>True for different nodes.</summary>
    public static bool operator !=(YamlMapping left, YamlMapping right) => !left.Equals(right);

    /// <summary>True for the same node of the same tree.</summary>
    public bool Equals(YamlMapping other) => ReferenceEquals(Tree, other.Tree) && Index == other.Index;

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is YamlMapping other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Tree, Index);
}
