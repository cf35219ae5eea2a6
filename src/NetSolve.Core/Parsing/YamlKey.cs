using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>A mapping key: its text, the place it starts and whether it was written plain (unquoted).</summary>
/// <remarks>
/// A value inside its <see cref="YamlEntry"/>, not a node object: a network file has a key on nearly every line, and
/// for a 100,000-unit file one object each was three quarters of a million objects for the collector to trace.
/// </remarks>
/// <param name="Location">Where the key starts.</param>
/// <param name="Value">The key's text.</param>
/// <param name="IsPlain">True when the key was written without quotes.</param>
public readonly record struct YamlKey(SourceLocation Location, string Value, bool IsPlain);
