using BenchmarkDotNet.Attributes;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Benchmarks;

/// <summary>
/// Dense LU against the sparse iterative solver on the same generated networks, to place
/// <see cref="TrafficEquations.DenseLimit"/> where the sparse path starts to win.
/// </summary>
[MemoryDiagnoser]
public class TrafficEquationsBenchmarks
{
    private RoutingTable _routing = null!;

    /// <summary>Units, all reached (every unit has external arrivals).</summary>
    [Params(25, 50, 100, 200, 400, 800, 1600)]
    public int Units { get; set; }

    [GlobalSetup]
    public void Setup() =>
        _routing = RoutingTable.Build(NetworkGenerator.Generate(Units, seed: 7, maxRoutesPerUnit: 5, arrivalShare: 1.0).Network);

    [Benchmark(Baseline = true, Description = "dense LU")]
    public double[] Dense() => TrafficEquations.Solve(_routing, TrafficSolveMethod.Dense);

    [Benchmark(Description = "sparse (Gauss-Seidel sweeps)")]
    public double[] Sparse() => TrafficEquations.Solve(_routing, TrafficSolveMethod.Sparse);
}
