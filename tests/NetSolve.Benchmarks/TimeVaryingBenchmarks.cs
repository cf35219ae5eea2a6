using BenchmarkDotNet.Attributes;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Benchmarks;

/// <summary>
/// The hour-by-hour solution of a generated network with loops and an emergency-shaped daily profile: the offered
/// load alone, and the load with every unit's waits. Target (docs/time-of-day.md): 1,000 units under 2 s.
/// </summary>
[MemoryDiagnoser]
public class TimeVaryingBenchmarks
{
    private Network _network = null!;

    /// <summary>Units in the generated network; each routes to at most 5 others.</summary>
    [Params(100, 1_000)]
    public int Units { get; set; }

    /// <summary>An invented emergency-shaped day: quiet at night, peaking in the afternoon (mean 1).</summary>
    public static double[] EmergencyDay() =>
    [
        0.55, 0.45, 0.40, 0.35, 0.35, 0.40, 0.55, 0.75, 1.00, 1.20, 1.30, 1.35,
        1.40, 1.40, 1.45, 1.50, 1.50, 1.45, 1.35, 1.25, 1.10, 0.95, 0.80, 0.65,
    ];

    /// <summary>The generated network of <paramref name="units"/> units with the emergency-shaped day as its profile.</summary>
    public static Network WithProfile(int units) =>
        NetworkGenerator.Generate(units, seed: 42).Network with { ArrivalProfile = ArrivalProfile.Create(EmergencyDay()) };

    [GlobalSetup]
    public void Setup() => _network = WithProfile(Units);

    [Benchmark(Baseline = true, Description = "offered load")]
    public TimeVaryingTrafficSolution OfferedLoad() => TimeVaryingTraffic.Solve(_network);

    [Benchmark(Description = "offered load and waits")]
    public TimeVaryingSolution LoadAndWaits() => TimeVaryingSolver.Solve(_network);
}
