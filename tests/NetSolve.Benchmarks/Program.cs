using BenchmarkDotNet.Running;

namespace NetSolve.Benchmarks;

/// <summary>Runs the benchmarks chosen on the command line, e.g. <c>--filter '*' --job short</c>.</summary>
public static class Program
{
    /// <summary>Every benchmark class in this assembly is found by the switcher; add a class, it is listed.</summary>
    public static void Main(string[] args) => BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
}
