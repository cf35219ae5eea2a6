using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>A mapping key: its text, the place it starts and whether it was written plain (unquoted).</summary>
/// <remarks>Its text is a span of the input; <see cref="Value"/> makes a string each time it is asked.</remarks>
public readonly struct YamlKey : IEquatable<YamlKey>
{
    internal YamlKey(YamlTree tree, int index)
    {
        Tree = tree;
        Index = index;
    }

    internal YamlTree Tree { get; }

    internal int Index { get; }

    /// <summary>Where the key starts.</summary>
    public SourceLocation Location => Tree.Location(Index);

    /// <summary>The key's text, as a new string: ask once and keep it.</summary>
    public string Value => Tree.String(Index);

    /// <summary>The key's text, without making a string.</summary>
    public ReadOnlySpan<char> Text => Tree.Text(Index);

    /// <summary>True when the key was written without quotes.</summary>
    public bool IsPlain => Tree[Index].IsPlain;

    /// <summary>True when the key's text is <paramref name="text"/>.</summary>
    public bool Is(string text) => Text.SequenceEqual(text);

    /// <summary>True for the same node of the same tree.</summary>
    public static bool operator ==(YamlKey left, YamlKey right) => left.Equals(right);

    /// <summary>True for different nodes.</summary>
    public static bool operator !=(YamlKey left, YamlKey right) => !left.Equals(right);

    /// <summary>True for the same node of the same tree.</summary>
    public bool Equals(YamlKey other) => ReferenceEquals(Tree, other.Tree) && Index == other.Index;

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is YamlKey other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Tree, Index);
}
