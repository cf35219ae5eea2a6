namespace NetSolve.Rendering.Map;

/// <summary>
/// Layers and orders the units of a large map in time close to linear in units and lines, where the layered layout
/// of MSAGL grows with units × layers.
/// </summary>
/// <remarks>
/// Cycles are broken at the back edges of a depth-first search (Tarjan, "Depth-first search and linear graph
/// algorithms", SIAM Journal on Computing 1(2), 1972, pp. 146-160): a line to a unit still on the search's path
/// closes a cycle and is a return. The search starts at the units patients arrive at, busiest first, and follows
/// each unit's heaviest line first, so the main pathways run forward. Layers are longest paths over the other
/// lines, so every line that is not a return runs to a later layer. Units are then ordered within each layer by a
/// few sweeps of the barycentre heuristic (Sugiyama, Tagawa and Toda, "Methods for visual understanding of
/// hierarchical system structures", IEEE Transactions on Systems, Man, and Cybernetics 11(2), 1981, pp. 109-125),
/// each line weighted by its flow: O(lines + units log units) a sweep. Ties go to the unit first reached, so the
/// same network always gives the same order.
/// </remarks>
internal static class LargeMapLayering
{
    /// <summary>Down-and-up pairs of barycentre sweeps: most of the gain comes in the first few.</summary>
    private const int OrderingRounds = 4;

    /// <param name="unitCount">Number of units; lines name them by index.</param>
    /// <param name="lines">Lines as (source index, target index, patients per hour).</param>
    /// <param name="arrivalPerHour">External arrivals per hour at each unit: where the search starts.</param>
    public static MapLayering Compute(int unitCount, IReadOnlyList<(int From, int To, double PerHour)> lines, IReadOnlyList<double> arrivalPerHour)
    {
        ArgumentNullException.ThrowIfNull(lines);
        ArgumentNullException.ThrowIfNull(arrivalPerHour);
        var outgoing = Outgoing(unitCount, lines);
        var (isReturn, discovered) = BackEdges(unitCount, lines, outgoing, arrivalPerHour);
        int[] layer = LongestPathLayers(unitCount, lines, isReturn);
        int[] component = Components(unitCount, lines, discovered);

        int componentCount = component.Length == 0 ? 0 : component.Max() + 1;
        var groups = new List<List<int>>[componentCount];
        for (int c = 0; c < componentCount; c++)
        {
            groups[c] = [];
        }

        // Within a layer, units start in the order the search reached them: a pathway's units start side by side.
        var byDiscovery = Enumerable.Range(0, unitCount).OrderBy(unit => discovered[unit]).ToList();
        foreach (int unit in byDiscovery)
        {
            var layers = groups[component[unit]];
            while (layers.Count <= layer[unit])
            {
                layers.Add([]);
            }

            layers[layer[unit]].Add(unit);
        }

        Order(unitCount, lines, isReturn, groups);
        return new MapLayering(
            isReturn,
            component,
            layer,
            groups.Select(layers => (IReadOnlyList<IReadOnlyList<int>>)layers.Select(units => (IReadOnlyList<int>)units).ToList()).ToList());
    }

    /// <summary>Each unit's lines, heaviest first, ties to the target first in the file.</summary>
    private static List<int>[] Outgoing(int unitCount, IReadOnlyList<(int From, int To, double PerHour)> lines)
    {
        var outgoing = new List<int>[unitCount];
        for (int u = 0; u < unitCount; u++)
        {
            outgoing[u] = [];
        }

        for (int k = 0; k < lines.Count; k++)
        {
            outgoing[lines[k].From].Add(k);
        }

        foreach (var list in outgoing)
        {
            list.Sort((a, b) => lines[b].PerHour.CompareTo(lines[a].PerHour) is var byFlow and not 0 ? byFlow : lines[a].To.CompareTo(lines[b].To) is var byTarget and not 0 ? byTarget : a.CompareTo(b));
        }

        return outgoing;
    }

    /// <summary>The back edges of a depth-first search (iterative, so a 2,000-unit pathway cannot overflow the stack), and the order units were reached in.</summary>
    private static (bool[] IsReturn, int[] Discovered) BackEdges(int unitCount, IReadOnlyList<(int From, int To, double PerHour)> lines, List<int>[] outgoing, IReadOnlyList<double> arrivalPerHour)
    {
        const byte Unseen = 0;
        const byte OnPath = 1;
        const byte Done = 2;
        var state = new byte[unitCount];
        var discovered = new int[unitCount];
        var isReturn = new bool[lines.Count];
        int reached = 0;
        var path = new Stack<(int Unit, int Next)>();
        var roots = Enumerable.Range(0, unitCount)
            .OrderByDescending(unit => arrivalPerHour[unit] > 0.0 ? 1 : 0)
            .ThenByDescending(unit => arrivalPerHour[unit])
            .ThenBy(unit => unit);
        foreach (int root in roots)
        {
            if (state[root] != Unseen)
            {
                continue;
            }

            state[root] = OnPath;
            discovered[root] = reached++;
            path.Push((root, 0));
            while (path.Count > 0)
            {
                var (unit, next) = path.Pop();
                if (next == outgoing[unit].Count)
                {
                    state[unit] = Done;
                    continue;
                }

                path.Push((unit, next + 1));
                int line = outgoing[unit][next];
                int target = lines[line].To;
                if (state[target] == OnPath)
                {
                    isReturn[line] = true;
                }
                else if (state[target] == Unseen)
                {
                    state[target] = OnPath;
                    discovered[target] = reached++;
                    path.Push((target, 0));
                }
            }
        }

        return (isReturn, discovered);
    }

    /// <summary>Longest-path layers over the lines that are not returns, in topological order (Kahn's algorithm).</summary>
    private static int[] LongestPathLayers(int unitCount, IReadOnlyList<(int From, int To, double PerHour)> lines, bool[] isReturn)
    {
        var incoming = new int[unitCount];
        var forward = new List<int>[unitCount];
        for (int u = 0; u < unitCount; u++)
        {
            forward[u] = [];
        }

        for (int k = 0; k < lines.Count; k++)
        {
            if (!isReturn[k])
            {
                forward[lines[k].From].Add(lines[k].To);
                incoming[lines[k].To]++;
            }
        }

        var layer = new int[unitCount];
        var ready = new Queue<int>(Enumerable.Range(0, unitCount).Where(unit => incoming[unit] == 0));
        while (ready.Count > 0)
        {
            int unit = ready.Dequeue();
            foreach (int target in forward[unit])
            {
                layer[target] = Math.Max(layer[target], layer[unit] + 1);
                if (--incoming[target] == 0)
                {
                    ready.Enqueue(target);
                }
            }
        }

        return layer;
    }

    /// <summary>Connected groups of units (lines taken both ways), numbered in the order the search reached them.</summary>
    private static int[] Components(int unitCount, IReadOnlyList<(int From, int To, double PerHour)> lines, int[] discovered)
    {
        var parent = Enumerable.Range(0, unitCount).ToArray();
        int Find(int unit)
        {
            while (parent[unit] != unit)
            {
                parent[unit] = parent[parent[unit]];
                unit = parent[unit];
            }

            return unit;
        }

        foreach (var (from, to, _) in lines)
        {
            int a = Find(from);
            int b = Find(to);
            if (a != b)
            {
                // The root is the unit reached first, so numbering by roots follows the search.
                if (discovered[a] < discovered[b])
                {
                    parent[b] = a;
                }
                else
                {
                    parent[a] = b;
                }
            }
        }

        var number = new Dictionary<int, int>();
        var component = new int[unitCount];
        foreach (int unit in Enumerable.Range(0, unitCount).OrderBy(unit => discovered[unit]))
        {
            int root = Find(unit);
            if (!number.TryGetValue(root, out int id))
            {
                id = number.Count;
                number[root] = id;
            }

            component[unit] = id;
        }

        return component;
    }

    /// <summary>Barycentre sweeps, down then up, each unit moved towards the flow-weighted mean place of the units it shares lines with in the layers already swept.</summary>
    private static void Order(int unitCount, IReadOnlyList<(int From, int To, double PerHour)> lines, bool[] isReturn, List<List<int>>[] groups)
    {
        var sources = new List<(int Other, double Weight)>[unitCount];
        var targets = new List<(int Other, double Weight)>[unitCount];
        for (int u = 0; u < unitCount; u++)
        {
            sources[u] = [];
            targets[u] = [];
        }

        // Each line also counts a little for itself, so lines that carry few patients still pull their units together.
        double floor = Math.Max(1e-9, lines.Select(line => line.PerHour).DefaultIfEmpty(0.0).Max() * 0.05);
        for (int k = 0; k < lines.Count; k++)
        {
            var (from, to, perHour) = lines[k];
            if (!isReturn[k])
            {
                sources[to].Add((from, perHour + floor));
                targets[from].Add((to, perHour + floor));
            }
        }

        var place = new double[unitCount];
        foreach (var layers in groups)
        {
            foreach (var units in layers)
            {
                Centre(units, place);
            }
        }

        for (int round = 0; round < OrderingRounds; round++)
        {
            foreach (var layers in groups)
            {
                for (int l = 1; l < layers.Count; l++)
                {
                    Sweep(layers[l], sources, place);
                }

                for (int l = layers.Count - 2; l >= 0; l--)
                {
                    Sweep(layers[l], targets, place);
                }
            }
        }
    }

    private static void Sweep(List<int> units, List<(int Other, double Weight)>[] neighbours, double[] place)
    {
        var keyed = units.Select((unit, at) =>
        {
            double weight = 0.0;
            double sum = 0.0;
            foreach (var (other, w) in neighbours[unit])
            {
                weight += w;
                sum += w * place[other];
            }

            return (Unit: unit, Key: weight > 0.0 ? sum / weight : place[unit], At: at);
        }).OrderBy(entry => entry.Key).ThenBy(entry => entry.At).ToList();
        for (int i = 0; i < keyed.Count; i++)
        {
            units[i] = keyed[i].Unit;
        }

        Centre(units, place);
    }

    /// <summary>Places a layer's units one apart, centred on zero, so layers of different widths line up on their middles.</summary>
    private static void Centre(List<int> units, double[] place)
    {
        for (int i = 0; i < units.Count; i++)
        {
            place[units[i]] = i - ((units.Count - 1) / 2.0);
        }
    }
}
