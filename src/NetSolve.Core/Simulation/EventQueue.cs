namespace NetSolve.Simulation;

/// <summary>
/// Pending events by time: a binary min-heap over a struct array. Push and pop cost O(log n) and allocate nothing
/// once the array has grown to the most events ever pending at once. Not thread-safe.
/// </summary>
internal sealed class EventQueue
{
    private SimulationEvent[] _heap;

    /// <summary>Creates an empty queue with room for <paramref name="capacity"/> events.</summary>
    public EventQueue(int capacity) => _heap = new SimulationEvent[Math.Max(capacity, 16)];

    /// <summary>Events pending.</summary>
    public int Count { get; private set; }

    /// <summary>The earliest pending event; the queue must not be empty.</summary>
    public ref readonly SimulationEvent Peek() => ref _heap[0];

    /// <summary>Adds an event.</summary>
    public void Push(in SimulationEvent item)
    {
        if (Count == _heap.Length)
        {
            Array.Resize(ref _heap, _heap.Length * 2);
        }

        var heap = _heap;
        int hole = Count++;
        double time = item.Time;
        while (hole > 0)
        {
            int parent = (hole - 1) >> 1;
            if (heap[parent].Time <= time)
            {
                break;
            }

            heap[hole] = heap[parent];
            hole = parent;
        }

        heap[hole] = item;
    }

    /// <summary>Removes and returns the earliest event; the queue must not be empty.</summary>
    /// <remarks>
    /// Floyd's bottom-up variant: the hole left at the root moves down along the smaller children to a leaf, then the
    /// last event sifts up from there. The last event usually belongs near the bottom, so this saves about half the
    /// comparisons of the textbook sift-down.
    /// </remarks>
    public SimulationEvent Pop()
    {
        var heap = _heap;
        var top = heap[0];
        int count = --Count;
        if (count == 0)
        {
            return top;
        }

        int hole = 0;
        int child = 1;
        while (child < count)
        {
            if (child + 1 < count && heap[child + 1].Time < heap[child].Time)
            {
                child++;
            }

            heap[hole] = heap[child];
            hole = child;
            child = (hole << 1) + 1;
        }

        var last = heap[count];
        double time = last.Time;
        while (hole > 0)
        {
            int parent = (hole - 1) >> 1;
            if (heap[parent].Time <= time)
            {
                break;
            }

            heap[hole] = heap[parent];
            hole = parent;
        }

        heap[hole] = last;
        return top;
    }

    /// <summary>Removes every event, keeping the array.</summary>
    public void Clear() => Count = 0;
}
