using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>A scalar: its text and whether it was written plain (unquoted).</summary>
public sealed record YamlScalar(SourceLocation Location, string Value, bool IsPlain) : YamlNode(Location)
{
    /// <summary>True for an empty plain scalar or one of YAML's null words.</summary>
    /// <remarks>Asked of every value a network file has: the length decides before any text is compared.</remarks>
    public bool IsNull => IsPlain && Value.Length switch
    {
        0 => true,
        1 => Value[0] == '~',
        4 => Value is "null" or "Null" or "NULL",
        _ => false,
    };
}
