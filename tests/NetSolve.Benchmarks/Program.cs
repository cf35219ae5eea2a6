using BenchmarkDotNet.Running;

BenchmarkSwitcher.FromAssembly(typeof(NetSolve.Benchmarks.GeneratedNetworks).Assembly).Run(args);
