using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>A scalar of a <see cref="YamlTree"/>: its text and whether it was written plain (unquoted).</summary>
/// <remarks>Its text is a span of the input; <see cref="Value"/> makes a string each time it is asked.</remarks>
public readonly struct YamlScalar : IEquatable<YamlScalar>
{
    internal YamlScalar(YamlTree tree, int index)
    {
        Tree = tree;
        Index = index;
    }

    internal YamlTree Tree { get; }

    internal int Index { get; }

    /// <summary>Where the scalar starts (for a quoted one, its opening quote).</summary>
    public SourceLocation Location => Tree.Location(Index);

    /// <summary>The text, as a new string: ask once and keep it.</summary>
    public string Value => Tree.String(Index);

    /// <summary>The text, without making a string.</summary>
    public ReadOnlySpan<char> Text => Tree.Text(Index);

    /// <summary>True when the scalar was written without quotes.</summary>
    public bool IsPlain => Tree[Index].IsPlain;

    /// <summary>The scalar as a node.</summary>
    public YamlNode Node => new(Tree, Index);

    /// <summary>True for an empty plain scalar or one of YAML's null words.</summary>
    /// <remarks>Asked of every value a network file has: the length decides before any text is compared.</remarks>
    public bool IsNull
    {
        get
        {
            ref readonly var record = ref Tree[Index];
            return record.IsPlain && record.Length switch
            {
                0 => true,
                1 => Text[0] == '~',
                4 => Text is "null" or "Null" or "NULL",
                _ => false,
            };
        }
    }

    /// <summary>True when the text is <paramref name="text"/>.</summary>
    public bool Is(string text) => Text.SequenceEqual(text);

    /// <summary>True for the same node of the same tree.</summary>
    public static bool operator ==(YamlScalar left, YamlScalar right) => left.Equals(right);

    /// <summary>True for different nodes.</summary>
    public static bool operator !=(YamlScalar left, YamlScalar right) => !left.Equals(right);

    /// <summary>True for the same node of the same tree.</summary>
    public bool Equals(YamlScalar other) => ReferenceEquals(Tree, other.Tree) && Index == other.Index;

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is YamlScalar other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Tree, Index);
}
