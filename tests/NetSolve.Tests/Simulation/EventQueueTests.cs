using NetSolve.Simulation;

namespace NetSolve.Tests.Simulation;

public sealed class EventQueueTests
{
    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void Each_pop_returns_the_earliest_pending_event_through_growth_and_interleaving(bool hintPaths)
    {
        // Source: exact by hand. A priority queue must return, at every pop, the smallest time still pending; hinting
        // the next removal's path (large networks) reads memory ahead and must change nothing.
        var random = new Xoshiro256StarStar(3, 0);
        var queue = new EventQueue(2, hintPaths);
        var pending = new List<double>();
        for (int round = 0; round < 1_000; round++)
        {
            for (int k = 0; k < 3; k++)
            {
                double time = random.NextDouble() * 100.0;
                pending.Add(time);
                queue.Push(new SimulationEvent(time, k, round));
            }

            PopAndCheck(queue, pending);
        }

        while (queue.Count > 0)
        {
            PopAndCheck(queue, pending);
        }

        Assert.Empty(pending);
    }

    [Fact]
    public void An_event_comes_out_with_every_field_it_went_in_with()
    {
        // Source: exact by hand. A service end carries its patient's group, times and next unit through the queue.
        var queue = new EventQueue(4, hintPaths: true);
        var sent = new SimulationEvent(5.5, 3, 17) { Group = 2, NextUnit = 9, UnitArrival = 1.25, ServiceStart = 2.5 };
        queue.Push(new SimulationEvent(7.0, 1, SimulationEvent.ArrivalMarker));
        queue.Push(sent);
        Assert.Equal((3, 17, 2, 9), queue.EarliestTarget);
        Assert.Equal(sent, queue.Pop());
        Assert.Equal(new SimulationEvent(7.0, 1, SimulationEvent.ArrivalMarker), queue.Pop());
    }

    [Fact]
    public void Pop_returns_the_smallest_time_each_time()
    {
        var queue = new EventQueue(4);
        foreach (double time in new[] { 5.0, 1.0, 4.0, 2.0, 3.0 })
        {
            queue.Push(new SimulationEvent(time, 0, 0));
        }

        Assert.Equal([1.0, 2.0, 3.0, 4.0, 5.0], Enumerable.Range(0, 5).Select(_ => queue.Pop().Time));
    }

    [Fact]
    public void The_earliest_time_is_infinite_when_empty_and_tracks_the_smallest_pending_time()
    {
        // Source: exact by hand. The run loop stops on the earliest time alone, so an empty queue must report +∞.
        var queue = new EventQueue(1);
        Assert.Equal(double.PositiveInfinity, queue.EarliestTime);
        for (int k = 40; k >= 1; k--)
        {
            queue.Push(new SimulationEvent(k, k, -k));
        }

        Assert.Equal(1.0, queue.EarliestTime);
        for (int k = 1; k <= 40; k++)
        {
            var popped = queue.Pop();
            Assert.Equal((double)k, popped.Time);
            Assert.Equal(k, popped.Unit);
            Assert.Equal(-k, popped.Patient);
        }

        Assert.Equal(double.PositiveInfinity, queue.EarliestTime);
    }

    [Fact]
    public void Replacing_the_earliest_event_keeps_every_later_pop_in_time_order()
    {
        // Source: exact by hand. Replacing the earliest event must behave as a pop followed by a push: the queue then
        // returns the smallest pending time at every pop, including the replacement when it is itself the smallest.
        var random = new Xoshiro256StarStar(11, 0);
        var queue = new EventQueue(2);
        var pending = new List<double>();
        for (int k = 0; k < 50; k++)
        {
            double time = random.NextDouble() * 10.0;
            pending.Add(time);
            queue.Push(new SimulationEvent(time, k, k));
        }

        for (int round = 0; round < 5_000; round++)
        {
            double earliest = pending.Min();
            Assert.Equal(earliest, queue.Earliest.Time);
            pending.Remove(earliest);
            double next = earliest + (random.NextDouble() * (round % 7 == 0 ? 0.01 : 10.0));
            pending.Add(next);
            queue.ReplaceEarliest(new SimulationEvent(next, round, -round));
        }

        while (queue.Count > 0)
        {
            PopAndCheck(queue, pending);
        }

        Assert.Empty(pending);
    }

    [Fact]
    public void Events_with_equal_times_each_come_out_once_in_time_order_when_added_between_removals()
    {
        // Source: exact by hand. An added event stops updating the tree where the winner stored before it is found
        // again; with many equal times (as at a roster's change of hour) every pop must still return a smallest
        // pending time, and each event exactly once.
        var random = new Xoshiro256StarStar(5, 0);
        var queue = new EventQueue(2);
        var pending = new List<(double Time, int Id)>();
        int nextId = 0;
        double now = 0.0;
        for (int round = 0; round < 3_000; round++)
        {
            for (int k = 0; k < (round % 3 == 0 ? 2 : 1); k++)
            {
                double time = now + random.NextInt(4);
                pending.Add((time, nextId));
                queue.Push(new SimulationEvent(time, nextId++, 0));
            }

            var popped = queue.Pop();
            now = popped.Time;
            Assert.Equal(pending.Min(e => e.Time), popped.Time);
            Assert.True(pending.Remove((popped.Time, popped.Unit)));
        }

        while (queue.Count > 0)
        {
            var popped = queue.Pop();
            Assert.Equal(pending.Min(e => e.Time), popped.Time);
            Assert.True(pending.Remove((popped.Time, popped.Unit)));
        }

        Assert.Empty(pending);
    }

    [Fact]
    public void Pending_lists_exactly_the_events_still_queued_and_clear_empties_the_queue()
    {
        // Source: exact by hand. The run's end adds the services still in progress from the pending events, so the
        // list must hold each queued event once, with its payload, and nothing already removed.
        var queue = new EventQueue(4);
        for (int k = 1; k <= 30; k++)
        {
            queue.Push(new SimulationEvent(k * 0.5, k, 100 + k));
        }

        for (int k = 0; k < 10; k++)
        {
            queue.RemoveEarliest();
        }

        var pending = queue.Pending().OrderBy(e => e.Time).ToList();
        Assert.Equal(Enumerable.Range(11, 20).Select(k => new SimulationEvent(k * 0.5, k, 100 + k)), pending);

        queue.Clear();
        Assert.Equal(0, queue.Count);
        Assert.Empty(queue.Pending());
        Assert.Equal(double.PositiveInfinity, queue.EarliestTime);
        queue.Push(new SimulationEvent(2.0, 1, 1));
        Assert.Equal(2.0, queue.Pop().Time);
    }

    private static void PopAndCheck(EventQueue queue, List<double> pending)
    {
        double earliest = pending.Min();
        Assert.Equal(earliest, queue.Pop().Time);
        pending.Remove(earliest);
    }
}
