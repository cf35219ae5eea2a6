using BenchmarkDotNet.Running;
using NetSolve.Benchmarks;

if (args is ["cpu-time", .. var sizes])
{
    CpuTimeMeasurement.Run(Console.Out, sizes.Length == 0 ? [10, 1000] : [.. sizes.Select(int.Parse)]);
    return;
}

if (args is ["time-varying", .. var counts])
{
    TimeVaryingMeasurement.Run(Console.Out, counts.Length == 0 ? [100, 1000] : [.. counts.Select(int.Parse)]);
    return;
}

if (args is ["movement-log", var rows, var path, .. var seed])
{
    MovementLogGenerator.Write(path, long.Parse(rows, System.Globalization.CultureInfo.InvariantCulture), seed.Length == 0 ? 16 : int.Parse(seed[0], System.Globalization.CultureInfo.InvariantCulture), Console.Out);
    return;
}

BenchmarkSwitcher.FromAssembly(typeof(GeneratedNetworks).Assembly).Run(args);
