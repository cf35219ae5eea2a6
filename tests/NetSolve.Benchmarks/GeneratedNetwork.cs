using NetSolve.Model;

namespace NetSolve.Benchmarks;

/// <summary>A generated network: the same network as YAML text and as a model value.</summary>
/// <param name="Yaml">The network file text.</param>
/// <param name="Network">The network the text describes.</param>
public sealed record GeneratedNetwork(string Yaml, Network Network);
