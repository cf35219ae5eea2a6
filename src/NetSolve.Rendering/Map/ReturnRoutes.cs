namespace NetSolve.Rendering.Map;

/// <summary>
/// Chooses which lines of the map are return routes: the back edges of an order of the units that keeps as much
/// flow as it can running forward, so the main pathway is never drawn as a return however small a loop it carries.
/// </summary>
/// <remarks>
/// The order is the greedy heuristic for the feedback arc set problem of Eades, Lin and Smyth ("A fast and effective
/// heuristic for the feedback arc set problem", Information Processing Letters 47(6), 1993, pp. 319-323), with each
/// line weighted by its patients per hour: sinks are taken off to the end and sources to the front; when neither is
/// left, the unit whose outgoing flow most exceeds its incoming flow goes to the front. Each unit is then moved in turn
/// to the place where the least flow runs backwards, until no move helps (a local search by insertion, common practice
/// after a greedy order). A line whose target does not
/// come after its source in that order (a repeat visit included) is a return. Ties go to the unit first in the file,
/// so the same network always gives the same map. Leaving the layout engine to break cycles by itself does not do
/// this: it counts lines, not patients, and once turned a whole elective pathway into a return because of a 5%
/// return to theatre.
/// </remarks>
internal static class ReturnRoutes
{
    /// <summary>Passes of <see cref="Improve"/> at most; each pass that moves nothing ends it sooner.</summary>
    private const int MaxPasses = 20;

    /// <summary>For each line, whether it is a return route.</summary>
    /// <param name="unitCount">Number of units; lines name them by index.</param>
    /// <param name="lines">Lines as (source index, target index, patients per hour).</param>
    public static bool[] Choose(int unitCount, IReadOnlyList<(int From, int To, double PerHour)> lines)
    {
        ArgumentNullException.ThrowIfNull(lines);
        int[] position = Order(unitCount, lines);
        var isReturn = new bool[lines.Count];
        for (int k = 0; k < lines.Count; k++)
        {
            isReturn[k] = position[lines[k].To] <= position[lines[k].From];
        }

        return isReturn;
    }

    /// <summary>The position of every unit in the order that keeps the heaviest flow forward.</summary>
    internal static int[] Order(int unitCount, IReadOnlyList<(int From, int To, double PerHour)> lines)
    {
        ArgumentNullException.ThrowIfNull(lines);
        var outgoing = new double[unitCount];
        var incoming = new double[unitCount];
        var outCount = new int[unitCount];
        var inCount = new int[unitCount];
        foreach (var (from, to, perHour) in lines)
        {
            if (from == to)
            {
                continue; // A repeat visit is a return in every order and says nothing about where the unit goes.
            }

            outgoing[from] += perHour;
            incoming[to] += perHour;
            outCount[from]++;
            inCount[to]++;
        }

        var removed = new bool[unitCount];
        var front = new List<int>(unitCount);
        var back = new List<int>(unitCount);
        int left = unitCount;

        void Remove(int unit)
        {
            removed[unit] = true;
            left--;
            foreach (var (from, to, perHour) in lines)
            {
                if (from == to || (from != unit && to != unit) || removed[from == unit ? to : from])
                {
                    continue;
                }

                if (from == unit)
                {
                    incoming[to] -= perHour;
                    inCount[to]--;
                }
                else
                {
                    outgoing[from] -= perHour;
                    outCount[from]--;
                }
            }
        }

        while (left > 0)
        {
            bool changed = true;
            while (changed)
            {
                changed = false;
                for (int u = 0; u < unitCount; u++)
                {
                    if (!removed[u] && outCount[u] == 0)
                    {
                        back.Add(u);
                        Remove(u);
                        changed = true;
                    }
                }

                for (int u = 0; u < unitCount; u++)
                {
                    if (!removed[u] && inCount[u] == 0)
                    {
                        front.Add(u);
                        Remove(u);
                        changed = true;
                    }
                }
            }

            if (left == 0)
            {
                break;
            }

            int best = -1;
            for (int u = 0; u < unitCount; u++)
            {
                if (!removed[u] && (best < 0 || outgoing[u] - incoming[u] > outgoing[best] - incoming[best]))
                {
                    best = u;
                }
            }

            front.Add(best);
            Remove(best);
        }

        back.Reverse();
        var order = front.Concat(back).ToList();
        Improve(order, lines);
        var position = new int[unitCount];
        for (int p = 0; p < order.Count; p++)
        {
            position[order[p]] = p;
        }

        return position;
    }

    /// <summary>
    /// Moves each unit in turn to the place in <paramref name="order"/> where the least flow runs backwards, until no
    /// move helps or <see cref="MaxPasses"/> passes are done: the greedy order can leave a loop closed by a main line
    /// when a small return elsewhere tipped a choice.
    /// </summary>
    private static void Improve(List<int> order, IReadOnlyList<(int From, int To, double PerHour)> lines)
    {
        int n = order.Count;
        // Each line also counts a little for itself, so among orders with the same flow backwards the one with fewer
        // lines backwards wins (lines that carry nobody included).
        double lineWeight = Math.Max(1e-9, lines.Select(line => line.PerHour).DefaultIfEmpty(0.0).Max() * 1e-6);
        var outLines = Enumerable.Range(0, n).Select(_ => new List<(int Other, double Weight)>()).ToArray();
        var inLines = Enumerable.Range(0, n).Select(_ => new List<(int Other, double Weight)>()).ToArray();
        foreach (var (from, to, perHour) in lines)
        {
            if (from != to)
            {
                outLines[from].Add((to, perHour + lineWeight));
                inLines[to].Add((from, perHour + lineWeight));
            }
        }

        var rank = new int[n];
        var outAt = new double[n];
        var inAt = new double[n];
        for (int pass = 0; pass < MaxPasses; pass++)
        {
            bool moved = false;
            for (int unit = 0; unit < n; unit++)
            {
                int slot = order.IndexOf(unit);
                order.RemoveAt(slot);
                for (int r = 0; r < order.Count; r++)
                {
                    rank[order[r]] = r;
                }

                Array.Clear(outAt);
                Array.Clear(inAt);
                double incomingTotal = 0.0;
                foreach (var (other, weight) in outLines[unit])
                {
                    outAt[rank[other]] += weight;
                }

                foreach (var (other, weight) in inLines[unit])
                {
                    inAt[rank[other]] += weight;
                    incomingTotal += weight;
                }

                // Placed before order[i]: its lines to units ranked below i and from units ranked i or above run backwards.
                double outBack = 0.0;
                double inBack = incomingTotal;
                double currentCost = double.NaN;
                double bestCost = double.PositiveInfinity;
                int best = slot;
                for (int i = 0; i <= order.Count; i++)
                {
                    double cost = outBack + inBack;
                    if (i == slot)
                    {
                        currentCost = cost;
                    }

                    if (cost < bestCost)
                    {
                        (bestCost, best) = (cost, i);
                    }

                    if (i < order.Count)
                    {
                        outBack += outAt[i];
                        inBack -= inAt[i];
                    }
                }

                if (bestCost < currentCost - (lineWeight / 2.0))
                {
                    order.Insert(best, unit);
                    moved = true;
                }
                else
                {
                    order.Insert(slot, unit);
                }
            }

            if (!moved)
            {
                return;
            }
        }
    }
}
