using BenchmarkDotNet.Running;
using NetSolve.Benchmarks;

if (args is ["cpu-time"])
{
    CpuTimeMeasurement.Run(Console.Out);
    return;
}

BenchmarkSwitcher.FromAssembly(typeof(GeneratedNetworks).Assembly).Run(args);
