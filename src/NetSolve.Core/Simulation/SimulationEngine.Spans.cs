namespace NetSolve.Simulation;

/// <summary>The spans of waiting and of service inside the statistics window: added when they end, and at the run's end.</summary>
internal sealed partial class SimulationEngine
{
    // Waits longer than this many hours past their first hour add whole days at once (AddQueueSpan).
    private const double WholeDaysFrom = 48.0;

    /// <summary>The later of <paramref name="time"/> and the end of the warm-up: where a span inside the window starts.</summary>
    /// <remarks>A plain comparison: Math.Max also orders NaN and −0, which these times never are, at a cost per call.</remarks>
    private double InWindow(double time) => time > _warmupEnd ? time : _warmupEnd;

    /// <summary>
    /// Adds one patient's wait from <paramref name="from"/> to <paramref name="to"/> (inside the statistics window) to
    /// the unit's queue area and to its area by hour of day.
    /// </summary>
    /// <remarks>
    /// The area under the queue-length curve is the sum of the waits inside the window, so it is added up per patient
    /// when a wait ends (and for those still waiting when the run ends) rather than at every change of the queue: a
    /// patient who never waits costs nothing, and the busy area is added the same way when a service ends. Times are
    /// not negative, so truncation is the floor. A unit's 24 hourly areas are made with its first wait: in a large
    /// network most units never queue, and 192 bytes for each of them would be most of the engine's memory.
    /// </remarks>
    private void AddQueueSpan(int unit, double from, double to)
    {
        _units[unit].QueueArea += to - from;
        var byHour = _queueAreaByHour[unit] ??= new double[24];
        long hour = (long)from;
        double hourEnd = hour + 1.0;
        int slot = (int)(hour % 24);
        if (to - hourEnd > WholeDaysFrom)
        {
            // A wait of days (a unit that cannot keep up) adds its whole days to every hour at once: hour by hour, the
            // work per service start grows with the wait, and a run's with the square of its length.
            byHour[slot] += hourEnd - from;
            from = hourEnd;
            slot = slot == 23 ? 0 : slot + 1;
            double days = Math.Floor((to - from) / 24.0);
            for (int h = 0; h < 24; h++)
            {
                byHour[h] += days;
            }

            from += days * 24.0;
            hourEnd = from + 1.0;
        }

        while (to > hourEnd)
        {
            byHour[slot] += hourEnd - from;
            from = hourEnd;
            hourEnd += 1.0;
            slot = slot == 23 ? 0 : slot + 1;
        }

        byHour[slot] += to - from;
    }

    /// <summary>Adds the spans still open when the run ends: waits of queued patients and services in progress.</summary>
    private void CloseOpenSpans()
    {
        if (_end <= _warmupEnd)
        {
            return;
        }

        for (int u = 0; u < _units.Length; u++)
        {
            var queue = _queues[u];
            ref readonly var state = ref _units[u];
            for (int k = 0; k < state.Queued; k++)
            {
                AddQueueSpan(u, InWindow(queue[(state.QueueHead + k) & (queue.Length - 1)].UnitArrival), _end);
            }
        }

        foreach (var pending in _events.Pending())
        {
            if (pending.IsServiceEnd)
            {
                _units[pending.Unit].BusyArea += _end - InWindow(pending.ServiceStart);
            }
        }
    }
}
