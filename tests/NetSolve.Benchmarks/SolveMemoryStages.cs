using System.Globalization;
using NetSolve.Analysis;
using NetSolve.Parsing;
using NetSolve.Presentation.Solution;
using NetSolve.Solving;

namespace NetSolve.Benchmarks;

/// <summary>
/// <c>dotnet artifacts/bin/NetSolve.Benchmarks/release/NetSolve.Benchmarks.dll solve-memory NET.yaml [json|csv|table] [live]</c>:
/// the memory of each stage of <c>solve NET.yaml --format F</c>, in the order the command runs them (the text, the YAML
/// tree, the network rules, the solution, the two warnings, the document written to nowhere). For each stage: the bytes
/// it allocates, the collections of each generation while it runs and the time the program stood paused for them, the
/// highest resident set while it runs (the kernel's peak, reset before the stage through /proc/self/clear_refs), the
/// managed heap at its end (live and garbage) and what the last collection left in each generation. With <c>live</c>,
/// also the bytes still live after a full collection at the end of each stage (a collection the command does not make,
/// so the stages after it see a different heap). Run it with the settings the command carries
/// (<c>DOTNET_GCConserveMemory=7 DOTNET_gcConcurrent=0</c>) to see what the command sees, just-in-time compiled.
/// </summary>
internal static class SolveMemoryStages
{
    private static bool _measureLive;

    public static void Run(TextWriter output, string path, string format, bool measureLive)
    {
        _measureLive = measureLive;
        output.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"{path}, --format {format}; gen0 budget {Budget(0) / 1e6:F1} MB at start; columns: allocated, collections of gen0/1/2 while running, peak resident while running, heap at the end (before collecting), live after a full collection"));
        string? text = null;
        YamlNode? root = null;
        ReadResult? read = null;
        NetworkSolution? solution = null;
        Stage(output, "read the file", () => text = File.ReadAllText(path));
        Stage(output, "YAML tree", () => root = LocatedYamlReader.Read(text!, path));
        Stage(output, "network rules", () => read = NetworkReader.ReadTree(root, path));

        // The command drops the text and the tree once the network is read.
        text = null;
        root = null;
        var network = read!.Network!;
        read = null;
        Stage(output, "(text and tree dropped)", () => null);
        Stage(output, "solve", () => solution = NetworkSolver.Solve(network));
        Stage(output, "load warnings", () => LoadPlausibility.Warnings(solution!, path).ToList());
        Stage(output, "return loops", () => ReturnLoops.Warnings(network, path).ToList());
        Stage(output, "document", () =>
        {
            switch (format)
            {
                case "csv":
                    SolutionCsvWriter.Write(solution!, TextWriter.Null);
                    break;
                case "table":
                    SolutionTableWriter.Write(solution!, TextWriter.Null);
                    break;
                default:
                    SolutionJsonWriter.Write(solution!, Stream.Null);
                    break;
            }

            return null;
        });
        GC.KeepAlive(solution);
        var info = GC.GetGCMemoryInfo(GCKind.Any);
        output.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"collections: gen0 {GC.CollectionCount(0)}, gen1 {GC.CollectionCount(1)}, gen2 {GC.CollectionCount(2)}; committed {info.TotalCommittedBytes / 1e6:F1} MB; process peak {PeakResidentKb() / 1e3:F1} MB"));
    }

    private static void Stage(TextWriter output, string name, Func<object?> stage)
    {
        ResetPeak();
        long before = GC.GetTotalAllocatedBytes(precise: true);
        int[] collections = [GC.CollectionCount(0), GC.CollectionCount(1), GC.CollectionCount(2)];
        var paused = GC.GetTotalPauseDuration();
        var result = stage();
        paused = GC.GetTotalPauseDuration() - paused;
        string counts = string.Create(CultureInfo.InvariantCulture,
            $"{GC.CollectionCount(0) - collections[0]}/{GC.CollectionCount(1) - collections[1]}/{GC.CollectionCount(2) - collections[2]}");
        long allocated = GC.GetTotalAllocatedBytes(precise: true) - before;
        long peakKb = PeakResidentKb();
        long heap = GC.GetTotalMemory(forceFullCollection: false);
        var generations = GC.GetGCMemoryInfo(GCKind.Any).GenerationInfo;
        long live = _measureLive ? GC.GetTotalMemory(forceFullCollection: true) : 0;
        GC.KeepAlive(result);
        output.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"{name,-24} allocated {allocated / 1e6,7:F1} MB  collections {counts,-8} ({paused.TotalMilliseconds,4:F0} ms paused)  peak resident {peakKb / 1e3,6:F1} MB  heap {heap / 1e6,6:F1} MB  {(_measureLive ? string.Create(CultureInfo.InvariantCulture, $"live {live / 1e6,6:F1} MB") : "")}  (last collection before: gen0 {generations[0].SizeAfterBytes / 1e6:F1}, gen1 {generations[1].SizeAfterBytes / 1e6:F1}, gen2 {generations[2].SizeAfterBytes / 1e6:F1}, large {generations[3].SizeAfterBytes / 1e6:F1} MB; gen0 budget {Budget(0) / 1e6:F1} MB)"));
    }

    /// <summary>The collector's allocation budget of a generation (an internal of the runtime, read for this measurement only; 0 when absent).</summary>
    private static long Budget(int generation)
    {
        var method = typeof(GC).GetMethod("_GetGenerationBudget", System.Reflection.BindingFlags.NonPublic | System.Reflection.BindingFlags.Static);
        return method?.Invoke(null, [generation]) is long budget ? budget : 0;
    }

    private static void ResetPeak()
    {
        // "5" resets the peak resident set (VmHWM) to the current one (Linux 4.0 and later).
        try
        {
            File.WriteAllText("/proc/self/clear_refs", "5");
        }
        catch (IOException)
        {
            // Not Linux, or not allowed: the peak is the process's since it started.
        }
        catch (UnauthorizedAccessException)
        {
            // As above.
        }
    }

    private static long PeakResidentKb()
    {
        foreach (string line in File.ReadLines("/proc/self/status"))
        {
            if (line.StartsWith("VmHWM:", StringComparison.Ordinal))
            {
                return long.Parse(line["VmHWM:".Length..].Trim().Split(' ')[0], CultureInfo.InvariantCulture);
            }
        }

        return 0;
    }
}
