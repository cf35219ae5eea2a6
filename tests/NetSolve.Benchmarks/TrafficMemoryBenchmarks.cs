using BenchmarkDotNet.Attributes;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Benchmarks;

/// <summary>
/// Allocation of the traffic equations above the dense/sparse switch point, as units (and with them routes)
/// double: allocated bytes per route should stay about constant (no n x n matrix).
/// </summary>
[MemoryDiagnoser]
public class TrafficMemoryBenchmarks
{
    private RoutingTable _routing = null!;

    /// <summary>Units; routes are about three per unit.</summary>
    [Params(2_000, 4_000, 8_000, 16_000, 32_000)]
    public int Units { get; set; }

    /// <summary>Routes in the generated network, for reading the allocation per route.</summary>
    public int Routes => _routing.Targets.Count;

    [GlobalSetup]
    public void Setup()
    {
        _routing = RoutingTable.Build(NetworkGenerator.Generate(Units, seed: 11, maxRoutesPerUnit: 5, arrivalShare: 1.0).Network);
        Console.WriteLine(FormattableString.Invariant($"// units {Units}: {Routes} routes"));
    }

    [Benchmark(Description = "traffic equations (automatic method)")]
    public double[] Solve() => TrafficEquations.Solve(_routing);
}
