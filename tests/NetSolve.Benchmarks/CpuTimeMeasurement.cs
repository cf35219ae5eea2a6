using System.Diagnostics;
using System.Globalization;

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
