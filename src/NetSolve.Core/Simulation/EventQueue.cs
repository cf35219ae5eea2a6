using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace NetSolve.Simulation;

/// <summary>
/// Pending events by time: a 4-ary min-heap with the times in one array and the (unit, patient) payloads in another.
/// Push and pop cost O(log n) and allocate nothing once the arrays have grown to the most events ever pending at
/// once. Not thread-safe.
/// </summary>
/// <remarks>
/// Why this shape (measured on the 1,000-unit benchmark, where a few thousand events are pending): a 4-ary heap is
/// half as deep as a binary one, and the four children of a slot are adjacent, so one or two cache lines of times
/// serve a level; keeping the payloads apart keeps those lines full of times. Slots past the last event hold
/// +∞, so the walk down never checks how many children a slot has, and <see cref="EarliestTime"/> of an empty
/// queue is +∞. The smallest child is picked by comparisons the JIT turns into flag moves, not branches: which child
/// is smallest is a coin toss the branch predictor would lose about half the time.
/// </remarks>
internal sealed class EventQueue
{
    private const int Arity = 4;

    private double[] _times;
    private EventPayload[] _payloads;
    private int _capacity;

    /// <summary>Creates an empty queue with room for <paramref name="capacity"/> events.</summary>
    public EventQueue(int capacity)
    {
        _capacity = Math.Max(capacity, 16);
        _times = new double[_capacity + Arity];
        _payloads = new EventPayload[_capacity + Arity];
        Array.Fill(_times, double.PositiveInfinity);
    }

    /// <summary>Events pending.</summary>
    public int Count { get; private set; }

    /// <summary>The time of the earliest pending event, or +∞ when the queue is empty.</summary>
    public double EarliestTime => _times[0];

    /// <summary>Adds an event.</summary>
    public void Push(in SimulationEvent item)
    {
        if (Count == _capacity)
        {
            Grow();
        }

        var times = _times;
        var payloads = _payloads;
        int hole = Count++;
        double time = item.Time;
        while (hole > 0)
        {
            int parent = (hole - 1) >> 2;
            if (times[parent] <= time)
            {
                break;
            }

            times[hole] = times[parent];
            payloads[hole] = payloads[parent];
            hole = parent;
        }

        times[hole] = time;
        payloads[hole] = new EventPayload(item.Unit, item.Patient);
    }

    /// <summary>The earliest pending event; the queue must not be empty.</summary>
    public SimulationEvent Earliest => new(_times[0], _payloads[0].Unit, _payloads[0].Patient);

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
        int count = --Count;
        double lastTime = _times[count];
        var lastPayload = _payloads[count];
        _times[count] = double.PositiveInfinity;
        if (count > 0)
        {
            Settle(lastTime, lastPayload, count);
        }
    }

    /// <summary>
    /// Removes the earliest event and adds <paramref name="item"/> in one pass: the event loop's commonest step, since
    /// most events schedule exactly one more (the "hold" operation of event-list studies).
    /// </summary>
    public void ReplaceEarliest(in SimulationEvent item) => Settle(item.Time, new EventPayload(item.Unit, item.Patient), Count);

    /// <summary>
    /// Fills the hole at the root with (<paramref name="time"/>, <paramref name="payload"/>) among the first
    /// <paramref name="count"/> slots. Floyd's bottom-up variant: the hole moves down along the smallest children to a
    /// leaf, then the item sifts up from there. The item usually belongs near the bottom, so this saves most of the
    /// comparisons of the textbook sift-down.
    /// </summary>
    private void Settle(double time, EventPayload payload, int count)
    {
        var times = _times;
        var payloads = _payloads;

        // The walk reads past bounds checks: every index is below count + Arity, inside both arrays, because a slot
        // with a child below count is itself below count and its other children are at most Arity − 1 further on.
        ref double timeAt = ref MemoryMarshal.GetArrayDataReference(times);
        ref var payloadAt = ref MemoryMarshal.GetArrayDataReference(payloads);
        int hole = 0;
        int child = 1;
        while (child < count)
        {
            // Children past the last event are +∞ sentinels (the arrays keep Arity spare slots), so all four compare.
            int left = child + (Unsafe.Add(ref timeAt, child + 1) < Unsafe.Add(ref timeAt, child) ? 1 : 0);
            int right = child + 2 + (Unsafe.Add(ref timeAt, child + 3) < Unsafe.Add(ref timeAt, child + 2) ? 1 : 0);
            // Written as 0 or 1, then negated into a mask: "? -1 : 0" compiled to a branch, "? 1 : 0" to a setcc.
            int pickRight = Unsafe.Add(ref timeAt, right) < Unsafe.Add(ref timeAt, left) ? 1 : 0;
            int smallest = left + ((right - left) & -pickRight);
            Unsafe.Add(ref timeAt, hole) = Unsafe.Add(ref timeAt, smallest);
            Unsafe.Add(ref payloadAt, hole) = Unsafe.Add(ref payloadAt, smallest);
            hole = smallest;
            child = (hole * Arity) + 1;
        }

        while (hole > 0)
        {
            int parent = (hole - 1) >> 2;
            if (times[parent] <= time)
            {
                break;
            }

            times[hole] = times[parent];
            payloads[hole] = payloads[parent];
            hole = parent;
        }

        times[hole] = time;
        payloads[hole] = payload;
    }

    /// <summary>The pending events, in no particular order.</summary>
    public IEnumerable<SimulationEvent> Pending()
    {
        for (int i = 0; i < Count; i++)
        {
            yield return new SimulationEvent(_times[i], _payloads[i].Unit, _payloads[i].Patient);
        }
    }

    /// <summary>Removes every event, keeping the arrays.</summary>
    public void Clear()
    {
        Array.Fill(_times, double.PositiveInfinity, 0, Count);
        Count = 0;
    }

    private void Grow()
    {
        int old = _times.Length;
        _capacity *= 2;
        Array.Resize(ref _times, _capacity + Arity);
        Array.Resize(ref _payloads, _capacity + Arity);
        Array.Fill(_times, double.PositiveInfinity, old, _times.Length - old);
    }

    private readonly record struct EventPayload(int Unit, int Patient);
}
