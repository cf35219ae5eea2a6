namespace NetSolve.Simulation;

/// <summary>
/// What <see cref="DeferredDurations"/> needs to append a count to a sparse histogram without reading the histogram
/// object: its pairs' array and the part of it still free (<see cref="DurationHistogram.AppendWindow"/>). 16 bytes, one
/// per unit in a flat table, so a count waits on two reads in turn (this entry, then the pairs) rather than three.
/// </summary>
internal struct HistogramHeader
{
    /// <summary>The histogram's pairs; null until the first count.</summary>
    public uint[]? Pairs;

    /// <summary>Where the next count goes.</summary>
    public int Next;

    /// <summary>The end of the free part: no appending from outside when <see cref="Next"/> has reached it.</summary>
    public int Limit;
}
