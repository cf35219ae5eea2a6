using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>A sequence, its items in file order.</summary>
public sealed record YamlSequence(SourceLocation Location, IReadOnlyList<YamlNode> Items) : YamlNode(Location);
