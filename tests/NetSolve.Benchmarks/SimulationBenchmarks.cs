using BenchmarkDotNet.Attributes;
using NetSolve.Simulation;

namespace NetSolve.Benchmarks;

/// <summary>
/// Events per second of one replication of the event loop on one core. Each invocation simulates a fixed span of
/// time from a fixed seed, so it processes the same number of events every time; that count is printed in the setup
/// and reported as the "Events" column, and events per second = Events / Mean.
/// </summary>
[MemoryDiagnoser]
public class SimulationBenchmarks
{
    private CompiledNetwork _network = null!;
    private MetricLayout _layout = null!;

    /// <summary>Units in the generated network.</summary>
    [Params(10, 1000)]
    public int Units { get; set; }

    /// <summary>Simulated hours per invocation, sized for about 2 million events.</summary>
    public double DurationHours => Units == 10 ? 20_000.0 : 2_000.0;

    [GlobalSetup]
    public void Setup()
    {
        var network = BenchmarkNetworks.Build(Units, seed: 2026);
        _network = CompiledNetwork.Compile(network);
        _layout = new MetricLayout(network.Units.Length, 0, 0);
        Console.WriteLine(FormattableString.Invariant($"// Units={Units}: {Run()} events per invocation"));
    }

    [Benchmark]
    public long Replication() => Run();

    private long Run()
    {
        var engine = new SimulationEngine(_network, _layout, [], 0.0, DurationHours, 42, 0);
        engine.Run(null, CancellationToken.None);
        return engine.EventCount;
    }
}
