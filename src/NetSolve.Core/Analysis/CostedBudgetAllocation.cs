using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>
/// Places extra servers of different costs within a budget where they cut the mean time in the network most: exactly,
/// by dynamic programming over the budget.
/// </summary>
/// <remarks>
/// <para>
/// The task is to minimise Σ Lq_i(c_i) subject to Σ cost_i · added_i ≤ budget (mean time in network is Σ L_i / γ by
/// Little's law, L_i = Lq_i + a_i, and flows do not depend on servers). It is separable: each unit's term depends on its
/// own servers only. With one cost for all, greedy marginal analysis is optimal (Fox 1966, Management Science 13,
/// 210–216, with the convexity of Dyer &amp; Proll 1977, Management Science 23, 1019–1022) and
/// <see cref="BudgetAllocation"/> answers. With different costs a unit-by-unit greedy is not optimal (a knapsack), so
/// the budget is cut into steps of the greatest common divisor of the costs read to the hundredth, and
/// best_j(b) = min over k of [Lq_j(c_j + k) + best_{j−1}(b − k·w_j)] is filled unit by unit (Bellman 1957, Dynamic
/// Programming, ch. 1, the allocation process); the optimum is read back from the choices. An unstable allocation
/// has Lq = +∞, so the servers that make each unit stable are taken first whenever the budget allows.
/// </para>
/// <para>Work O(Σ_j S · S / w_j) for S budget steps; refused above <see cref="MaxWork"/>. Ties go to fewer servers at the later unit. Thread-safe.</para>
/// </remarks>
public static class CostedBudgetAllocation
{
    /// <summary>The most inner steps of the dynamic programme (and cells of its choice table) accepted.</summary>
    public const long MaxWork = 200_000_000;

    /// <summary>Costs are read to this many parts of one (hundredths).</summary>
    private const double Resolution = 100.0;

    /// <summary>Places servers costing <paramref name="costPerServer"/> (default 1 each) within <paramref name="budget"/>.</summary>
    /// <param name="solution">The network solved as given.</param>
    /// <param name="budget">The most the added servers may cost in all; not negative.</param>
    /// <param name="costPerServer">Cost of one server per unit id (default 1); positive, every id names a unit.</param>
    public static BudgetPlan Allocate(NetworkSolution solution, int budget, IReadOnlyDictionary<string, double> costPerServer)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(costPerServer);
        ArgumentOutOfRangeException.ThrowIfNegative(budget);
        var network = solution.Network;
        var candidates = Enumerable.Range(0, network.Units.Length)
            .Where(i => !solution.Units[i].Unit.Servers.IsUnlimited && solution.Units[i].ArrivalsPerHour > 0.0).ToList();
        var costs = candidates.Select(i => costPerServer.GetValueOrDefault(network.Units[i].Id, 1.0)).ToArray();
        if (costs.Distinct().Count() <= 1)
        {
            double each = costs.Length == 0 ? 1.0 : costs[0];
            var plan = BudgetAllocation.Allocate(solution, (int)Math.Floor((budget / each) + 1e-9));
            return plan with { Budget = budget, Spent = plan.Placed * each, Impossible = plan.Impossible is null ? null : Reason(solution, candidates, costs, budget) };
        }

        long[] weights = [.. costs.Select(cost => (long)Math.Round(cost * Resolution))];
        if (costs.Where((cost, j) => weights[j] < 1 || Math.Abs((cost * Resolution) - weights[j]) > 1e-6 * Math.Max(1.0, cost * Resolution)).Any())
        {
            return Refused(solution, candidates, "with --budget, costs are read to the hundredth: write each with at most two decimals, at least 0.01", budget);
        }

        long step = weights.Aggregate(0L, Gcd);
        int steps = (int)Math.Min(int.MaxValue, (long)Math.Round(budget * Resolution) / step);
        int[] w = [.. weights.Select(weight => (int)(weight / step))];
        long work = w.Sum(wj => (long)(steps + 1) * ((steps / wj) + 1));
        if (work > MaxWork)
        {
            return Refused(solution, candidates, string.Create(CultureInfo.InvariantCulture,
                $"a budget of {budget} in steps of {step / Resolution:0.##} is too large for the exact search ({work:0.#e+0} steps, at most {MaxWork:0.#e+0}); use costs with a larger common step or a smaller budget"), budget);
        }

        var best = new double[steps + 1];
        var choices = new int[candidates.Count][];
        for (int j = 0; j < candidates.Count; j++)
        {
            var result = solution.Units[candidates[j]];
            int current = result.Unit.Servers.Count;
            int most = (int)Math.Min(steps / w[j], Servers.MaxCount - (long)current);
            var queue = new double[most + 1];
            for (int k = 0; k <= most; k++)
            {
                queue[k] = result.OfferedLoad < current + k ? BudgetAllocation.MeanQueue(result, current + k) : double.PositiveInfinity;
            }

            var next = new double[steps + 1];
            choices[j] = new int[steps + 1];
            for (int b = 0; b <= steps; b++)
            {
                double value = double.PositiveInfinity;
                int choice = 0;
                for (int k = 0; k <= most && (long)k * w[j] <= b; k++)
                {
                    double total = queue[k] + best[b - (k * w[j])];
                    if (total < value)
                    {
                        value = total;
                        choice = k;
                    }
                }

                next[b] = value;
                choices[j][b] = choice;
            }

            best = next;
        }

        if (candidates.Count > 0 && double.IsPositiveInfinity(best[steps]))
        {
            return Refused(solution, candidates, Reason(solution, candidates, costs, budget), budget);
        }

        var added = new int[candidates.Count];
        for (int j = candidates.Count - 1, b = steps; j >= 0; j--)
        {
            added[j] = choices[j][b];
            b -= added[j] * w[j];
        }

        var units = network.Units.ToBuilder();
        for (int j = 0; j < candidates.Count; j++)
        {
            units[candidates[j]] = units[candidates[j]] with { Servers = Servers.Of(units[candidates[j]].Servers.Count + added[j]) };
        }

        var flows = solution.Units.Select(unit => unit.ArrivalsPerHour).ToArray();
        var after = NetworkSolver.FromFlows(network with { Units = units.ToImmutable() }, flows, solution.StrainThreshold);
        return new BudgetPlan(budget, Allocations(solution, candidates, added), solution, after, null)
        {
            Spent = candidates.Select((_, j) => added[j] * costs[j]).Sum(),
        };
    }

    private static BudgetPlan Refused(NetworkSolution solution, List<int> candidates, string reason, int budget) =>
        new(budget, Allocations(solution, candidates, new int[candidates.Count]), solution, null, reason);

    private static string Reason(NetworkSolution solution, List<int> candidates, double[] costs, int budget)
    {
        var shortBy = candidates.Select((i, j) => (solution.Units[i], Need: Forced(solution.Units[i]), Cost: costs[j])).Where(p => p.Need > 0).ToList();
        double needed = shortBy.Sum(p => p.Need * p.Cost);
        return string.Create(CultureInfo.InvariantCulture,
            $"a budget of {budget} cannot make every unit stable: it takes at least {needed:0.##} ({string.Join(", ", shortBy.Select(p => string.Create(CultureInfo.InvariantCulture, $"{p.Item1.Unit.Id} +{p.Need}")))})");
    }

    private static int Forced(UnitResult result) => Math.Max(0, (int)Math.Floor(result.OfferedLoad) + 1 - result.Unit.Servers.Count);

    private static ImmutableArray<UnitAllocation> Allocations(NetworkSolution solution, List<int> candidates, int[] added) =>
    [
        .. candidates.Select((i, j) => new UnitAllocation(solution.Units[i].Unit.Id, solution.Units[i].Unit.Servers.Count, added[j], Math.Min(added[j], Forced(solution.Units[i])))),
    ];

    private static long Gcd(long a, long b) => b == 0 ? a : Gcd(b, a % b);
}
