using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Diagnostics;
using NetSolve.Model;

namespace NetSolve.Analysis;

/// <summary>
/// Finds units that patients come back to often. Routing is Markov: where a patient goes next depends only on the
/// unit they leave, so a return route (imaging back to emergency for review) makes the patient a new emergency
/// patient, and emergency's routes apply again. A planner who wrote "15% are admitted" then gets 15% of every visit,
/// about 30% of patients when each comes twice. The warning names the loop and the visits, and the fix.
/// </summary>
/// <remarks>
/// The mean number of visits to unit u of a patient who starts at u is N_uu, the diagonal of the fundamental matrix
/// N = (I − P)⁻¹ of the absorbing routing chain (Kemeny and Snell, Finite Markov Chains, 1960, theorem 3.2.4); it is
/// 1 / (1 − r) with r the chance of ever returning. Every path from u back to u stays within u's strongly connected
/// component, so N_uu is found from that component alone: one dense inversion per component (components larger
/// than <see cref="LargestComponent"/> units are skipped, as no planner's loop is that size). The likeliest way back
/// is a shortest path under −log of the route fractions. Thread-safe.
/// </remarks>
public static class ReturnLoops
{
    /// <summary>
    /// Visits per patient at or above which a unit is reported: a chance of 20% or more of coming back, so that
    /// every route out of the unit applies a quarter again as often as written.
    /// </summary>
    public const double VisitsThreshold = 1.25;

    /// <summary>Strongly connected components larger than this are not inverted.</summary>
    public const int LargestComponent = 400;

    /// <summary>One finding per loop (strongly connected set of units) with a unit at or above <see cref="VisitsThreshold"/>, headed by the unit visited most.</summary>
    public static ImmutableArray<ReturnLoop> Find(Network network)
    {
        ArgumentNullException.ThrowIfNull(network);
        var next = PositiveRoutes(RoutingTable.Build(network));

        var loops = ImmutableArray.CreateBuilder<ReturnLoop>();
        foreach (var component in StronglyConnected.Components(next))
        {
            bool cyclic = component.Length > 1 || next[component[0]].Any(edge => edge.To == component[0]);
            if (!cyclic || component.Length > LargestComponent)
            {
                continue;
            }

            double[] visits = VisitsPerPatient(component, next);
            var over = Enumerable.Range(0, component.Length)
                .Where(k => visits[k] >= VisitsThreshold)
                .OrderByDescending(k => visits[k])
                .ToList();
            if (over.Count == 0)
            {
                continue;
            }

            int head = component[over[0]];
            var (cycle, probability) = LikeliestWayBack(head, component, next);
            loops.Add(new ReturnLoop(
                network.Units[head].Id,
                visits[over[0]],
                [.. cycle.Select(i => network.Units[i].Id)],
                probability,
                [.. over.Skip(1).Select(k => (network.Units[component[k]].Id, visits[k]))]));
        }

        return loops.ToImmutable();
    }

    /// <summary>
    /// The positive routes out of each unit, in the file's order: read from the routing table the rules already built
    /// for this network (no look-up of unit names, each list made at its final size).
    /// </summary>
    private static List<(int To, double Probability)>[] PositiveRoutes(RoutingTable routing)
    {
        int n = routing.UnitCount;
        var next = new List<(int To, double Probability)>[n];
        for (int from = 0; from < n; from++)
        {
            int start = routing.Offsets[from];
            int end = routing.Offsets[from + 1];
            var routes = new List<(int To, double Probability)>(end - start);
            for (int e = start; e < end; e++)
            {
                if (routing.Probabilities[e] > 0.0)
                {
                    routes.Add((routing.Targets[e], routing.Probabilities[e]));
                }
            }

            next[from] = routes;
        }

        return next;
    }

    /// <summary>The findings of <see cref="Find"/> as warnings located at <paramref name="fileName"/>.</summary>
    public static ImmutableArray<Diagnostic> Warnings(Network network, string fileName)
    {
        ArgumentNullException.ThrowIfNull(fileName);
        return [.. Find(network).Select(loop => Diagnostic.Warning(DiagnosticCodes.ReturnLoop, new SourceLocation(fileName, 0, 0), loop.UnitId, Describe(network, loop)))];
    }

    /// <summary>One line: the loop, the visits, what that does to the unit's routes, and the fix.</summary>
    public static string Describe(Network network, ReturnLoop loop)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(loop);
        var culture = CultureInfo.InvariantCulture;
        string text = string.Create(culture,
            $"patients come back to this unit ({string.Join(" -> ", loop.Cycle)}: {loop.CycleProbability:0.#%} of those leaving it), so each one who comes visits it {loop.VisitsPerPatient:0.##} times on average and its routes apply on every visit");
        var shown = network.Routes
            .Where(route => route.From == loop.UnitId && !loop.Cycle.Contains(route.To, StringComparer.Ordinal))
            .MaxBy(route => route.Probability);
        if (shown is not null)
        {
            text += string.Create(culture,
                $": its {shown.Probability:0.#%} route to '{shown.To}' is followed {shown.Probability * loop.VisitsPerPatient * 100:0.#} times per 100 of its patients");
        }

        if (loop.OtherUnits.Length > 0)
        {
            text += "; in the same loop " + string.Join(", ", loop.OtherUnits.Select(other => string.Create(culture, $"'{other.UnitId}' {other.VisitsPerPatient:0.##} visits")));
        }

        return text + "; if the return is a review, route it to a separate review unit or give returning patients their own group (docs/network-file.md, 'Return routes')";
    }

    /// <summary>N_uu for each unit of the component: the diagonal of (I − P_C)⁻¹ by Gauss–Jordan elimination with partial pivoting.</summary>
    private static double[] VisitsPerPatient(int[] component, List<(int To, double Probability)>[] next)
    {
        int m = component.Length;
        var position = new Dictionary<int, int>(m);
        for (int k = 0; k < m; k++)
        {
            position[component[k]] = k;
        }

        var a = new double[m, 2 * m];
        for (int k = 0; k < m; k++)
        {
            a[k, k] = 1.0;
            a[k, m + k] = 1.0;
            foreach (var (to, probability) in next[component[k]])
            {
                if (position.TryGetValue(to, out int column))
                {
                    a[k, column] -= probability;
                }
            }
        }

        for (int col = 0; col < m; col++)
        {
            int pivot = col;
            for (int row = col + 1; row < m; row++)
            {
                if (Math.Abs(a[row, col]) > Math.Abs(a[pivot, col]))
                {
                    pivot = row;
                }
            }

            if (!(Math.Abs(a[pivot, col]) > 1e-12))
            {
                // Patients could never leave this loop: the structure rules refuse that, so there is nothing to add.
                return new double[m];
            }

            for (int j = 0; j < 2 * m; j++)
            {
                (a[col, j], a[pivot, j]) = (a[pivot, j], a[col, j]);
            }

            double scale = a[col, col];
            for (int j = 0; j < 2 * m; j++)
            {
                a[col, j] /= scale;
            }

            for (int row = 0; row < m; row++)
            {
                double factor = a[row, col];
                if (row == col || factor == 0.0)
                {
                    continue;
                }

                for (int j = 0; j < 2 * m; j++)
                {
                    a[row, j] -= factor * a[col, j];
                }
            }
        }

        return [.. Enumerable.Range(0, m).Select(k => a[k, m + k])];
    }

    /// <summary>The most probable way from <paramref name="start"/> back to itself within the component (Dijkstra on −log p).</summary>
    private static (List<int> Cycle, double Probability) LikeliestWayBack(int start, int[] component, List<(int To, double Probability)>[] next)
    {
        var inComponent = component.ToHashSet();
        var best = new Dictionary<int, double>();
        var previous = new Dictionary<int, int>();
        var queue = new PriorityQueue<int, double>();
        foreach (var (to, probability) in next[start].Where(edge => inComponent.Contains(edge.To)))
        {
            int key = to == start ? -1 : to;
            if (!best.TryGetValue(key, out double known) || probability > known)
            {
                best[key] = probability;
                previous[key] = start;
                queue.Enqueue(key, -Math.Log(probability));
            }
        }

        var done = new HashSet<int>();
        while (queue.TryDequeue(out int unit, out _))
        {
            if (unit == -1 || !done.Add(unit))
            {
                if (unit == -1)
                {
                    break;
                }

                continue;
            }

            foreach (var (to, probability) in next[unit].Where(edge => inComponent.Contains(edge.To)))
            {
                int key = to == start ? -1 : to;
                double reach = best[unit] * probability;
                if (!best.TryGetValue(key, out double known) || reach > known)
                {
                    best[key] = reach;
                    previous[key] = unit;
                    queue.Enqueue(key, -Math.Log(reach));
                }
            }
        }

        // -1 stands for the start reached again; walk back from it.
        var path = new List<int> { start };
        for (int at = previous[-1]; at != start; at = previous[at])
        {
            path.Add(at);
        }

        path.Add(start);
        path.Reverse();
        return (path, best[-1]);
    }
}
