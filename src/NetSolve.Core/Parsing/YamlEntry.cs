namespace NetSolve.Parsing;

/// <summary>One entry of a <see cref="YamlMapping"/>: its key and the node under it.</summary>
/// <param name="Key">The key.</param>
/// <param name="Value">The node under the key.</param>
public readonly record struct YamlEntry(YamlKey Key, YamlNode Value);
