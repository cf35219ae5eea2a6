using System.Diagnostics;
using System.Globalization;
using NetSolve.Solving;

namespace NetSolve.Benchmarks;

/// <summary>
/// <c>dotnet run -c Release --project tests/NetSolve.Benchmarks -- time-varying 1000</c>: one quick wall-clock
/// measurement of <see cref="TimeVaryingBenchmarks"/> (second of two runs, so the JIT has warmed up) with the count
/// of units per method, for docs/time-of-day.md; the benchmark itself gives the figures with their spread.
/// </summary>
internal static class TimeVaryingMeasurement
{
    public static void Run(TextWriter output, int[] sizes)
    {
        foreach (int units in sizes)
        {
            var network = TimeVaryingBenchmarks.WithProfile(units);
            for (int run = 1; run <= 2; run++)
            {
                var load = Stopwatch.StartNew();
                TimeVaryingTraffic.Solve(network);
                load.Stop();
                var all = Stopwatch.StartNew();
                var solution = TimeVaryingSolver.Solve(network);
                all.Stop();
                var methods = solution.Units.GroupBy(unit => unit.Method, StringComparer.Ordinal)
                    .Select(group => string.Create(CultureInfo.InvariantCulture, $"{group.Count()} {group.Key}"));
                output.WriteLine(string.Create(CultureInfo.InvariantCulture,
                    $"{units} units, run {run}: offered load {load.Elapsed.TotalSeconds:F3} s, load and waits {all.Elapsed.TotalSeconds:F3} s ({string.Join("; ", methods)})"));
            }
        }
    }
}
