using BenchmarkDotNet.Attributes;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Solving;

namespace NetSolve.Benchmarks;

/// <summary>
/// A generated network read from YAML text and solved, end to end, and the two stages apart.
/// Targets (issue "Core"): 1,000 units under 100 ms, 100,000 units under 2 s on a 2-core machine.
/// </summary>
[MemoryDiagnoser]
public class EndToEndBenchmarks
{
    private string _yaml = string.Empty;
    private Network _network = null!;

    /// <summary>Units in the generated network; each routes to at most 5 others.</summary>
    [Params(1_000, 100_000)]
    public int Units { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        var generated = NetworkGenerator.Generate(Units, seed: 2026, maxRoutesPerUnit: 5);
        _yaml = generated.Yaml;
        _network = generated.Network;
    }

    [Benchmark(Description = "read YAML + solve")]
    public NetworkSolution ReadAndSolve()
    {
        var result = NetworkReader.ReadText(_yaml, "generated.yaml");
        return NetworkSolver.Solve(result.Network ?? throw new InvalidOperationException("The generated network is invalid."));
    }

    [Benchmark(Description = "read YAML only")]
    public ReadResult Read() => NetworkReader.ReadText(_yaml, "generated.yaml");

    [Benchmark(Description = "solve only")]
    public NetworkSolution Solve() => NetworkSolver.Solve(_network);
}
