using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>The routes into each unit (the routing table read backwards), for summing the flow a unit receives.</summary>
internal sealed class IncomingRoutes
{
    private readonly int[] _offsets;
    private readonly int[] _sources;
    private readonly double[] _probabilities;

    private IncomingRoutes(int[] offsets, int[] sources, double[] probabilities)
    {
        _offsets = offsets;
        _sources = sources;
        _probabilities = probabilities;
    }

    /// <summary>Reverses the routes of <paramref name="routing"/>.</summary>
    public static IncomingRoutes Build(RoutingTable routing)
    {
        int n = routing.UnitCount;
        var offsets = new int[n + 1];
        for (int k = 0; k < routing.Targets.Count; k++)
        {
            offsets[routing.Targets[k] + 1]++;
        }

        for (int j = 0; j < n; j++)
        {
            offsets[j + 1] += offsets[j];
        }

        var next = (int[])offsets.Clone();
        var sources = new int[routing.Targets.Count];
        var probabilities = new double[routing.Targets.Count];
        for (int i = 0; i < n; i++)
        {
            for (int k = routing.Offsets[i]; k < routing.Offsets[i + 1]; k++)
            {
                int slot = next[routing.Targets[k]]++;
                sources[slot] = i;
                probabilities[slot] = routing.Probabilities[k];
            }
        }

        return new IncomingRoutes(offsets, sources, probabilities);
    }

    /// <summary>Writes Σ_i p_ij·δ_i(t) into <paramref name="inflow"/>; units without a departure array send nothing.</summary>
    public void Sum(int unit, double[]?[] departures, double[] inflow)
    {
        Array.Clear(inflow);
        for (int k = _offsets[unit]; k < _offsets[unit + 1]; k++)
        {
            var from = departures[_sources[k]];
            double probability = _probabilities[k];
            if (from is null || probability == 0.0)
            {
                continue;
            }

            for (int t = 0; t < inflow.Length; t++)
            {
                inflow[t] += probability * from[t];
            }
        }
    }

    /// <summary>True when some unit with a positive route into <paramref name="unit"/> is marked in <paramref name="marked"/>.</summary>
    public bool AnySource(int unit, bool[] marked)
    {
        for (int k = _offsets[unit]; k < _offsets[unit + 1]; k++)
        {
            if (_probabilities[k] > 0.0 && marked[_sources[k]])
            {
                return true;
            }
        }

        return false;
    }
}
