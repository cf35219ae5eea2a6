namespace NetSolve.Solving;

/// <summary>
/// Hourly waits by the modified-offered-load approximation: at each moment, the stationary M/M/c (Erlang C) values at
/// the time-varying offered load m(t) and the servers c(t) (Jennings, Mandelbaum, Massey and Whitt, "Server staffing
/// to meet time-varying demand", Management Science 42(10), 1996, 1383–1394).
/// </summary>
/// <remarks>
/// m(t) is the infinite-server load of <see cref="TimeVaryingTraffic"/>, which already carries the lag of the service
/// time, so a peak in arrivals shows as a later, flatter peak in load. Evaluated every five minutes
/// (<see cref="LoadBlocks"/>): queue C·m/(c − m), patients in the unit queue + m, P(wait) C. It has no answer where
/// m(t) ≥ c(t); <see cref="TryEvaluate"/> then returns null and the caller falls back on another method.
/// Thread-safe.
/// </remarks>
public static class ModifiedOfferedLoad
{
    /// <summary>Hourly waits of one unit, or null when the offered load reaches the servers at some moment.</summary>
    public static HourlyWaits? TryEvaluate(UnitLoadOverCycle unit, ServerRoster roster)
    {
        ArgumentNullException.ThrowIfNull(unit);
        ArgumentNullException.ThrowIfNull(roster);
        var blocks = LoadBlocks.Of(unit, roster);
        var hours = new HourAccumulator(blocks.CycleHours);
        for (int b = 0; b < blocks.Count; b++)
        {
            double load = blocks.Load[b];
            int servers = blocks.Servers[b];
            if (load >= servers && load > 0.0)
            {
                return null;
            }

            double allBusy = load > 0.0 ? ErlangFormulas.WaitProbability(servers, load) : 0.0;
            double queue = load > 0.0 ? allBusy * load / (servers - load) : 0.0;
            hours.Add(LoadBlocks.HourOf(b), blocks.Steps[b], queue, queue + load, allBusy, blocks.Arrivals[b]);
        }

        return hours.ToWaits(TimeVaryingMethodNames.ModifiedOfferedLoad, unit.StepsPerHour);
    }
}
