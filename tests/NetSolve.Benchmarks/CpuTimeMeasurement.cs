using System.Diagnostics;
using System.Globalization;
using NetSolve.Parsing;
using NetSolve.Simulation;

namespace NetSolve.Benchmarks;

/// <summary>
/// <c>dotnet run -c Release --project tests/NetSolve.Benchmarks -- cpu-time</c>: the same replications as
/// <see cref="SimulationBenchmarks"/>, timed by the process's CPU time as well as the wall clock. On a shared
/// machine the wall clock also counts time the thread waited for a core; CPU time does not, so events per
/// CPU-second is the per-core figure. The first run of each size warms up the JIT and is not reported.
/// </summary>
internal static class CpuTimeMeasurement
{
    // Small networks run quickly, so they get more runs: enough for the JIT's tiering to settle within the process.
    private static int Runs(int units) => units <= 10 ? 20 : 5;

    /// <summary>
    /// <c>cpu-time-file NET.yaml HOURS [RUNS]</c>: the same measurement on a network file, one replication of HOURS
    /// simulated hours with no warm-up, so that events per CPU-second can be set beside the C event loop of
    /// ../shared/perf on the very same network (its README defines the ratio). At 100,000 units a run is long and
    /// the JIT has settled within it, so no warm-up run is made; the first line is the cost of compiling the network.
    /// </summary>
    public static void RunFile(TextWriter output, string path, double hours, int runs)
    {
        var read = NetworkReader.ReadFile(path);
        var network = read.Network ?? throw new InvalidOperationException(string.Create(CultureInfo.InvariantCulture, $"{path} is not a valid network file"));
        var cpuBefore = Process.GetCurrentProcess().TotalProcessorTime;
        var compiled = CompiledNetwork.Compile(network);
        var layout = new MetricLayout(network.Units.Length, 0, network.Groups.Length);
        output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"units {network.Units.Length}  compile cpu {(Process.GetCurrentProcess().TotalProcessorTime - cpuBefore).TotalMilliseconds:F0} ms"));
        for (int run = 1; run <= runs; run++)
        {
            int[] collectionsBefore = [GC.CollectionCount(0), GC.CollectionCount(1), GC.CollectionCount(2)];
            var pausedBefore = GC.GetTotalPauseDuration();
            cpuBefore = Process.GetCurrentProcess().TotalProcessorTime;
            var wall = Stopwatch.StartNew();
            var engine = new SimulationEngine(compiled, layout, [], 0.0, hours, 1, 0);
            engine.Run(null, CancellationToken.None);
            wall.Stop();
            var cpu = Process.GetCurrentProcess().TotalProcessorTime - cpuBefore;
            long events = engine.EventCount;
            output.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"units {network.Units.Length,6}  run {run}  events {events,9}  wall {wall.Elapsed.TotalMilliseconds,8:F0} ms  cpu {cpu.TotalMilliseconds,8:F0} ms  {events / cpu.TotalSeconds / 1e6,6:F2} M events/cpu-s  managed heap {GC.GetTotalMemory(false) / 1e6,6:F0} MB  collections {GC.CollectionCount(0) - collectionsBefore[0]}/{GC.CollectionCount(1) - collectionsBefore[1]}/{GC.CollectionCount(2) - collectionsBefore[2]} ({(GC.GetTotalPauseDuration() - pausedBefore).TotalMilliseconds:F0} ms paused)  results {Fingerprint(engine):X16}"));
        }
    }

    /// <summary>
    /// A hash of the replication's metrics (their bits) and of every histogram bucket's count: equal before and after
    /// a change to the engine means the change left every simulated number as it was, to the last bit.
    /// </summary>
    private static ulong Fingerprint(SimulationEngine engine)
    {
        const ulong Prime = 1099511628211;
        ulong hash = 14695981039346656037;
        void Add(ulong value) => hash = (hash ^ value) * Prime;
        foreach (double value in engine.ResultRow())
        {
            Add((ulong)BitConverter.DoubleToInt64Bits(value));
        }

        var tallies = engine.Tallies();
        foreach (var histogram in tallies.UnitTimes.Concat(tallies.GroupTimes))
        {
            Add((ulong)histogram.Zeros);
            foreach (var (low, _, count) in histogram.NonEmptyBuckets())
            {
                Add((ulong)BitConverter.DoubleToInt64Bits(low));
                Add((ulong)count);
            }
        }

        return hash;
    }

    public static void Run(TextWriter output, int[] sizes)
    {
        foreach (int units in sizes)
        {
            var benchmark = new SimulationBenchmarks { Units = units };
            benchmark.Setup();
            benchmark.Replication();
            for (int run = 1; run <= Runs(units); run++)
            {
                var cpuBefore = Process.GetCurrentProcess().TotalProcessorTime;
                var wall = Stopwatch.StartNew();
                long events = benchmark.Replication();
                wall.Stop();
                var cpu = Process.GetCurrentProcess().TotalProcessorTime - cpuBefore;
                output.WriteLine(string.Create(CultureInfo.InvariantCulture,
                    $"units {units,5}  run {run}  events {events,9}  wall {wall.Elapsed.TotalMilliseconds,8:F0} ms  cpu {cpu.TotalMilliseconds,8:F0} ms  {events / wall.Elapsed.TotalSeconds / 1e6,6:F2} M events/s wall  {events / cpu.TotalSeconds / 1e6,6:F2} M events/cpu-s"));
            }
        }
    }
}
