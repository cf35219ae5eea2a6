namespace NetSolve.Simulation;

/// <summary>The sparse form of a histogram: counts appended, merged into the sorted pairs, or moved to the dense form.</summary>
internal sealed partial class DurationHistogram
{
    /// <summary>
    /// Appends one count of bucket <paramref name="key"/> after the pairs, settling them first when the array is full;
    /// false when the histogram should turn dense instead.
    /// </summary>
    /// <remarks>
    /// Appending reads and writes one cache line, where an insertion in order searched the pairs (branches that the
    /// processor cannot predict) and moved half of them. Settling then sorts the appended counts and merges them in,
    /// so a count costs a few steps of a sequential merge (see <see cref="MakeRoom"/>).
    /// </remarks>
    private bool AppendSparse(long key)
    {
        if (!_nearlyFull && _sparseCount == _sparse.Length && !MakeRoom())
        {
            return false;
        }

        if (_nearlyFull)
        {
            return AddSparse(key, 1);
        }

        _sparse[_sparseCount++] = ((uint)key << CountBits) | 1u;
        return true;
    }

    /// <summary>
    /// Settles the pairs of a full array; when that leaves less than a sixteenth of it free, the histogram inserts
    /// each count in order from then on (<see cref="AddSparse"/>) until the array grows; false to turn dense.
    /// </summary>
    /// <remarks>
    /// So the array grows only when its buckets fill it, as with insertions alone, and the arrays keep the lengths they
    /// had (a network of 100,000 units holds 100,000 of them: growing at seven eighths or fifteen sixteenths full
    /// instead raised the peak of a whole run by 20 MB and 12 MB, measured); and a histogram whose buckets are nearly
    /// all counted already does not merge its whole array for every count.
    /// </remarks>
    private bool MakeRoom()
    {
        if (_sortedCount != _sparseCount && !Merge())
        {
            return false;
        }

        int length = _sparse.Length;
        _nearlyFull = length - _sparseCount < Math.Max(1, length >> 4);
        return true;
    }

    /// <summary>
    /// Sorts the appended counts and merges them into the sorted pairs, one pair per bucket; false (with every count
    /// still held, some buckets in two pairs) when a bucket's count would not fit its 14 bits.
    /// </summary>
    private bool Merge()
    {
        int sorted = _sortedCount;
        int added = _sparseCount - sorted;
        Span<uint> tail = stackalloc uint[SparseBuckets];
        tail = tail[..added];
        _sparse.AsSpan(sorted, added).CopyTo(tail);
        tail.Sort();

        // Buckets counted more than once since the last merge: one pair each.
        int distinct = 0;
        for (int k = 0; k < added; k++)
        {
            if (distinct > 0 && (tail[distinct - 1] >> CountBits) == (tail[k] >> CountBits) && (tail[distinct - 1] & SparseCountMask) + (tail[k] & SparseCountMask) <= SparseCountMask)
            {
                tail[distinct - 1] += tail[k] & SparseCountMask;
            }
            else
            {
                tail[distinct++] = tail[k];
            }
        }

        // Merged from the back, so that the sorted pairs move only once; a bucket in both adds its counts.
        var pairs = _sparse;
        int i = sorted - 1;
        int j = distinct - 1;
        int write = sorted + distinct - 1;
        bool fits = true;
        while (j >= 0)
        {
            uint fromTail = tail[j];
            if (i >= 0 && (pairs[i] >> CountBits) > (fromTail >> CountBits))
            {
                pairs[write--] = pairs[i--];
            }
            else if (i >= 0 && (pairs[i] >> CountBits) == (fromTail >> CountBits) && (pairs[i] & SparseCountMask) + (fromTail & SparseCountMask) <= SparseCountMask)
            {
                pairs[write--] = pairs[i--] + (fromTail & SparseCountMask);
                j--;
            }
            else
            {
                fits &= i < 0 || (pairs[i] >> CountBits) != (fromTail >> CountBits);
                pairs[write--] = fromTail;
                j--;
            }
        }

        // Pairs [0, i] stay where they are; the merged ones sit in (write, sorted + distinct).
        int start = write + 1;
        int end = sorted + distinct;
        if (start > i + 1)
        {
            Array.Copy(pairs, start, pairs, i + 1, end - start);
        }

        _sparseCount = i + 1 + (end - start);
        _sortedCount = _sparseCount;
        for (int k = 1; k < distinct && fits; k++)
        {
            fits = (tail[k - 1] >> CountBits) != (tail[k] >> CountBits);
        }

        return fits;
    }

    /// <summary>Adds <paramref name="count"/> to bucket <paramref name="key"/> in whichever form the histogram has.</summary>
    private void AddToBucket(long key, long count)
    {
        if (!_isDense && !AddSparse(key, count))
        {
            TurnDense();
        }

        if (_isDense)
        {
            OctaveFor((int)(key >> SubBucketBits))[key & (BucketsPerOctave - 1)] += count;
        }
    }

    /// <summary>Adds to a sparse bucket, inserting it in order if new; false when that does not fit the sparse form.</summary>
    private bool AddSparse(long key, long count)
    {
        int low = 0;
        int high = _sparseCount;
        while (low < high)
        {
            int middle = (int)((uint)(low + high) >> 1);
            if ((_sparse[middle] >> CountBits) < key)
            {
                low = middle + 1;
            }
            else
            {
                high = middle;
            }
        }

        if (low < _sparseCount && _sparse[low] >> CountBits == key)
        {
            if ((_sparse[low] & SparseCountMask) + count > SparseCountMask)
            {
                return false;
            }

            _sparse[low] += (uint)count;
            _sortedCount = _sparseCount;
            return true;
        }

        if (_sparseCount == SparseBuckets || count > SparseCountMask)
        {
            return false;
        }

        if (_sparseCount == _sparse.Length)
        {
            // Half as much again rather than twice: a network of 100,000 units holds 100,000 of these arrays, and
            // doubling left a third of them unused on average.
            Array.Resize(ref _sparse, Math.Min(SparseBuckets, Math.Max(4, _sparse.Length + (_sparse.Length >> 1))));
            _nearlyFull = false;
        }

        Array.Copy(_sparse, low, _sparse, low + 1, _sparseCount - low);
        _sparse[low] = ((uint)key << CountBits) | (uint)count;
        _sparseCount++;
        _sortedCount = _sparseCount;
        return true;
    }

    /// <summary>Moves the sparse buckets into octaves; from then on the histogram stays dense.</summary>
    private void TurnDense()
    {
        var sparse = _sparse;
        int count = _sparseCount;
        _sparse = [];
        _sparseCount = 0;
        _sortedCount = 0;
        _isDense = true;
        for (int k = 0; k < count; k++)
        {
            long key = sparse[k] >> CountBits;
            OctaveFor((int)(key >> SubBucketBits))[key & (BucketsPerOctave - 1)] += sparse[k] & SparseCountMask;
        }
    }
}
