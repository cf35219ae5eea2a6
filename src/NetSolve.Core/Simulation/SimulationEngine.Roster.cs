namespace NetSolve.Simulation;

/// <summary>
/// Rosters: a unit with one changes its servers on the hour. Nobody is pre-empted: when servers go off, those busy
/// finish their patient and then leave (see <see cref="OnServiceEnd"/>), and a new service starts only while fewer
/// patients are in service than the hour's servers; when servers come on, they take waiting patients at once.
/// </summary>
internal sealed partial class SimulationEngine
{
    private void ScheduleFirstHourChanges()
    {
        var rosters = _network.Rosters;
        for (int u = 0; u < rosters.Length; u++)
        {
            if (rosters[u] is not null)
            {
                _events.Push(new SimulationEvent(1.0, u, SimulationEvent.RosterMarker));
            }
        }
    }

    private void OnHourChange(double now, int unit)
    {
        var roster = _network.Rosters[unit]!;
        long hour = (long)Math.Round(now);
        Schedule(new SimulationEvent(hour + 1.0, unit, SimulationEvent.RosterMarker));

        ref var state = ref _units[unit];
        state.Servers = roster[(int)(hour % roster.Length)];
        while (state.Queued > 0 && state.Busy < state.Servers)
        {
            state.Busy++;
            StartQueued(now, unit);
        }
    }
}
