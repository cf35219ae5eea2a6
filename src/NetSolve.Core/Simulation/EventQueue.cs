using System.Diagnostics;
using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace NetSolve.Simulation;

/// <summary>
/// Pending events by time: a tournament tree over a pool of event slots. Each slot holds one pending event (or none);
/// each inner node of a complete binary tree over the slots holds the slot with the earliest time below it, so the
/// root names the earliest event. Adding, replacing or removing an event changes one slot and recomputes its path to
/// the root: O(log n). Allocates only when the pool grows past the most events ever pending at once. Not thread-safe.
/// </summary>
/// <remarks>
/// Why this shape rather than a heap: walking up from a slot visits fixed places (node / 2, its sibling node ^ 1),
/// whatever the times, so the loads of a whole path can start at once and only the running minimum waits on them,
/// where a heap's walk down must compare one level before it knows where the next is. Times are stored as their IEEE
/// bit patterns, which order like the times themselves for times ≥ 0 and +∞ (the mark of a free slot): the minimum is
/// then picked with integer flag moves, not branches, since which of two times is earlier is a coin toss the branch
/// predictor would lose about half the time. Free slots are reused last-freed first, so the slot of the event just
/// handled, whose path is in cache, is usually the next one taken.
/// </remarks>
internal sealed class EventQueue
{
    private static readonly long FreeKey = BitConverter.DoubleToInt64Bits(double.PositiveInfinity);

    private long[] _keys = [];
    private EventPayload[] _payloads = [];
    private int[] _winners = [];
    private int[] _free = [];
    private int _freeCount;
    private int _leaves;

    /// <summary>Creates an empty queue with room for <paramref name="capacity"/> events.</summary>
    public EventQueue(int capacity)
    {
        Resize((int)BitOperations.RoundUpToPowerOf2((uint)Math.Max(capacity, 16)));
    }

    /// <summary>Events pending.</summary>
    public int Count { get; private set; }

    /// <summary>The time of the earliest pending event, or +∞ when the queue is empty.</summary>
    public double EarliestTime => BitConverter.Int64BitsToDouble(_keys[_winners[1]]);

    /// <summary>The earliest pending event; the queue must not be empty.</summary>
    public SimulationEvent Earliest
    {
        get
        {
            int slot = _winners[1];
            var payload = _payloads[slot];
            return new SimulationEvent(BitConverter.Int64BitsToDouble(_keys[slot]), payload.Unit, payload.Patient);
        }
    }

    /// <summary>Adds an event; its time must not be negative.</summary>
    public void Push(in SimulationEvent item)
    {
        if (_freeCount == 0)
        {
            Resize(_leaves * 2);
        }

        int slot = _free[--_freeCount];
        Count++;
        Set(slot, item);
    }

    /// <summary>Removes and returns the earliest event; the queue must not be empty.</summary>
    public SimulationEvent Pop()
    {
        var top = Earliest;
        RemoveEarliest();
        return top;
    }

    /// <summary>Removes the earliest event; the queue must not be empty.</summary>
    public void RemoveEarliest()
    {
        int slot = _winners[1];
        _keys[slot] = FreeKey;
        _free[_freeCount++] = slot;
        Count--;
        Replay(slot);
    }

    /// <summary>
    /// Removes the earliest event and adds <paramref name="item"/> in its slot, with one walk up the tree: the event
    /// loop's commonest step, since most events schedule exactly one more (the "hold" operation of event-list studies).
    /// </summary>
    public void ReplaceEarliest(in SimulationEvent item) => Set(_winners[1], item);

    /// <summary>The pending events, in no particular order.</summary>
    public IEnumerable<SimulationEvent> Pending()
    {
        for (int slot = 0; slot < _leaves; slot++)
        {
            if (_keys[slot] != FreeKey)
            {
                var payload = _payloads[slot];
                yield return new SimulationEvent(BitConverter.Int64BitsToDouble(_keys[slot]), payload.Unit, payload.Patient);
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

    private void Set(int slot, in SimulationEvent item)
    {
        Debug.Assert(item.Time >= 0.0, "Keys order like times only for times that are not negative.");
        _keys[slot] = BitConverter.DoubleToInt64Bits(item.Time);
        _payloads[slot] = new EventPayload(item.Unit, item.Patient);
        Replay(slot);
    }

    /// <summary>Recomputes the winners on the path from <paramref name="slot"/> to the root.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private void Replay(int slot)
    {
        // Every index is inside its array: nodes run from 1 to 2·leaves − 1 and winners name slots below leaves.
        ref int winners = ref MemoryMarshal.GetArrayDataReference(_winners);
        ref long keys = ref MemoryMarshal.GetArrayDataReference(_keys);
        int best = slot;
        long bestKey = Unsafe.Add(ref keys, slot);
        for (int node = _leaves + slot; node > 1; node >>= 1)
        {
            int other = Unsafe.Add(ref winners, node ^ 1);
            long otherKey = Unsafe.Add(ref keys, other);

            // Written as 0 or 1, then negated into a mask, so the JIT emits a setcc rather than a branch.
            long takeOther = otherKey < bestKey ? 1 : 0;
            best += (other - best) & (int)-takeOther;
            bestKey += (otherKey - bestKey) & -takeOther;
            Unsafe.Add(ref winners, node >> 1) = best;
        }
    }

    /// <summary>Sets the pool to <paramref name="leaves"/> slots (a power of two), keeping the pending events.</summary>
    private void Resize(int leaves)
    {
        int old = _leaves;
        Array.Resize(ref _keys, leaves);
        Array.Resize(ref _payloads, leaves);
        _keys.AsSpan(old).Fill(FreeKey);
        _free = new int[leaves];
        _freeCount = 0;
        for (int slot = leaves - 1; slot >= 0; slot--)
        {
            if (_keys[slot] == FreeKey)
            {
                _free[_freeCount++] = slot;
            }
        }

        _leaves = leaves;
        _winners = new int[2 * leaves];
        for (int slot = 0; slot < leaves; slot++)
        {
            _winners[leaves + slot] = slot;
        }

        for (int node = leaves - 1; node >= 1; node--)
        {
            int left = _winners[2 * node];
            int right = _winners[(2 * node) + 1];
            _winners[node] = _keys[right] < _keys[left] ? right : left;
        }
    }

    private readonly record struct EventPayload(int Unit, int Patient);
}
