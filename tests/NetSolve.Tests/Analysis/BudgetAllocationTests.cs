using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Tests.Analysis;

public sealed class BudgetAllocationTests
{
    [Fact]
    public void Marginal_allocation_equals_brute_force_on_small_networks()
    {
        // Source: exhaustive search over every split of the budget; optimality of the greedy rests on the convexity of
        // L in c (Dyer & Proll 1977, Management Science 23, 1019–1022) and marginal analysis (Fox 1966).
        var random = new Random(7);
        for (int trial = 0; trial < 60; trial++)
        {
            int count = 2 + random.Next(2);
            var units = Enumerable.Range(0, count)
                .Select(k => (FormattableString.Invariant($"u{k}"), 1 + random.Next(4), 0.2 + random.NextDouble()))
                .ToArray();
            var arrivals = units.Select(u => (u.Item1, (0.3 + (0.6 * random.NextDouble())) * u.Item2 / u.Item3)).ToArray();
            var solution = NetworkSolver.Solve(SmallNetworks.Build(units, arrivals));
            int budget = random.Next(7);
            var plan = BudgetAllocation.Allocate(solution, budget);
            double greedy = plan.After!.Totals.MeanInSystem!.Value;
            double best = BestSplit(solution, budget);
            Assert.Equal(best, greedy, 1e-9 * best);
            Assert.Equal(budget, plan.Placed);
        }
    }

    [Fact]
    public void Unstable_units_get_their_stabilising_servers_first()
    {
        // Exact by hand: a = 4.5 erlangs on 3 servers needs ⌊4.5⌋ + 1 = 5 to be stable: 2 of the 3 go there first.
        var network = SmallNetworks.Build([("ward", 3, 1.0), ("lab", 2, 1.0)], [("ward", 4.5), ("lab", 1.0)]);
        var plan = BudgetAllocation.Allocate(NetworkSolver.Solve(network), 3);
        var ward = plan.Units.Single(u => u.UnitId == "ward");
        Assert.Equal(2, ward.NeededForStability);
        Assert.True(ward.Added >= 2);
        Assert.True(plan.After!.IsStable);
    }

    [Fact]
    public void A_budget_too_small_for_stability_says_how_many_it_takes()
    {
        var network = SmallNetworks.Build([("ward", 3, 1.0)], [("ward", 4.5)]);
        var plan = BudgetAllocation.Allocate(NetworkSolver.Solve(network), 1);
        Assert.Null(plan.After);
        Assert.Equal("1 servers cannot make every unit stable: it takes at least 2 (ward +2)", plan.Impossible);
    }

    [Fact]
    public void The_mean_queue_matches_the_hand_derived_m_m_2_value()
    {
        // Exact by hand: c = 2, a = 1: C = 1/3, ρ = 0.5, Lq = C·ρ/(1 − ρ) = 1/3.
        Assert.Equal(1.0 / 3.0, BudgetAllocation.MeanQueue(2, 1.0), 1e-12);
    }

    private static double BestSplit(NetworkSolution solution, int budget)
    {
        var units = solution.Units;
        double best = double.PositiveInfinity;
        foreach (var split in Splits(units.Length, budget))
        {
            double total = 0.0;
            for (int i = 0; i < units.Length; i++)
            {
                var result = UnitMetrics.Compute(units[i].Unit with { Servers = Servers.Of(units[i].Unit.Servers.Count + split[i]) }, units[i].ArrivalsPerHour, 1.0);
                total += result.MeanInUnit ?? double.PositiveInfinity;
            }

            best = Math.Min(best, total);
        }

        return best;
    }

    private static IEnumerable<int[]> Splits(int parts, int total)
    {
        if (parts == 1)
        {
            yield return [total];
            yield break;
        }

        for (int first = 0; first <= total; first++)
        {
            foreach (var rest in Splits(parts - 1, total - first))
            {
                yield return [first, .. rest];
            }
        }
    }
}
