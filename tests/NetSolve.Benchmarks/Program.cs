BenchmarkDotNet.Running.BenchmarkSwitcher.FromAssembly(typeof(NetSolve.Benchmarks.SimulationBenchmarks).Assembly).Run(args);
