using System.Diagnostics;

namespace NetSolve.Benchmarks;

/// <summary>CPU time of the whole process and wall clock of one piece of work, and the median of several runs: the map modes' measure.</summary>
internal static class InProcessTiming
{
    /// <summary>Milliseconds of CPU (every thread of the process, the garbage collector's included) and of wall clock.</summary>
    public static (double Cpu, double Wall) Time(Func<object> work)
    {
        var cpuBefore = Process.GetCurrentProcess().TotalProcessorTime;
        var wall = Stopwatch.StartNew();
        GC.KeepAlive(work());
        wall.Stop();
        return ((Process.GetCurrentProcess().TotalProcessorTime - cpuBefore).TotalMilliseconds, wall.Elapsed.TotalMilliseconds);
    }

    public static double Median(IEnumerable<double> values)
    {
        var sorted = values.Order().ToList();
        return sorted[sorted.Count / 2];
    }
}
