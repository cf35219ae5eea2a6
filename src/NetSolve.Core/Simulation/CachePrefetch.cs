using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics.X86;

namespace NetSolve.Simulation;

/// <summary>
/// Asks the processor to start loading a cache line that will be read soon, without waiting for it: a hint, which
/// changes no value and may be dropped (it does nothing where the instruction is not available).
/// </summary>
/// <remarks>
/// Where the addresses of many independent reads are known ahead (counting a buffer of durations in their histograms),
/// hinting them a few reads ahead lets their cache misses overlap; the processor would otherwise find them only when
/// it reaches each read, and a mispredicted branch between reads (a binary search) throws away what it had started.
/// A moving collection cannot make a hint unsafe: the address is only a hint, never read or written through.
/// </remarks>
internal static class CachePrefetch
{
    /// <summary>Hints the line holding <paramref name="array"/>[<paramref name="index"/>]; nothing when the index is outside the array.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static unsafe void Element<T>(T[] array, int index)
    {
        if (Sse.IsSupported && (uint)index < (uint)array.Length)
        {
            Sse.Prefetch0(Unsafe.AsPointer(ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(array), index)));
        }
    }

    /// <summary>
    /// Hints the line holding <paramref name="array"/>[<paramref name="index"/>] without reading the array's length,
    /// which <see cref="Element"/> does and which, for an array not yet in cache, is itself a miss that the processor
    /// waits for. The caller knows that the index is inside the array (a hint outside it would change nothing anyway:
    /// the instruction never faults).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static unsafe void KnownElement<T>(T[] array, int index)
    {
        if (Sse.IsSupported)
        {
            Sse.Prefetch0(Unsafe.AsPointer(ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(array), index)));
        }
    }

    /// <summary>Hints the first line of <paramref name="instance"/>: its type and its first fields.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static unsafe void Object(object instance)
    {
        if (Sse.IsSupported)
        {
            Sse.Prefetch0((void*)Unsafe.As<object, nint>(ref instance));
        }
    }
}
