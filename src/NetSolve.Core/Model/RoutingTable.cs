using System.Runtime.CompilerServices;

namespace NetSolve.Model;

/// <summary>
/// The routes of a network indexed by unit position, in compressed rows: the routes out of unit i are
/// entries <c>Offsets[i]</c> to <c>Offsets[i+1] - 1</c> of <see cref="Targets"/> and <see cref="Probabilities"/>.
/// </summary>
/// <remarks>Memory grows with the number of routes, never with units squared. Immutable after construction.</remarks>
public sealed class RoutingTable
{
    private RoutingTable(int[] offsets, int[] targets, double[] probabilities, double[] externalPerHour)
    {
        Offsets = offsets;
        Targets = targets;
        Probabilities = probabilities;
        ExternalPerHour = externalPerHour;
    }

    /// <summary>Number of units.</summary>
    public int UnitCount => ExternalPerHour.Count;

    /// <summary>Row starts, length <see cref="UnitCount"/> + 1.</summary>
    public IReadOnlyList<int> Offsets { get; }

    /// <summary>Destination unit positions.</summary>
    public IReadOnlyList<int> Targets { get; }

    /// <summary>Routing probabilities, aligned with <see cref="Targets"/>.</summary>
    public IReadOnlyList<double> Probabilities { get; }

    /// <summary>External arrivals per hour at each unit.</summary>
    public IReadOnlyList<double> ExternalPerHour { get; }

    // The rules check and the solver both need the table of the same network: built once per network object
    // (a network is immutable; a what-if is a new object with a table of its own).
    private static readonly ConditionalWeakTable<Network, RoutingTable> Tables = new();

    /// <summary>Builds the table from a validated network (once per network object; the table is immutable).</summary>
    public static RoutingTable Build(Network network)
    {
        ArgumentNullException.ThrowIfNull(network);
        return Tables.GetValue(network, Create);
    }

    private static RoutingTable Create(Network network)
    {
        var index = network.BuildIndex();
        int n = network.Units.Length;
        var external = new double[n];
        foreach (var arrival in network.Arrivals)
        {
            external[index[arrival.UnitId]] += arrival.PerHour;
        }

        var counts = new int[n + 1];
        foreach (var route in network.Routes)
        {
            counts[index[route.From] + 1]++;
        }

        for (int i = 0; i < n; i++)
        {
            counts[i + 1] += counts[i];
        }

        var next = (int[])counts.Clone();
        var targets = new int[network.Routes.Length];
        var probabilities = new double[network.Routes.Length];
        foreach (var route in network.Routes)
        {
            int slot = next[index[route.From]]++;
            targets[slot] = index[route.To];
            probabilities[slot] = route.Probability;
        }

        return new RoutingTable(counts, targets, probabilities, external);
    }

    /// <summary>The probability of leaving the network after unit <paramref name="unit"/>: 1 minus its routes, never negative.</summary>
    public double ExitProbability(int unit)
    {
        double total = 0.0;
        for (int k = Offsets[unit]; k < Offsets[unit + 1]; k++)
        {
            total += Probabilities[k];
        }

        return total >= 1.0 - Tolerances.ProbabilitySum ? 0.0 : 1.0 - total;
    }

    /// <summary>Units a patient can be at: those with external arrivals and those reached from them by a positive route.</summary>
    public bool[] ReachedUnits()
    {
        var reached = new bool[UnitCount];
        var stack = new Stack<int>();
        for (int i = 0; i < UnitCount; i++)
        {
            if (ExternalPerHour[i] > 0.0)
            {
                reached[i] = true;
                stack.Push(i);
            }
        }

        while (stack.Count > 0)
        {
            int unit = stack.Pop();
            for (int k = Offsets[unit]; k < Offsets[unit + 1]; k++)
            {
                int target = Targets[k];
                if (Probabilities[k] > 0.0 && !reached[target])
                {
                    reached[target] = true;
                    stack.Push(target);
                }
            }
        }

        return reached;
    }
}
