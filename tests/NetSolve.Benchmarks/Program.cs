using BenchmarkDotNet.Running;

BenchmarkSwitcher.FromAssembly(typeof(NetSolve.Benchmarks.MapRenderingBenchmarks).Assembly).Run(args);
