using System.Diagnostics;
using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace NetSolve.Simulation;

/// <summary>
/// Pending events by time: a tournament tree over a pool of event slots. Each slot holds one pending event (or none);
/// each inner node of a complete binary tree over the slots holds the earliest time below it and the slot it belongs
/// to, so the root names the earliest event. Adding, replacing or removing an event changes one slot and recomputes its path to
/// the root: O(log n). Allocates only when the pool grows past the most events ever pending at once. Not thread-safe.
/// </summary>
/// <remarks>
/// Why this shape rather than a heap: walking up from a slot visits fixed places (node / 2, its sibling node ^ 1),
/// whatever the times, so the loads of a whole path can start at once and only the running minimum waits on them,
/// where a heap's walk down must compare one level before it knows where the next is; and each node keeps its
/// winner's time beside its slot, so a level needs no second load through the slot. Times are stored as their IEEE
/// bit patterns, which order like the times themselves for times ≥ 0 and +∞ (the mark of a free slot): the minimum is
/// then picked with integer arithmetic, not branches, since which of two times is earlier is a coin toss the branch
/// predictor would lose about half the time. Free slots are reused last-freed first, so the slot of the event just
/// handled, whose path is in cache, is usually the next one taken.
/// </remarks>
internal sealed class EventQueue
{
    private static readonly long FreeKey = BitConverter.DoubleToInt64Bits(double.PositiveInfinity);

    // Node n of the tree (1 is the root; leaves are _leaves + slot) holds the earliest key below it and its slot.
    private long[] _keys = [];
    private int[] _winners = [];
    private EventPayload[] _payloads = [];
    private int[] _free = [];
    private int _freeCount;
    private int _leaves;

    // Whether a removal hints the next removal's path as well as its payload: only where the tree misses the cache.
    private readonly bool _hintPaths;

    /// <summary>
    /// Creates an empty queue with room for <paramref name="capacity"/> events. <paramref name="hintPaths"/>: whether
    /// each removal hints the path of the next one (for large networks, whose pending events outgrow the caches).
    /// </summary>
    public EventQueue(int capacity, bool hintPaths = false)
    {
        _hintPaths = hintPaths;
        Resize((int)BitOperations.RoundUpToPowerOf2((uint)Math.Max(capacity, 16)));
    }

    /// <summary>Events pending.</summary>
    public int Count { get; private set; }

    /// <summary>The time of the earliest pending event, or +∞ when the queue is empty.</summary>
    public double EarliestTime => BitConverter.Int64BitsToDouble(_keys[1]);

    /// <summary>The earliest pending event; the queue must not be empty.</summary>
    public SimulationEvent Earliest
    {
        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        get
        {
            ref readonly var payload = ref _payloads[_winners[1]];
            return payload.At(BitConverter.Int64BitsToDouble(_keys[1]));
        }
    }

    /// <summary>
    /// The unit, patient and group of the earliest pending event, read without its time (stale values when the queue
    /// is empty): enough to hint what its handling will read.
    /// </summary>
    public (int Unit, int Patient, int Group, int NextUnit) EarliestTarget
    {
        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        get
        {
            ref readonly var payload = ref _payloads[_winners[1]];
            return (payload.Unit, payload.Patient, payload.Group, payload.NextUnit);
        }
    }

    /// <summary>Adds an event; its time must not be negative.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void Push(in SimulationEvent item)
    {
        if (_freeCount == 0)
        {
            Resize(_leaves * 2);
        }

        int slot = _free[--_freeCount];
        Count++;
        Store(slot, item);
        ReplayAdded(slot);
    }

    /// <summary>Removes and returns the earliest event; the queue must not be empty.</summary>
    public SimulationEvent Pop()
    {
        var top = Earliest;
        RemoveEarliest();
        return top;
    }

    /// <summary>
    /// Removes the earliest event; the queue must not be empty. Hints the slot and path of the event that is now
    /// earliest (<see cref="CachePrefetch"/>): an event loop that removes an event before handling it then finds the
    /// next one in cache, its misses overlapped with the handling (unless the handling schedules an even earlier event).
    /// </summary>
    public void RemoveEarliest()
    {
        int slot = _winners[1];
        _keys[_leaves + slot] = FreeKey;
        _free[_freeCount++] = slot;
        Count--;
        Replay(slot);
        int next = _winners[1];
        CachePrefetch.Element(_payloads, next);
        if (_hintPaths)
        {
            HintPath(next);
        }
    }

    /// <summary>
    /// Hints what removing the event in <paramref name="slot"/> will read besides its payload: its key's line (written
    /// free, then read with its sibling's) and the lowest levels of its path, which in a queue of a million events
    /// are misses (the upper levels, shared by every path, stay in cache).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private void HintPath(int slot)
    {
        int node = _leaves + slot;
        CachePrefetch.Element(_keys, node);
        CachePrefetch.Element(_keys, node >> 1);
        CachePrefetch.Element(_winners, node >> 1);
        CachePrefetch.Element(_keys, node >> 2);
        CachePrefetch.Element(_winners, node >> 2);
    }

    /// <summary>
    /// Removes the earliest event and adds <paramref name="item"/> in its slot, with one walk up the tree: the event
    /// loop's commonest step, since most events schedule exactly one more (the "hold" operation of event-list studies).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void ReplaceEarliest(in SimulationEvent item) => Set(_winners[1], item);

    /// <summary>The pending events, in no particular order.</summary>
    public IEnumerable<SimulationEvent> Pending()
    {
        for (int slot = 0; slot < _leaves; slot++)
        {
            long key = _keys[_leaves + slot];
            if (key != FreeKey)
            {
                yield return _payloads[slot].At(BitConverter.Int64BitsToDouble(key));
            }
        }
    }

    /// <summary>Removes every event, keeping the arrays.</summary>
    public void Clear()
    {
        _keys.AsSpan().Fill(FreeKey);
        Count = 0;
        Resize(_leaves);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private void Set(int slot, in SimulationEvent item)
    {
        Store(slot, item);
        Replay(slot);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private void Store(int slot, in SimulationEvent item)
    {
        Debug.Assert(item.Time >= 0.0, "Keys order like times only for times that are not negative.");
        _keys[_leaves + slot] = BitConverter.DoubleToInt64Bits(item.Time);
        _payloads[slot] = new EventPayload(item.Unit, item.Patient, item.Group, item.NextUnit, item.UnitArrival, item.ServiceStart);
    }

    /// <summary>
    /// Recomputes the winners on the path from <paramref name="slot"/>, which was free, up to the first node whose
    /// winner does not change: the nodes above it see the same two children as before.
    /// </summary>
    /// <remarks>
    /// A new event is usually later than most pending ones (it is scheduled a service time ahead), so it loses within
    /// a level or two to an earlier event in a neighbouring subtree, where the winner stored before it came is found
    /// again: adding an event then costs a few levels instead of the whole path. The nodes above keep the winners they
    /// had, which a walk to the root would also give them unless two of their children hold exactly the same time
    /// (the walk keeps the side it comes from on a tie, and the stored winner may come from the other side): both
    /// orders of such a tie are orders of simultaneous events, and the choice stays a function of the events pushed
    /// and removed, so a run stays reproducible.
    /// </remarks>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private void ReplayAdded(int slot)
    {
        ref int winners = ref MemoryMarshal.GetArrayDataReference(_winners);
        ref long keys = ref MemoryMarshal.GetArrayDataReference(_keys);
        int node = _leaves + slot;
        int best = slot;
        long bestKey = Unsafe.Add(ref keys, node);
        for (; node > 1; node >>= 1)
        {
            long difference = Unsafe.Add(ref keys, node ^ 1) - bestKey;
            long takeOther = difference >> 63;
            bestKey += difference & takeOther;
            best += (Unsafe.Add(ref winners, node ^ 1) - best) & (int)takeOther;
            int parent = node >> 1;
            if (Unsafe.Add(ref keys, parent) == bestKey && Unsafe.Add(ref winners, parent) == best)
            {
                return;
            }

            Unsafe.Add(ref keys, parent) = bestKey;
            Unsafe.Add(ref winners, parent) = best;
        }
    }

    /// <summary>Recomputes the winners on the path from <paramref name="slot"/> to the root.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private void Replay(int slot)
    {
        // Every index is inside both arrays: nodes run from 1 to 2·leaves − 1.
        ref int winners = ref MemoryMarshal.GetArrayDataReference(_winners);
        ref long keys = ref MemoryMarshal.GetArrayDataReference(_keys);
        int node = _leaves + slot;
        int best = slot;
        long bestKey = Unsafe.Add(ref keys, node);
        for (; node > 1; node >>= 1)
        {
            // All ones when the sibling's key is smaller, else zero: keys are below 2^63, so the difference cannot
            // overflow, and the JIT compiles a conditional select in a loop to a branch, but this to plain arithmetic.
            long difference = Unsafe.Add(ref keys, node ^ 1) - bestKey;
            long takeOther = difference >> 63;
            bestKey += difference & takeOther;
            best += (Unsafe.Add(ref winners, node ^ 1) - best) & (int)takeOther;
            Unsafe.Add(ref keys, node >> 1) = bestKey;
            Unsafe.Add(ref winners, node >> 1) = best;
        }
    }

    /// <summary>Sets the pool to <paramref name="leaves"/> slots (a power of two), keeping the pending events.</summary>
    private void Resize(int leaves)
    {
        int old = _leaves;
        var keys = new long[2 * leaves];
        keys.AsSpan().Fill(FreeKey);
        _keys.AsSpan(old, old).CopyTo(keys.AsSpan(leaves));
        Array.Resize(ref _payloads, leaves);
        _free = new int[leaves];
        _freeCount = 0;
        for (int slot = leaves - 1; slot >= 0; slot--)
        {
            if (keys[leaves + slot] == FreeKey)
            {
                _free[_freeCount++] = slot;
            }
        }

        var winners = new int[2 * leaves];
        for (int slot = 0; slot < leaves; slot++)
        {
            winners[leaves + slot] = slot;
        }

        for (int node = leaves - 1; node >= 1; node--)
        {
            int child = 2 * node + (keys[(2 * node) + 1] < keys[2 * node] ? 1 : 0);
            keys[node] = keys[child];
            winners[node] = winners[child];
        }

        _keys = keys;
        _winners = winners;
        _leaves = leaves;
    }

    /// <summary>An event without its time, 32 bytes: half a cache line, so one read of a slot fetches all of it.</summary>
    [StructLayout(LayoutKind.Sequential)]
    private readonly record struct EventPayload(int Unit, int Patient, int Group, int NextUnit, double UnitArrival, double ServiceStart)
    {
        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        public SimulationEvent At(double time) => new(time, Unit, Patient) { Group = Group, NextUnit = NextUnit, UnitArrival = UnitArrival, ServiceStart = ServiceStart };
    }
}
