using BenchmarkDotNet.Attributes;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Benchmarks;

/// <summary>Speed targets of the planning questions: staffing search on 1,000 units and a growth table on 10,000.</summary>
[MemoryDiagnoser]
public class AnalysisBenchmarks
{
    private static readonly StaffingTargets Targets = new(
        MaxUtilisation: 0.6,
        MaxMeanWaitHours: 5.0 / TimeConstants.MinutesPerHour,
        WaitTail: new WaitTailTarget(0.5, 0.05));

    private Network _thousand = null!;
    private NetworkSolution _thousandSolved = null!;
    private Network _tenThousand = null!;
    private NetworkSolution _tenThousandSolved = null!;

    [GlobalSetup]
    public void Setup()
    {
        _thousand = GeneratedNetworks.Build(1_000, seed: 1);
        _thousandSolved = NetworkSolver.Solve(_thousand);
        _tenThousand = GeneratedNetworks.Build(10_000, seed: 2);
        _tenThousandSolved = NetworkSolver.Solve(_tenThousand);
    }

    /// <summary>Targets on every unit of a 1,000-unit network, from its solution.</summary>
    [Benchmark]
    public StaffingPlan Staffing_search_1000_units() => StaffingSearch.MeetTargets(_thousandSolved, Targets);

    /// <summary>The same, including solving the network first.</summary>
    [Benchmark]
    public StaffingPlan Solve_and_staffing_search_1000_units() => StaffingSearch.MeetTargets(NetworkSolver.Solve(_thousand), Targets);

    /// <summary>A 20-step growth table of a 10,000-unit network, from its solution (flows reused, not re-solved).</summary>
    [Benchmark]
    public GrowthResult Growth_table_20_steps_10000_units() => GrowthAnalysis.Run(_tenThousandSolved);

    /// <summary>The same for one arrival stream: one traffic solve (the other streams), then 20 steps.</summary>
    [Benchmark]
    public GrowthResult Stream_growth_table_20_steps_10000_units() => GrowthAnalysis.RunStream(_tenThousandSolved, "unit00000");

    /// <summary>The same, including solving the network first.</summary>
    [Benchmark]
    public GrowthResult Solve_and_growth_table_20_steps_10000_units() => GrowthAnalysis.Run(NetworkSolver.Solve(_tenThousand));

    /// <summary>Budget of 100 servers over a 1,000-unit network by marginal analysis.</summary>
    [Benchmark]
    public BudgetPlan Budget_100_servers_1000_units() => BudgetAllocation.Allocate(_thousandSolved, 100);
}
