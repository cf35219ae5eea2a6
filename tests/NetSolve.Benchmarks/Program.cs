using BenchmarkDotNet.Running;
using NetSolve.Benchmarks;

if (args is ["cpu-time", .. var sizes])
{
    CpuTimeMeasurement.Run(Console.Out, sizes.Length == 0 ? [10, 1000] : [.. sizes.Select(int.Parse)]);
    return;
}

if (args is ["cpu-time-file", var path, var hours, .. var rest])
{
    CpuTimeMeasurement.RunFile(Console.Out, path, double.Parse(hours, System.Globalization.CultureInfo.InvariantCulture), rest.Length == 0 ? 3 : int.Parse(rest[0], System.Globalization.CultureInfo.InvariantCulture));
    return;
}

if (args is ["memory-stages", var stagesPath, var stagesHours])
{
    SimulationMemoryStages.Run(Console.Out, stagesPath, double.Parse(stagesHours, System.Globalization.CultureInfo.InvariantCulture));
    return;
}

if (args is ["read-file", var networkPath, .. var readRuns])
{
    ReadMeasurement.Run(Console.Out, networkPath, readRuns.Length == 0 ? 5 : int.Parse(readRuns[0], System.Globalization.CultureInfo.InvariantCulture));
    return;
}

if (args is ["solve-stages", var solvePath, .. var solveRuns])
{
    SolveStagesMeasurement.Run(Console.Out, solvePath, solveRuns.Length == 0 ? 5 : int.Parse(solveRuns[0], System.Globalization.CultureInfo.InvariantCulture));
    return;
}

if (args is ["solve-memory", var memoryPath, .. var memoryFormat])
{
    SolveMemoryStages.Run(Console.Out, memoryPath, memoryFormat.Length == 0 ? "json" : memoryFormat[0], memoryFormat.Contains("live"));
    return;
}

if (args is ["time-varying", .. var counts])
{
    TimeVaryingMeasurement.Run(Console.Out, counts.Length == 0 ? [100, 1000] : [.. counts.Select(int.Parse)]);
    return;
}

if (args is ["movement-log", var rows, var logPath, .. var seed])
{
    MovementLogGenerator.Write(logPath, long.Parse(rows, System.Globalization.CultureInfo.InvariantCulture), seed.Length == 0 ? 16 : int.Parse(seed[0], System.Globalization.CultureInfo.InvariantCulture), Console.Out);
    return;
}

if (args is ["map-layout", .. var mapFiles])
{
    MapLayoutMeasurement.Run(Console.Out, mapFiles);
    return;
}

if (args is ["map-png", .. var pngFiles])
{
    MapPngMeasurement.Run(Console.Out, pngFiles);
    return;
}

BenchmarkSwitcher.FromAssembly(typeof(GeneratedNetworks).Assembly).Run(args);
