namespace NetSolve.Parsing;

/// <summary>A YAML node with the place it starts in the file. Built by <see cref="LocatedYamlReader"/>.</summary>
public abstract record YamlNode(SourceLocation Location);

/// <summary>A scalar: its text and whether it was written plain (unquoted).</summary>
public sealed record YamlScalar(SourceLocation Location, string Value, bool IsPlain) : YamlNode(Location)
{
    /// <summary>True for an empty plain scalar or one of YAML's null words.</summary>
    public bool IsNull => IsPlain && Value is "" or "~" or "null" or "Null" or "NULL";
}

/// <summary>A mapping, its entries in file order (duplicates kept so the reader can report them).</summary>
public sealed record YamlMapping(SourceLocation Location, IReadOnlyList<KeyValuePair<YamlScalar, YamlNode>> Entries) : YamlNode(Location);

/// <summary>A sequence, its items in file order.</summary>
public sealed record YamlSequence(SourceLocation Location, IReadOnlyList<YamlNode> Items) : YamlNode(Location);
