using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>A mapping, its entries in file order (duplicates kept so the reader can report them).</summary>
public sealed record YamlMapping(SourceLocation Location, IReadOnlyList<YamlEntry> Entries) : YamlNode(Location);
