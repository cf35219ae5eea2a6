using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using NetSolve.Analysis;
using NetSolve.Solving;
using NetSolve.Tests.Analysis;

namespace NetSolve.Tests.Targets;

public sealed class CostedBudgetAllocationTests
{
    private static readonly double[] CostChoices = [1.0, 1.5, 2.0, 2.5, 3.0];

    [Property(MaxTest = 120)]
    public Property The_dynamic_programme_equals_brute_force_on_small_networks() =>
        // Source: exhaustive search over every way to spend the budget (brute force), on random small networks.
        Prop.ForAll(Gen.Choose(1, int.MaxValue - 1).ToArbitrary(), seed =>
        {
            var random = new Random(seed);
            int count = 2 + random.Next(2);
            var units = Enumerable.Range(0, count)
                .Select(k => (FormattableString.Invariant($"u{k}"), 1 + random.Next(4), 0.2 + random.NextDouble()))
                .ToArray();
            var arrivals = units.Select(u => (u.Item1, (0.3 + (0.9 * random.NextDouble())) * u.Item2 / u.Item3)).ToArray();
            var costs = units.ToDictionary(u => u.Item1, _ => CostChoices[random.Next(CostChoices.Length)], StringComparer.Ordinal);
            var solution = NetworkSolver.Solve(SmallNetworks.Build(units, arrivals));
            int budget = random.Next(9);
            var plan = CostedBudgetAllocation.Allocate(solution, budget, costs);
            double? best = BruteForce(solution, budget, [.. units.Select(u => costs[u.Item1])]);
            if (best is null)
            {
                return plan.After is null && plan.Impossible is not null;
            }

            double found = plan.After!.Units.Sum(unit => unit.MeanQueue!.Value);
            return Math.Abs(found - best.Value) <= 1e-9 * Math.Max(1.0, best.Value) && plan.Spent <= budget + 1e-9;
        });

    [Fact]
    public void A_cheap_unit_gets_the_servers_a_greedy_by_count_would_give_a_dear_one()
    {
        // Exact by hand: budget 2; ward (a = 2.7 on 3 servers, cost 2) or lab (a = 1.8 on 2, cost 1).
        // Lq(M/M/c) from Erlang C: ward 3 → 4 servers cuts Lq by more than lab 2 → 3, but lab can take 2 servers
        // (2 → 4) for the same money, and the dynamic programme compares every split.
        var network = SmallNetworks.Build([("ward", 3, 1.0), ("lab", 2, 1.0)], [("ward", 2.7), ("lab", 1.8)]);
        var solution = NetworkSolver.Solve(network);
        var costs = new Dictionary<string, double>(StringComparer.Ordinal) { ["ward"] = 2.0, ["lab"] = 1.0 };
        var plan = CostedBudgetAllocation.Allocate(solution, 2, costs);
        double best = BruteForce(solution, 2, [2.0, 1.0])!.Value;

        Assert.Equal(best, plan.After!.Units.Sum(unit => unit.MeanQueue!.Value), 1e-12);
    }

    /// <summary>The smallest Σ Lq over every allocation costing at most <paramref name="budget"/>; null when none is stable.</summary>
    private static double? BruteForce(NetworkSolution solution, int budget, double[] costs)
    {
        double? best = null;
        void Search(int unit, double left, double sum)
        {
            if (unit == costs.Length)
            {
                best = best is double b ? Math.Min(b, sum) : sum;
                return;
            }

            var result = solution.Units[unit];
            for (int k = 0; k * costs[unit] <= left + 1e-9; k++)
            {
                int servers = result.Unit.Servers.Count + k;
                if (result.OfferedLoad < servers)
                {
                    Search(unit + 1, left - (k * costs[unit]), sum + BudgetAllocation.MeanQueue(servers, result.OfferedLoad));
                }
            }
        }

        Search(0, budget, 0.0);
        return best;
    }
}
