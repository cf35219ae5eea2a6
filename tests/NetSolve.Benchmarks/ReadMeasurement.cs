using System.Diagnostics;
using System.Globalization;
using NetSolve.Parsing;

namespace NetSolve.Benchmarks;

/// <summary>
/// <c>dotnet run -c Release --project tests/NetSolve.Benchmarks -- read-file NET.yaml [RUNS]</c>: reads a network file
/// (for example the 100,000-unit one from ../shared/perf/gen_network.py) stage by stage, timed by the process's CPU
/// time, with the bytes each stage allocates. CPU time and allocated bytes hold still on a shared machine where the
/// wall clock does not. The first run includes just-in-time compilation, as a command pays it; the rest are warm.
/// </summary>
internal static class ReadMeasurement
{
    public static void Run(TextWriter output, string path, int runs)
    {
        string text = File.ReadAllText(path);
        output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{path}: {text.Length / 1e6:F1} M characters"));
        for (int run = 1; run <= runs; run++)
        {
            var (yamlCpu, yamlBytes, yamlWall) = Measure(() => LocatedYamlReader.Read(text, path));
            var (readCpu, readBytes, readWall) = Measure(() => NetworkReader.ReadText(text, path));
            output.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"run {run}  YAML tree: cpu {yamlCpu,6:F0} ms (wall {yamlWall,5:F0}), allocated {yamlBytes / 1e6,6:F1} MB  whole read (tree + rules): cpu {readCpu,6:F0} ms (wall {readWall,5:F0}), allocated {readBytes / 1e6,6:F1} MB"));
        }

        Stages(output, text, path);
    }

    /// <summary>The rules stage by stage on one tree: the file's rules, the routing structure, the bare-number warnings.</summary>
    private static void Stages(TextWriter output, string text, string path)
    {
        var root = LocatedYamlReader.Read(text, path)!.Value;
        var diagnostics = new List<NetSolve.Diagnostics.Diagnostic>();
        (NetSolve.Model.Network Network, NetworkLocations Locations)? parsed = null;
        var (parseCpu, parseBytes, parseWall) = Measure(() => parsed = new NetworkFileParser(path, diagnostics).Parse(root));
        var (structureCpu, structureBytes, _) = Measure(() =>
        {
            StructureRules.Check(parsed!.Value.Network, parsed.Value.Locations, diagnostics);
            return null;
        });
        var (bareCpu, bareBytes, _) = Measure(() =>
        {
            BareNumbers.Check(root, parsed!.Value.Network.TimeUnit, diagnostics);
            return null;
        });
        output.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"stages  file rules: cpu {parseCpu,6:F0} ms (wall {parseWall,5:F0}), {parseBytes / 1e6,6:F1} MB  structure: cpu {structureCpu,6:F0} ms, {structureBytes / 1e6,6:F1} MB  bare numbers: cpu {bareCpu,6:F0} ms, {bareBytes / 1e6,6:F1} MB ({diagnostics.Count} diagnostics)"));

        // What `solve --format json` does after reading: the solution, then the document (written to nowhere).
        NetSolve.Solving.NetworkSolution? solution = null;
        var (solveCpu, solveBytes, solveWall) = Measure(() => solution = NetSolve.Solving.NetworkSolver.Solve(parsed!.Value.Network));
        var (jsonCpu, jsonBytes, jsonWall) = Measure(() =>
        {
            NetSolve.Presentation.Solution.SolutionJsonWriter.Write(solution!, Stream.Null);
            return null;
        });
        output.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"after   solve: cpu {solveCpu,6:F0} ms (wall {solveWall,5:F0}), {solveBytes / 1e6,6:F1} MB  JSON document: cpu {jsonCpu,6:F0} ms (wall {jsonWall,5:F0}), {jsonBytes / 1e6,6:F1} MB"));
    }

    /// <summary>The stage's CPU time (all threads), bytes allocated and wall time: stages that use the second core take less wall than CPU.</summary>
    private static (double CpuMs, long Bytes, double WallMs) Measure(Func<object?> stage)
    {
        GC.Collect();
        GC.WaitForPendingFinalizers();
        long bytesBefore = GC.GetTotalAllocatedBytes(precise: true);
        var cpuBefore = Process.GetCurrentProcess().TotalProcessorTime;
        long wallBefore = Stopwatch.GetTimestamp();
        var result = stage();
        var wall = Stopwatch.GetElapsedTime(wallBefore);
        var cpu = Process.GetCurrentProcess().TotalProcessorTime - cpuBefore;
        long bytes = GC.GetTotalAllocatedBytes(precise: true) - bytesBefore;
        GC.KeepAlive(result);
        return (cpu.TotalMilliseconds, bytes, wall.TotalMilliseconds);
    }
}
