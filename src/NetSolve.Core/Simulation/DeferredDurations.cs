using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

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

    // One entry per histogram while there are at least HintFrom of them (empty otherwise): see Flush.
    private readonly HistogramHeader[] _headers;
    private readonly int[] _owners = new int[Capacity];
    private readonly double[] _durations = new double[Capacity];
    private int _count;

    /// <param name="histograms">Where the durations are counted: the owner passed to <see cref="Record"/> indexes it.</param>
    public DeferredDurations(DurationHistogram[] histograms)
    {
        _histograms = histograms;
        _headers = histograms.Length < HintFrom ? [] : new HistogramHeader[histograms.Length];
    }

    /// <summary>Durations recorded and not yet counted.</summary>
    public int Pending => _count;

    /// <summary>Records <paramref name="duration"/> for histogram <paramref name="owner"/>; it is counted by the next <see cref="Flush"/> at the latest.</summary>
    public void Record(int owner, double duration)
    {
        int k = _count;
        _owners[k] = owner;
        _durations[k] = duration;
        _count = k + 1;
        if (_count == Capacity)
        {
            Count();
        }
    }

    /// <summary>Counts every recorded duration in its histogram. Call before the histograms are read.</summary>
    public void Flush()
    {
        Count();
        var headers = _headers;
        var histograms = _histograms;
        for (int i = 0; i < headers.Length; i++)
        {
            if (headers[i].Pairs is not null)
            {
                histograms[i].CommitAppends(headers[i].Next);
            }
        }

        Array.Clear(headers);
    }

    /// <summary>Counts the buffer: in the histograms, or (many histograms, sparse) appended through their headers.</summary>
    /// <remarks>
    /// With many histograms each count waits on cache misses in turn: the header in the flat table, then the line of
    /// the pairs where the count is appended and the pairs' first line (see <see cref="DurationHistogram"/>). So the header is hinted
    /// 2 × <see cref="Ahead"/> durations before it is counted and the pairs' line <see cref="Ahead"/> before
    /// (<see cref="CachePrefetch"/>), each step reading only what the step before brought in. A histogram that is
    /// dense, inserts in order or has a full array is counted by its object (its appended counts counted first), and
    /// its header read again. With fewer than <see cref="HintFrom"/> histograms there are no misses to hide.
    /// </remarks>
    private void Count()
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

        var headers = _headers;
        for (int k = 0; k < count; k++)
        {
            if (k + (2 * Ahead) < count)
            {
                CachePrefetch.Element(headers, owners[k + (2 * Ahead)]);
            }

            if (k + Ahead < count)
            {
                ref var ahead = ref headers[owners[k + Ahead]];
                if (ahead.Pairs is uint[] pairs && ahead.Next < ahead.Limit)
                {
                    // Writing the count checks first that the array is there, which reads its first line.
                    CachePrefetch.Object(pairs);
                    CachePrefetch.KnownElement(pairs, ahead.Next);
                }
                else
                {
                    var histogram = histograms[owners[k + Ahead]];
                    CachePrefetch.Object(histogram);
                }
            }

            ref var header = ref headers[owners[k]];
            double duration = durations[k];
            if (header.Next < header.Limit && duration > 0.0 && duration <= double.MaxValue)
            {
                // Next < Limit: the header holds the pairs, at least Limit long.
                Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(header.Pairs!), header.Next) = DurationHistogram.AppendedPair(duration);
                header.Next++;
                continue;
            }

            var owner = histograms[owners[k]];
            owner.CommitAppends(header.Next);
            owner.Record(duration);
            header.Pairs = owner.AppendWindow(out header.Next, out header.Limit);
        }

        _count = 0;
    }
}
