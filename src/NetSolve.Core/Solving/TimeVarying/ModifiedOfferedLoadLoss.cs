namespace NetSolve.Solving;

/// <summary>
/// Hourly values of a large unit without waiting places (capacity equal to its servers) by the modified-offered-load
/// approximation of the loss model: at each moment Erlang B at the time-varying offered load m(t) and servers c(t)
/// (Jagerman, "Nonstationary blocking in telephone traffic", Bell System Technical Journal 54(3), 1975, 625–661;
/// Massey and Whitt, "An analysis of the modified offered-load approximation for the nonstationary Erlang loss model",
/// Annals of Applied Probability 4(4), 1994, 1145–1160).
/// </summary>
/// <remarks>
/// Nobody waits: the queue is 0, the patients in the unit m(1 − B), and <see cref="HourlyWaits.WaitProbabilityByHour"/>
/// the chance B that an arrival finds the unit full and is turned away or diverted. Used where the exact chain would
/// take seconds (more servers than <see cref="ExactChainOptions.MaxServers"/>). Thread-safe.
/// </remarks>
public static class ModifiedOfferedLoadLoss
{
    /// <summary>Hourly values of one unit whose capacity equals its servers in every hour.</summary>
    public static HourlyWaits Evaluate(UnitLoadOverCycle unit, ServerRoster roster)
    {
        ArgumentNullException.ThrowIfNull(unit);
        ArgumentNullException.ThrowIfNull(roster);
        var blocks = LoadBlocks.Of(unit, roster);
        var hours = new HourAccumulator(blocks.CycleHours);
        for (int b = 0; b < blocks.Count; b++)
        {
            double load = blocks.Load[b];
            double full = load > 0.0 ? ErlangFormulas.BlockingProbability(blocks.Servers[b], load) : 0.0;
            hours.Add(LoadBlocks.HourOf(b), blocks.Steps[b], 0.0, load * (1.0 - full), full, blocks.Arrivals[b]);
        }

        var waits = hours.ToWaits(TimeVaryingMethodNames.ModifiedOfferedLoadLoss, unit.StepsPerHour);
        return waits with { TurnedAwayShareByHour = waits.WaitProbabilityByHour };
    }
}
