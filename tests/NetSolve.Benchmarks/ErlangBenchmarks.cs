using BenchmarkDotNet.Attributes;
using NetSolve.Solving;

namespace NetSolve.Benchmarks;

/// <summary>One Erlang C evaluation at c = 100,000 and ρ = 0.9999. Target (issue "Core"): under 1 ms.</summary>
public class ErlangBenchmarks
{
    [Benchmark(Description = "Erlang C, c = 100,000, rho = 0.9999")]
    public double WaitProbabilityAtHundredThousandServers() => ErlangFormulas.WaitProbability(100_000, 99_990.0);
}
