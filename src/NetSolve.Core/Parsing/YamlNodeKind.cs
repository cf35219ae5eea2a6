namespace NetSolve.Parsing;

/// <summary>What a <see cref="YamlNode"/> is.</summary>
public enum YamlNodeKind : byte
{
    /// <summary>A single value (a key is one too).</summary>
    Scalar,

    /// <summary>Keys with a node under each.</summary>
    Mapping,

    /// <summary>A list of nodes.</summary>
    Sequence,
}
