using BenchmarkDotNet.Running;
using NetSolve.Benchmarks;

if (args.Length == 1 && args[0] == "cpu-time")
{
    CpuTimeMeasurement.Run(Console.Out);
    return;
}

BenchmarkSwitcher.FromAssembly(typeof(SimulationBenchmarks).Assembly).Run(args);
