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
            var (yamlCpu, yamlBytes) = Measure(() => LocatedYamlReader.Read(text, path));
            var (readCpu, readBytes) = Measure(() => NetworkReader.ReadText(text, path));
            output.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"run {run}  YAML tree: cpu {yamlCpu,6:F0} ms, allocated {yamlBytes / 1e6,6:F1} MB  whole read (tree + rules): cpu {readCpu,6:F0} ms, allocated {readBytes / 1e6,6:F1} MB"));
        }

        Stages(output, text, path);
    }

    /// <summary>The rules stage by stage on one tree: the file's rules, the routing structure, the bare-number warnings.</summary>
    private static void Stages(TextWriter output, string text, string path)
    {
        var root = LocatedYamlReader.Read(text, path)!;
        var diagnostics = new List<NetSolve.Diagnostics.Diagnostic>();
        (NetSolve.Model.Network Network, NetworkLocations Locations)? parsed = null;
        var (parseCpu, parseBytes) = Measure(() => parsed = new NetworkFileParser(path, diagnostics).Parse(root));
        var (structureCpu, structureBytes) = Measure(() =>
        {
            StructureRules.Check(parsed!.Value.Network, parsed.Value.Locations, diagnostics);
            return null;
        });
        var (bareCpu, bareBytes) = Measure(() =>
        {
            BareNumbers.Check(root, parsed!.Value.Network.TimeUnit, diagnostics);
            return null;
        });
        output.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"stages  file rules: cpu {parseCpu,6:F0} ms, {parseBytes / 1e6,6:F1} MB  structure: cpu {structureCpu,6:F0} ms, {structureBytes / 1e6,6:F1} MB  bare numbers: cpu {bareCpu,6:F0} ms, {bareBytes / 1e6,6:F1} MB ({diagnostics.Count} diagnostics)"));

        // What `solve --format json` does after reading: the solution, then the document (written to nowhere).
        NetSolve.Solving.NetworkSolution? solution = null;
        var (solveCpu, solveBytes) = Measure(() => solution = NetSolve.Solving.NetworkSolver.Solve(parsed!.Value.Network));
        var (jsonCpu, jsonBytes) = Measure(() =>
        {
            NetSolve.Presentation.Solution.SolutionJsonWriter.Write(solution!, Stream.Null);
            return null;
        });
        output.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"after   solve: cpu {solveCpu,6:F0} ms, {solveBytes / 1e6,6:F1} MB  JSON document: cpu {jsonCpu,6:F0} ms, {jsonBytes / 1e6,6:F1} MB"));
    }

    private static (double CpuMs, long Bytes) Measure(Func<object?> stage)
    {
        GC.Collect();
        GC.WaitForPendingFinalizers();
        long bytesBefore = GC.GetTotalAllocatedBytes(precise: true);
        var cpuBefore = Process.GetCurrentProcess().TotalProcessorTime;
        var result = stage();
        var cpu = Process.GetCurrentProcess().TotalProcessorTime - cpuBefore;
        long bytes = GC.GetTotalAllocatedBytes(precise: true) - bytesBefore;
        GC.KeepAlive(result);
        return (cpu.TotalMilliseconds, bytes);
    }
}
