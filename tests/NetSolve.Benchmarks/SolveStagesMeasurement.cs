using System.Diagnostics;
using System.Globalization;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Presentation.Solution;
using NetSolve.Solving;

namespace NetSolve.Benchmarks;

/// <summary>
/// <c>dotnet run -c Release --project tests/NetSolve.Benchmarks -- solve-stages NET.yaml [RUNS]</c>: what
/// <c>solve NET.yaml --format json</c> does after the network is read, stage by stage, timed by the process's CPU time,
/// with the bytes each stage allocates: the routing table and traffic equations alone, the whole solution, the two
/// warnings the command checks (implausible loads, return loops) and the JSON document (written to nowhere). The
/// first run includes just-in-time compilation, as a command pays it; the rest are warm.
/// </summary>
internal static class SolveStagesMeasurement
{
    public static void Run(TextWriter output, string path, int runs)
    {
        var network = NetworkReader.ReadText(File.ReadAllText(path), path).Network!;
        output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{path}: {network.Units.Length} units, {network.Routes.Length} routes"));
        for (int run = 1; run <= runs; run++)
        {
            // A copy of the network each run, so the routing table cached per network object is built again.
            var fresh = network with { };
            var routing = Stage(() => RoutingTable.Build(fresh));
            var traffic = Stage(() => TrafficEquations.Solve(RoutingTable.Build(fresh)));
            NetworkSolution? solution = null;
            var solve = Stage(() => solution = NetworkSolver.Solve(fresh));
            var loads = Stage(() => LoadPlausibility.Warnings(solution!, path));
            var loops = Stage(() => ReturnLoops.Warnings(fresh, path));
            var json = Stage(() =>
            {
                SolutionJsonWriter.Write(solution!, Stream.Null);
                return null;
            });
            output.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"run {run}  routing {routing}  traffic {traffic}  solve (all) {solve}  load warnings {loads}  return loops {loops}  JSON {json}  total cpu {solve.CpuMs + loads.CpuMs + loops.CpuMs + json.CpuMs:F0} ms"));
        }
    }

    /// <summary>The stage's CPU time (all threads) and bytes allocated.</summary>
    private static StageCost Stage(Func<object?> stage)
    {
        GC.Collect();
        GC.WaitForPendingFinalizers();
        long bytesBefore = GC.GetTotalAllocatedBytes(precise: true);
        var cpuBefore = Process.GetCurrentProcess().TotalProcessorTime;
        var result = stage();
        var cpu = Process.GetCurrentProcess().TotalProcessorTime - cpuBefore;
        long bytes = GC.GetTotalAllocatedBytes(precise: true) - bytesBefore;
        GC.KeepAlive(result);
        return new StageCost(cpu.TotalMilliseconds, bytes);
    }

    private sealed record StageCost(double CpuMs, long Bytes)
    {
        public override string ToString() => string.Create(CultureInfo.InvariantCulture, $"{CpuMs,4:F0} ms {Bytes / 1e6,5:F1} MB");
    }
}
