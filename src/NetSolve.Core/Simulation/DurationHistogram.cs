using System.Runtime.CompilerServices;

namespace NetSolve.Simulation;

/// <summary>
/// Counts of durations in log-linear buckets over the whole positive range of doubles, so that no duration is ever
/// clamped, whatever its scale: a 1-second unit and a 20-day ward are counted equally well. Zero is counted exactly.
/// </summary>
/// <remarks>
/// A bucket is the double's exponent and the top <see cref="SubBucketBits"/> bits of its mantissa, read straight from
/// its bits: 128 buckets per octave, each at most 2^−7 (0.78%) of its lower edge wide, so a quantile read from the
/// buckets (interpolated linearly inside its bucket) is within 0.78% of a value of the sample that has the same rank.
/// A histogram starts sparse: the buckets it has counted, as sorted (bucket, count) pairs packed in 4 bytes each, each
/// new count appended after them and merged in when the array is full or the buckets are read (a
/// bucket key has 18 bits, leaving 14 for its count), so a unit that sees a few hundred patients in a replication
/// costs at most 4 bytes per patient, not 1 KB per octave touched (a network of 100,000 units would otherwise need
/// gigabytes). Past <see cref="SparseBuckets"/> buckets, or a count above 16,383 in one bucket, it turns dense: buckets kept per octave, an array of 128 counts (1 KB) made the first time
/// the octave is touched, the octaves a window from the lowest to the highest touched: memory grows only with the
/// range of scales seen, 1 KB per octave, at most 2,047 octaves (2 MB) for durations spanning every double,
/// typically 20-40 KB. Both forms hold the same buckets and give the same quantiles. Mutable, not thread-safe: one
/// per unit or group within a replication.
/// </remarks>
internal sealed partial class DurationHistogram
{
    /// <summary>Mantissa bits in the bucket index: 2^7 = 128 buckets per octave.</summary>
    public const int SubBucketBits = 7;

    /// <summary>The largest width of a bucket relative to its lower edge, 2^−7 (0.78%).</summary>
    public const double RelativeResolution = 1.0 / (1 << SubBucketBits);

    private const int MantissaShift = 52 - SubBucketBits;
    private const int BucketsPerOctave = 1 << SubBucketBits;

    /// <summary>Most buckets held sparse (2 KB): past them the dense form is about as small, and quicker.</summary>
    public const int SparseBuckets = 512;

    // A bucket key of a positive finite double is below 2^18 (11 exponent bits and SubBucketBits), so a pair fits 32 bits.
    private const int CountBits = 14;
    private const uint SparseCountMask = (1u << CountBits) - 1;

    private long[]?[] _octaves = [];
    private int _firstOctave;

    // While sparse (_octaves empty): bucket key << CountBits | count in the first _sparseCount entries; the first
    // _sortedCount of them sorted by key, one per bucket, the rest counted since, one per duration, in arrival order.
    private uint[] _sparse = [];
    private int _sparseCount;
    private int _sortedCount;

    // Whether counts are inserted in order rather than appended, until the array grows (see MakeRoom).
    private bool _nearlyFull;
    private bool _isDense;

    /// <summary>Whether the buckets are still held as sorted pairs rather than octave arrays.</summary>
    internal bool IsSparse => !_isDense;

    /// <summary>Durations counted, zeros included.</summary>
    public long Count { get; private set; }

    /// <summary>Durations of exactly zero.</summary>
    public long Zeros { get; private set; }

    /// <summary>Counts <paramref name="duration"/> (in any unit, the same for every call): zero or a positive finite value.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void Record(double duration)
    {
        long key = BitConverter.DoubleToInt64Bits(duration) >> MantissaShift;
        int index = (int)(key >> SubBucketBits) - _firstOctave;
        long[]? octave;
        if ((uint)index < (uint)_octaves.Length && (octave = _octaves[index]) is not null && duration > 0.0)
        {
            octave[key & (BucketsPerOctave - 1)]++;
            Count++;
            return;
        }

        RecordRarely(duration);
    }

    /// <summary>
    /// Hints the memory that counting <paramref name="duration"/> will read (see <see cref="CachePrefetch"/>): the
    /// bucket's count when dense; when sparse, the pairs, which the search and an insertion read from the middle on.
    /// The histogram object itself should have been hinted a little earlier, since its fields say where to look.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void Prefetch(double duration)
    {
        if (_isDense)
        {
            long key = BitConverter.DoubleToInt64Bits(duration) >> MantissaShift;
            int index = (int)(key >> SubBucketBits) - _firstOctave;
            if ((uint)index < (uint)_octaves.Length && _octaves[index] is long[] octave)
            {
                // Every octave holds BucketsPerOctave counts.
                CachePrefetch.KnownElement(octave, (int)(key & (BucketsPerOctave - 1)));
            }

            return;
        }

        var sparse = _sparse;
        if (_nearlyFull)
        {
            // Inserted in order: the search and the move read from the middle on. 16 pairs to a 64-byte line; at most
            // 8 lines, evenly spaced, for the largest arrays.
            int count = _sparseCount;
            int step = Math.Max(16, count >> 3);
            for (int k = 0; k < count; k += step)
            {
                // The first count pairs are inside the array.
                CachePrefetch.KnownElement(sparse, k);
            }
        }
        else if (sparse.Length > 0)
        {
            // Appended after the last pair: one line (the last one when the array is full and is settled first).
            CachePrefetch.KnownElement(sparse, Math.Min(_sparseCount, sparse.Length - 1));
        }
    }

    /// <summary>Adds every count of <paramref name="other"/> to this one (pooling replications).</summary>
    public void Add(DurationHistogram other)
    {
        ArgumentNullException.ThrowIfNull(other);
        other.Settle();
        Settle();
        Zeros += other.Zeros;
        Count += other.Count;
        for (int k = 0; k < other._sparseCount; k++)
        {
            AddToBucket(other._sparse[k] >> CountBits, other._sparse[k] & SparseCountMask);
        }

        for (int i = 0; i < other._octaves.Length; i++)
        {
            if (other._octaves[i] is long[] counts)
            {
                if (!_isDense)
                {
                    TurnDense();
                }

                long[] mine = OctaveFor(other._firstOctave + i);
                for (int b = 0; b < BucketsPerOctave; b++)
                {
                    mine[b] += counts[b];
                }
            }
        }
    }

    /// <summary>
    /// The <paramref name="fraction"/> quantile (0 to 1): the duration with rank ⌈fraction · count⌉, interpolated
    /// linearly inside its bucket; 0 when that rank falls among the zeros; NaN when nothing was counted.
    /// </summary>
    public double Quantile(double fraction)
    {
        if (Count == 0)
        {
            return double.NaN;
        }

        double target = fraction * Count;
        if (target <= Zeros)
        {
            return 0.0;
        }

        double below = Zeros;
        double last = 0.0;
        foreach (var (low, high, count) in Buckets())
        {
            last = high;
            if (below + count >= target)
            {
                double within = Math.Clamp((target - below) / count, 0.0, 1.0);
                return low + (within * (high - low));
            }

            below += count;
        }

        return last;
    }

    /// <summary>
    /// The quantiles of <paramref name="fractions"/> into <paramref name="quantiles"/>, each exactly as
    /// <see cref="Quantile"/> gives it, from one walk of the buckets when the fractions ascend (a unit's four
    /// percentiles were four walks).
    /// </summary>
    // Optimized from its first call: a one-time pass over 100,000 units spent most of its time here in tier-0 and
    // instrumented copies (docs/performance.md).
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public void Quantiles(ReadOnlySpan<double> fractions, Span<double> quantiles)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(quantiles.Length, fractions.Length, nameof(quantiles));
        for (int i = 1; i < fractions.Length; i++)
        {
            if (!(fractions[i - 1] <= fractions[i]))
            {
                for (int j = 0; j < fractions.Length; j++)
                {
                    quantiles[j] = Quantile(fractions[j]);
                }

                return;
            }
        }

        if (Count == 0)
        {
            quantiles[..fractions.Length].Fill(double.NaN);
            return;
        }

        // The same sums as Quantile's, in the same order: a later fraction's bucket is never before an earlier one's.
        int next = 0;
        while (next < fractions.Length && fractions[next] * Count <= Zeros)
        {
            quantiles[next++] = 0.0;
        }

        double below = Zeros;
        double last = 0.0;
        foreach (var (low, high, count) in Buckets())
        {
            if (next == fractions.Length)
            {
                return;
            }

            last = high;
            while (next < fractions.Length && below + count >= fractions[next] * Count)
            {
                double within = Math.Clamp(((fractions[next] * Count) - below) / count, 0.0, 1.0);
                quantiles[next++] = low + (within * (high - low));
            }

            below += count;
        }

        while (next < fractions.Length)
        {
            quantiles[next++] = last;
        }
    }

    /// <summary>
    /// The share of the counted durations at most <paramref name="duration"/>, interpolated linearly inside its bucket
    /// as <see cref="Quantile"/> is (so the two are inverse to each other within a bucket); NaN when nothing was counted.
    /// </summary>
    public double ShareAtMost(double duration)
    {
        if (Count == 0)
        {
            return double.NaN;
        }

        if (!(duration > 0.0))
        {
            return duration == 0.0 ? (double)Zeros / Count : 0.0;
        }

        double below = Zeros;
        foreach (var (low, high, count) in Buckets())
        {
            if (duration < high)
            {
                return duration <= low ? below / Count : (below + (count * (duration - low) / (high - low))) / Count;
            }

            below += count;
        }

        return 1.0;
    }

    /// <summary>
    /// Bytes held by the counts (to bound what a run keeps): the sparse pairs' array while sparse, else 1 KB per touched
    /// octave and the window over them. Sparse histograms count too: a run of many small replications keeps mostly those.
    /// </summary>
    public long Bytes => (_sparse.Length * (long)sizeof(uint)) + (_octaves.Length * (long)sizeof(long)) + (_octaves.Count(octave => octave is not null) * (long)BucketsPerOctave * sizeof(long));

    /// <summary>The bucket holding <paramref name="duration"/> (positive and finite): keys order the buckets, and key + 1 is the next one.</summary>
    public static long BucketOf(double duration) => BitConverter.DoubleToInt64Bits(duration) >> MantissaShift;

    /// <summary>The lower edge of the bucket <paramref name="key"/>, which is the upper edge of bucket key − 1.</summary>
    public static double LowerEdge(long key) => BitConverter.Int64BitsToDouble(key << MantissaShift);

    /// <summary>Every bucket holding a count, shortest first, with its edges.</summary>
    public IEnumerable<(double Low, double High, long Count)> NonEmptyBuckets()
    {
        foreach (var bucket in Buckets())
        {
            yield return bucket;
        }
    }

    /// <summary>
    /// The buckets of <see cref="NonEmptyBuckets"/> as a walk held in a struct: the walk shared by quantiles, shares and
    /// pooling. A 100,000-unit result walks its histograms over a million times, and an iterator was an object each
    /// time and a call per bucket.
    /// </summary>
    public BucketWalk Buckets()
    {
        Settle();
        return new BucketWalk(this);
    }

    /// <summary>The walk of <see cref="Buckets"/>: the sparse pairs, then each dense octave's non-zero counts.</summary>
    [System.Runtime.InteropServices.StructLayout(System.Runtime.InteropServices.LayoutKind.Auto)]
    public struct BucketWalk
    {
        private readonly uint[] _sparse;
        private readonly int _sparseCount;
        private readonly long[]?[] _octaves;
        private readonly int _firstOctave;
        private int _pair;
        private int _octave;
        private int _bucket;

        internal BucketWalk(DurationHistogram histogram)
        {
            _sparse = histogram._sparse;
            _sparseCount = histogram._sparseCount;
            _octaves = histogram._octaves;
            _firstOctave = histogram._firstOctave;
            _pair = -1;
            _octave = 0;
            _bucket = -1;
            Current = default;
        }

        /// <summary>The bucket reached: its lower and upper edges and its count.</summary>
        public (double Low, double High, long Count) Current { get; private set; }

        /// <summary>The walk itself, so that it can be walked with <c>foreach</c>.</summary>
        public readonly BucketWalk GetEnumerator() => this;

        /// <summary>Moves to the next bucket holding a count; false past the last.</summary>
        // Optimized from its first call: a one-time pass over 100,000 units spent most of its time here in tier-0 and
        // instrumented copies (docs/performance.md).
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        public bool MoveNext()
        {
            if (++_pair < _sparseCount)
            {
                uint pair = _sparse[_pair];
                long key = pair >> CountBits;
                Current = (LowerEdge(key), LowerEdge(key + 1), pair & SparseCountMask);
                return true;
            }

            _pair = _sparseCount;
            for (; _octave < _octaves.Length; _octave++, _bucket = -1)
            {
                if (_octaves[_octave] is not long[] counts)
                {
                    continue;
                }

                while (++_bucket < BucketsPerOctave)
                {
                    if (counts[_bucket] != 0)
                    {
                        long key = ((long)(_firstOctave + _octave) << SubBucketBits) + _bucket;
                        Current = (LowerEdge(key), LowerEdge(key + 1), counts[_bucket]);
                        return true;
                    }
                }
            }

            return false;
        }
    }

    private void RecordRarely(double duration)
    {
        if (duration == 0.0)
        {
            Zeros++;
            Count++;
            return;
        }

        if (!(duration > 0.0) || double.IsPositiveInfinity(duration))
        {
            throw new ArgumentOutOfRangeException(nameof(duration), duration, "A duration is zero or positive and finite.");
        }

        long key = BitConverter.DoubleToInt64Bits(duration) >> MantissaShift;
        if (!_isDense && !AppendSparse(key))
        {
            TurnDense();
        }

        if (_isDense)
        {
            OctaveFor((int)(key >> SubBucketBits))[key & (BucketsPerOctave - 1)]++;
        }

        Count++;
    }

    /// <summary>
    /// Sorts the counts appended since the last time into the sorted pairs, one pair per bucket (or turns the
    /// histogram dense when they do not fit the sparse form). Reading the buckets does this first; call it once a
    /// replication has finished so that histograms read from several threads are not changed by the reading.
    /// </summary>
    public void Settle()
    {
        if (!_isDense && _sortedCount != _sparseCount && !Merge())
        {
            TurnDense();
        }
    }

    /// <summary>The counts of the octave with biased exponent <paramref name="exponent"/>, made (and the window widened) if new.</summary>
    private long[] OctaveFor(int exponent)
    {
        if (_octaves.Length == 0)
        {
            _firstOctave = exponent;
            _octaves = new long[]?[1];
        }
        else if (exponent < _firstOctave)
        {
            var wider = new long[]?[_octaves.Length + (_firstOctave - exponent)];
            Array.Copy(_octaves, 0, wider, _firstOctave - exponent, _octaves.Length);
            _octaves = wider;
            _firstOctave = exponent;
        }
        else if (exponent - _firstOctave >= _octaves.Length)
        {
            Array.Resize(ref _octaves, exponent - _firstOctave + 1);
        }

        return _octaves[exponent - _firstOctave] ??= new long[BucketsPerOctave];
    }
}
