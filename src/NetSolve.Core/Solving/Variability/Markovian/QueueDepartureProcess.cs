using MathNet.Numerics.LinearAlgebra;

namespace NetSolve.Solving;

/// <summary>
/// The departures of a queue with phase-type gaps between arrivals, c servers and phase-type service, as a
/// <see cref="MarkovianArrivalProcess"/>: the state is (patients present, arrival phase, how many busy servers are
/// in each service phase), truncated at a number present whose probability is negligible; a service completion is the
/// marked transition (the construction of M. F. Neuts, Structured Stochastic Matrices of M/G/1 Type, 1989, from memory).
/// </summary>
/// <remarks>
/// Patients are served in arrival order; one arriving to a full truncated queue is not counted (the truncation is
/// chosen so that this has negligible probability). Thread-safe: no shared state.
/// </remarks>
internal static class QueueDepartureProcess
{
    /// <summary>Number of states of the chain, without building it.</summary>
    /// <param name="arrivalPhases">Phases of the gap distribution.</param>
    /// <param name="servicePhases">Phases of the service distribution.</param>
    /// <param name="servers">Servers c, at least 1.</param>
    /// <param name="capacity">Most patients present, at least 1.</param>
    public static double StateCount(int arrivalPhases, int servicePhases, int servers, int capacity)
    {
        double states = 0.0;
        for (int present = 0; present <= capacity; present++)
        {
            states += arrivalPhases * ConfigurationCount(Math.Min(present, servers), servicePhases);
        }

        return states;
    }

    /// <summary>The departure MAP; see <see cref="StateCount"/> for its size.</summary>
    /// <param name="gaps">Gaps between arrivals (a renewal flow).</param>
    /// <param name="service">Service times.</param>
    /// <param name="servers">Servers c, at least 1.</param>
    /// <param name="capacity">Most patients present, at least 1.</param>
    public static MarkovianArrivalProcess Build(PhaseTypeDistribution gaps, PhaseTypeDistribution service, int servers, int capacity)
    {
        var configurations = new List<int[]>[servers + 1];
        var positions = new Dictionary<long, int>[servers + 1];
        for (int busy = 0; busy <= servers; busy++)
        {
            configurations[busy] = Configurations(busy, service.Phases);
            positions[busy] = [];
            for (int k = 0; k < configurations[busy].Count; k++)
            {
                positions[busy].Add(Key(configurations[busy][k], servers), k);
            }
        }

        var levelStart = new int[capacity + 2];
        for (int present = 0; present <= capacity; present++)
        {
            levelStart[present + 1] = levelStart[present] + (gaps.Phases * configurations[Math.Min(present, servers)].Count);
        }

        var chain = new ChainBuilder(levelStart[capacity + 1]);
        int State(int present, int phase, int[] configuration)
        {
            int busy = Math.Min(present, servers);
            return levelStart[present] + (phase * configurations[busy].Count) + positions[busy][Key(configuration, servers)];
        }

        for (int present = 0; present <= capacity; present++)
        {
            foreach (var configuration in configurations[Math.Min(present, servers)])
            {
                for (int phase = 0; phase < gaps.Phases; phase++)
                {
                    int from = State(present, phase, configuration);
                    AddArrivalMoves(chain, gaps, service, from, present, phase, configuration, servers, capacity, State);
                    AddServiceMoves(chain, service, from, present, phase, configuration, servers, State);
                }
            }
        }

        return chain.ToProcess();
    }

    private static void AddArrivalMoves(ChainBuilder chain, PhaseTypeDistribution gaps, PhaseTypeDistribution service, int from,
        int present, int phase, int[] configuration, int servers, int capacity, Func<int, int, int[], int> state)
    {
        for (int next = 0; next < gaps.Phases; next++)
        {
            if (next != phase)
            {
                chain.Hidden(from, state(present, next, configuration), gaps.Generator[phase, next]);
            }

            double arriving = gaps.ExitPerHour[phase] * gaps.Initial[next];
            if (arriving <= 0.0)
            {
                continue;
            }

            if (present == capacity)
            {
                chain.Hidden(from, state(present, next, configuration), arriving);
            }
            else if (present < servers)
            {
                for (int start = 0; start < service.Phases; start++)
                {
                    chain.Hidden(from, state(present + 1, next, Moved(configuration, -1, start)), arriving * service.Initial[start]);
                }
            }
            else
            {
                chain.Hidden(from, state(present + 1, next, configuration), arriving);
            }
        }
    }

    private static void AddServiceMoves(ChainBuilder chain, PhaseTypeDistribution service, int from, int present, int phase,
        int[] configuration, int servers, Func<int, int, int[], int> state)
    {
        for (int k = 0; k < service.Phases; k++)
        {
            int inPhase = configuration[k];
            if (inPhase == 0)
            {
                continue;
            }

            for (int next = 0; next < service.Phases; next++)
            {
                if (next != k)
                {
                    chain.Hidden(from, state(present, phase, Moved(configuration, k, next)), inPhase * service.Generator[k, next]);
                }
            }

            double finishing = inPhase * service.ExitPerHour[k];
            if (present > servers)
            {
                // The server takes the first patient waiting.
                for (int start = 0; start < service.Phases; start++)
                {
                    chain.Marked(from, state(present - 1, phase, Moved(configuration, k, start)), finishing * service.Initial[start]);
                }
            }
            else
            {
                chain.Marked(from, state(present - 1, phase, Moved(configuration, k, -1)), finishing);
            }
        }
    }

    /// <summary>A copy with one server less in phase <paramref name="from"/> and one more in <paramref name="to"/> (−1: none).</summary>
    private static int[] Moved(int[] configuration, int from, int to)
    {
        var moved = (int[])configuration.Clone();
        if (from >= 0)
        {
            moved[from]--;
        }

        if (to >= 0)
        {
            moved[to]++;
        }

        return moved;
    }

    private static long Key(int[] configuration, int servers)
    {
        long key = 0;
        foreach (int count in configuration)
        {
            key = (key * (servers + 1)) + count;
        }

        return key;
    }

    /// <summary>Every way of spreading <paramref name="busy"/> servers over the phases.</summary>
    private static List<int[]> Configurations(int busy, int phases)
    {
        var all = new List<int[]>();
        var current = new int[phases];
        void Fill(int phase, int left)
        {
            if (phase == phases - 1)
            {
                current[phase] = left;
                all.Add((int[])current.Clone());
                return;
            }

            for (int count = left; count >= 0; count--)
            {
                current[phase] = count;
                Fill(phase + 1, left - count);
            }
        }

        Fill(0, busy);
        return all;
    }

    /// <summary>C(busy + phases − 1, phases − 1).</summary>
    private static double ConfigurationCount(int busy, int phases)
    {
        double count = 1.0;
        for (int k = 1; k < phases; k++)
        {
            count = count * (busy + k) / k;
        }

        return count;
    }

    /// <summary>Collects the rates of a chain; each state's diagonal is set to minus its total outflow.</summary>
    private sealed class ChainBuilder(int states)
    {
        private readonly Dictionary<(int, int), double> _hidden = [];
        private readonly Dictionary<(int, int), double> _marked = [];
        private readonly double[] _outflow = new double[states];

        public void Hidden(int from, int to, double rate) => Add(_hidden, from, to, rate);

        public void Marked(int from, int to, double rate) => Add(_marked, from, to, rate);

        public MarkovianArrivalProcess ToProcess()
        {
            for (int s = 0; s < states; s++)
            {
                _hidden[(s, s)] = _hidden.GetValueOrDefault((s, s)) - _outflow[s];
            }

            return new MarkovianArrivalProcess(Sparse(_hidden), Sparse(_marked));
        }

        private void Add(Dictionary<(int, int), double> rates, int from, int to, double rate)
        {
            if (rate > 0.0)
            {
                rates[(from, to)] = rates.GetValueOrDefault((from, to)) + rate;
                _outflow[from] += rate;
            }
        }

        private Matrix<double> Sparse(Dictionary<(int, int), double> rates) =>
            Matrix<double>.Build.SparseOfIndexed(states, states, rates.Select(entry => Tuple.Create(entry.Key.Item1, entry.Key.Item2, entry.Value)));
    }
}
