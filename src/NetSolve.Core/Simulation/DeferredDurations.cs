using System.Runtime.CompilerServices;

namespace NetSolve.Simulation;

/// <summary>
/// Durations waiting to be counted in one of many histograms (one per unit), counted a few thousand at a time.
/// </summary>
/// <remarks>
/// Counting a time in unit straight away costs a cache miss on most service ends once a network has hundreds of
/// units: each unit's histogram is a few KB to 20 KB, far more in all than the processor's caches, and the event loop
/// waits for each miss in turn because the next event depends on the one before. Counted together from a small
/// buffer (48 KB), the counts do not depend on one another, so the processor works on several misses at once;
/// measured at 1,000 units (docs/performance.md), the histogram went from about 40% of the replication's profile
/// samples to 16%, and events per CPU-second rose by about 40%.
/// Counts do not depend on their order, so the histograms end exactly as if each duration had been counted at once.
/// </remarks>
internal sealed class DeferredDurations
{
    /// <summary>Durations held before they are counted: 4,096 × 12 bytes stay within the processor's second-level cache.</summary>
    public const int Capacity = 4096;

    // How many durations ahead each step of Flush hints the memory of the next.
    private const int Ahead = 8;

    // Below this many histograms they stay in cache, and the hints would cost more than the misses they hide.
    private const int HintFrom = 256;

    private readonly DurationHistogram[] _histograms;
    private readonly int[] _owners = new int[Capacity];
    private readonly double[] _durations = new double[Capacity];
    private int _count;

    /// <param name="histograms">Where the durations are counted: the owner passed to <see cref="Record"/> indexes it.</param>
    public DeferredDurations(DurationHistogram[] histograms) => _histograms = histograms;

    /// <summary>Durations recorded and not yet counted.</summary>
    public int Pending => _count;

    /// <summary>Records <paramref name="duration"/> for histogram <paramref name="owner"/>; it is counted by the next <see cref="Flush"/> at the latest.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void Record(int owner, double duration)
    {
        int k = _count;
        _owners[k] = owner;
        _durations[k] = duration;
        _count = k + 1;
        if (_count == Capacity)
        {
            Flush();
        }
    }

    /// <summary>Counts every recorded duration in its histogram. Call before the histograms are read.</summary>
    /// <remarks>
    /// Each count waits on up to three cache misses in turn (the histogram's place in the array, the histogram, its
    /// counts; a sparse histogram appends its count after its pairs, one line, see <see cref="DurationHistogram"/>).
    /// So the three are hinted <see cref="Ahead"/>, 2 × and 3 × <see cref="Ahead"/> durations
    /// before they are counted (<see cref="CachePrefetch"/>), each step reading only what the step before brought in;
    /// with fewer than <see cref="HintFrom"/> histograms there are no misses to hide, and nothing is hinted.
    /// </remarks>
    public void Flush()
    {
        var histograms = _histograms;
        var owners = _owners;
        var durations = _durations;
        int count = _count;
        if (histograms.Length < HintFrom)
        {
            for (int k = 0; k < count; k++)
            {
                histograms[owners[k]].Record(durations[k]);
            }

            _count = 0;
            return;
        }

        for (int k = 0; k < count; k++)
        {
            if (k + (3 * Ahead) < count)
            {
                CachePrefetch.Element(histograms, owners[k + (3 * Ahead)]);
            }

            if (k + (2 * Ahead) < count)
            {
                CachePrefetch.Object(histograms[owners[k + (2 * Ahead)]]);
            }

            if (k + Ahead < count)
            {
                histograms[owners[k + Ahead]].Prefetch(durations[k + Ahead]);
            }

            histograms[owners[k]].Record(durations[k]);
        }

        _count = 0;
    }
}
