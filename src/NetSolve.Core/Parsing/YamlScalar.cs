using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>A scalar: its text and whether it was written plain (unquoted).</summary>
public sealed record YamlScalar(SourceLocation Location, string Value, bool IsPlain) : YamlNode(Location)
{
    /// <summary>True for an empty plain scalar or one of YAML's null words.</summary>
    public bool IsNull => IsPlain && Value is "" or "~" or "null" or "Null" or "NULL";
}
