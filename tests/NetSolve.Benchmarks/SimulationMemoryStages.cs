using System.Diagnostics;
using System.Globalization;
using NetSolve.Presentation.Simulation;
using NetSolve.Simulation;

namespace NetSolve.Benchmarks;

/// <summary>
/// <c>memory-stages NET.yaml HOURS</c>: the steps of <c>simulate --format json</c> one by one, in process, on one
/// replication of HOURS simulated hours with no warm-up and one thread, each followed by the memory still live after a
/// full collection, the bytes it allocated and the process's peak resident memory so far: where the command's peak
/// comes from (docs/performance.md, "Memory of simulate --format json at 100,000 units").
/// </summary>
internal static class SimulationMemoryStages
{
    public static void Run(TextWriter output, string path, double hours)
    {
        long allocated = GC.GetTotalAllocatedBytes(precise: true);
        var cpu = Process.GetCurrentProcess().TotalProcessorTime;

        void Stage(string name)
        {
            long live = GC.GetTotalMemory(forceFullCollection: true);
            long now = GC.GetTotalAllocatedBytes(precise: true);
            using var process = Process.GetCurrentProcess();
            var cpuNow = process.TotalProcessorTime;
            output.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"{name,-22} live {live / 1e6,7:F0} MB  allocated {(now - allocated) / 1e6,7:F0} MB  cpu {(cpuNow - cpu).TotalSeconds,6:F2} s  peak resident {process.PeakWorkingSet64 / 1e6,7:F0} MB"));
            allocated = now;
            cpu = cpuNow;
        }

        var network = NetworkFile.Read(path);
        Stage("read");
        var options = new SimulationOptions { Replications = 1, WarmupHours = 0.0, DurationHours = hours, MaxDegreeOfParallelism = 1 };
        var compiled = CompiledNetwork.Compile(network);
        var layout = new MetricLayout(network.Units.Length, 0, network.Groups.Length);
        var pool = new ReplicationPool(network.Units.Length, network.Groups.Length, 0);
        Stage("compile");
        RunEngine(compiled, layout, pool, options, Stage);
        Stage("pool (engine let go)");
        var result = new ResultAssembler(layout, pool).Assemble(network, options, pool.Events);
        Stage("assemble");
        SimulationJsonWriter.Write(result, Stream.Null);
        Stage("json to nowhere");
        GC.KeepAlive(result);
    }

    // In a method of its own, so that nothing keeps the engine alive once the pool has what it needs.
    private static void RunEngine(CompiledNetwork compiled, MetricLayout layout, ReplicationPool pool, SimulationOptions options, Action<string> stage)
    {
        var engine = new SimulationEngine(compiled, layout, [], options.WarmupHours, options.DurationHours, options.Seed, 0);
        engine.Run(null, CancellationToken.None);
        stage("replication");
        var tallies = engine.Tallies();
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  histograms of time in unit hold {tallies.UnitTimes.Sum(histogram => histogram.Bytes) / 1e6:F0} MB of counts"));
        pool.Finish(0, new ReplicationOutput(engine.ResultRow(), engine.EventCount, tallies, engine.InNetworkSeries));
        stage("pool add");
    }
}
