using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>A YAML node with the place it starts in the file. Built by <see cref="LocatedYamlReader"/>.</summary>
public abstract record YamlNode(SourceLocation Location);
