using NetSolve.Model;

namespace NetSolve.Simulation;

/// <summary>
/// Follows each patient through the network's journeys (<see cref="Network.Journeys"/>) within one replication: when
/// they enter a journey's set of units and when they leave it, recording the time between per journey and group.
/// Mutable, single-threaded, one per replication; the engine has none when the network defines no journey, so the
/// event loop pays nothing for them.
/// </summary>
/// <remarks>
/// A journey starts when the patient arrives at a unit of the set (after any diversion) while outside it, and ends
/// at the first moment they are outside it again: after service they go on to a unit outside the set, leave the
/// network, or are turned away by a full unit. A later return into the set starts a new journey. Journeys that end
/// after the warm-up are recorded, like the times in unit; journeys still open when the run ends are not.
/// </remarks>
internal sealed class JourneyTracker
{
    private const double Outside = -1.0;

    private readonly int _journeyCount;
    private readonly int _unitCount;
    private readonly int _groupCount;
    private readonly bool[] _member;
    private readonly double[][] _overHours;
    private readonly DurationHistogram[] _times;
    private readonly long[] _counts;
    private readonly double[] _sums;
    private readonly long[][] _over;
    private readonly double _warmupEnd;
    private double[] _startByPatient = [];

    private JourneyTracker(Network network, int groupCount, double warmupEnd)
    {
        _journeyCount = network.Journeys.Length;
        _unitCount = network.Units.Length;
        _groupCount = groupCount;
        _warmupEnd = warmupEnd;
        var index = network.BuildIndex();
        _member = new bool[_journeyCount * _unitCount];
        _overHours = new double[_journeyCount][];
        for (int j = 0; j < _journeyCount; j++)
        {
            var journey = network.Journeys[j];
            foreach (string id in journey.UnitIds)
            {
                _member[(j * _unitCount) + index[id]] = true;
            }

            _overHours[j] = [.. journey.OverHours];
        }

        int slots = _journeyCount * groupCount;
        _times = new DurationHistogram[slots];
        _counts = new long[slots];
        _sums = new double[slots];
        _over = new long[slots][];
        for (int s = 0; s < slots; s++)
        {
            _times[s] = new DurationHistogram();
            _over[s] = new long[_overHours[s / groupCount].Length];
        }
    }

    /// <summary>A tracker for <paramref name="network"/>'s journeys; null when it defines none.</summary>
    /// <param name="network">The simulated network.</param>
    /// <param name="groupCount">Groups in the compiled network, the default group (index 0) included.</param>
    /// <param name="warmupEnd">The end of the warm-up in hours: journeys ending earlier are not recorded.</param>
    public static JourneyTracker? For(Network network, int groupCount, double warmupEnd) =>
        network.Journeys.IsDefaultOrEmpty ? null : new JourneyTracker(network, groupCount, warmupEnd);

    /// <summary>The patient arrives at <paramref name="unit"/> (where they will be served) at <paramref name="now"/>.</summary>
    public void Arrive(double now, int unit, int patient, int group)
    {
        int first = patient * _journeyCount;
        if (first + _journeyCount > _startByPatient.Length)
        {
            Grow(first + _journeyCount);
        }

        for (int j = 0; j < _journeyCount; j++)
        {
            ref double start = ref _startByPatient[first + j];
            bool inside = _member[(j * _unitCount) + unit];
            if (inside && start < 0.0)
            {
                start = now;
            }
            else if (!inside && start >= 0.0)
            {
                End(now, j, group, start);
                start = Outside;
            }
        }
    }

    /// <summary>The patient leaves the network at <paramref name="now"/>, served or turned away: every open journey ends.</summary>
    public void Leave(double now, int patient, int group)
    {
        int first = patient * _journeyCount;
        if (first + _journeyCount > _startByPatient.Length)
        {
            return;
        }

        for (int j = 0; j < _journeyCount; j++)
        {
            ref double start = ref _startByPatient[first + j];
            if (start >= 0.0)
            {
                End(now, j, group, start);
                start = Outside;
            }
        }
    }

    /// <summary>What the replication recorded, for pooling across replications. Call once the replication has finished.</summary>
    public JourneyTallies Tallies() => new(_times, _counts, _sums, _over);

    private void End(double now, int journey, int group, double start)
    {
        if (now < _warmupEnd)
        {
            return;
        }

        int slot = (journey * _groupCount) + group;
        double time = now - start;
        _times[slot].Record(time);
        _counts[slot]++;
        _sums[slot] += time;
        var thresholds = _overHours[journey];
        for (int t = 0; t < thresholds.Length; t++)
        {
            if (time > thresholds[t])
            {
                _over[slot][t]++;
            }
        }
    }

    private void Grow(int needed)
    {
        int old = _startByPatient.Length;
        int size = Math.Max(needed, Math.Max(old * 2, 256 * _journeyCount));
        Array.Resize(ref _startByPatient, size);
        Array.Fill(_startByPatient, Outside, old, size - old);
    }
}
