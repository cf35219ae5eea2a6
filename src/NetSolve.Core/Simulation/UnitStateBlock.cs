using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace NetSolve.Simulation;

/// <summary>
/// The units' <see cref="UnitState"/>s, each starting on a 64-byte boundary (a cache line), so that the fields most
/// events touch, the first 64 bytes of a state, are one line rather than two. Fixed size, not thread-safe.
/// </summary>
/// <remarks>
/// A managed array of structs starts 16 bytes into its object, and objects are only 8-byte aligned, so an array of
/// <see cref="UnitState"/> cannot be aligned by itself: at 112 bytes a state straddled a line boundary in its hot part
/// three times in four. The states live instead in a byte array on the pinned-object heap (never moved by the
/// collector, so its address stays aligned), read from the first 64-byte boundary in it. <see cref="UnitState"/>
/// holds no references, so the collector need not see its fields.
/// </remarks>
internal sealed class UnitStateBlock
{
    /// <summary>Bytes in a cache line of the processors NetSolve is built for (x64 and Arm64 alike).</summary>
    private const int LineBytes = 64;

    private readonly byte[] _bytes;
    private readonly int _start;

    /// <summary>Makes <paramref name="count"/> zeroed states.</summary>
    public unsafe UnitStateBlock(int count)
    {
        _bytes = GC.AllocateArray<byte>(checked((count * Unsafe.SizeOf<UnitState>()) + LineBytes), pinned: true);
        nint address = (nint)Unsafe.AsPointer(ref MemoryMarshal.GetArrayDataReference(_bytes));
        _start = (int)(-address & (LineBytes - 1));
        Length = count;
    }

    /// <summary>How many states: one per unit.</summary>
    public int Length { get; }

    /// <summary>Hints the first line of <paramref name="unit"/>'s state, the one a service start or end reads (<see cref="CachePrefetch"/>).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void Prefetch(int unit) => CachePrefetch.KnownElement(_bytes, _start + ((uint)unit < (uint)Length ? unit * Unsafe.SizeOf<UnitState>() : 0));

    /// <summary>The state of <paramref name="unit"/>, 0 to <see cref="Length"/> − 1.</summary>
    public ref UnitState this[int unit]
    {
        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        get
        {
            if ((uint)unit >= (uint)Length)
            {
                throw new ArgumentOutOfRangeException(nameof(unit), unit, "No such unit.");
            }

            return ref Unsafe.As<byte, UnitState>(ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(_bytes), _start + (unit * Unsafe.SizeOf<UnitState>())));
        }
    }
}
