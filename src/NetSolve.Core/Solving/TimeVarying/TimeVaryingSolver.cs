using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// Hour-by-hour waits of every unit of a network: the offered load from <see cref="TimeVaryingTraffic"/>, then per
/// unit MOL (<see cref="ModifiedOfferedLoad"/>) where the load stays below the servers, else the exact chain
/// (<see cref="PeriodicBirthDeathChain"/>) for units of at most <see cref="ExactChainOptions.MaxServers"/> servers,
/// else MOL with a fluid queue (<see cref="FluidQueue"/>). A unit with a capacity and at most that many servers gets the
/// exact chain with its capacity (arrivals at a full unit turned away); a larger one without waiting places gets
/// <see cref="ModifiedOfferedLoadLoss"/>; a larger one with waiting places the methods above, which ignore its capacity.
/// </summary>
/// <remarks>
/// Each unit is taken on its own, fed by the infinite-server arrival rate λ_j(t): upstream queues, which delay and
/// smooth the flow, are not fed back. The mean service used for waits is the unit's mean over its patients (offered
/// load over arrival rate over the cycle), so groups with their own service times count by their share. The exact
/// chain assumes exponential service; MOL carries the service cv through the offered load only. Thread-safe.
/// </remarks>
public static class TimeVaryingSolver
{
    /// <summary>Solves a validated network hour by hour.</summary>
    /// <param name="network">The network; units with unlimited servers and no roster have no queue.</param>
    /// <param name="rosters">
    /// Servers by hour for some units, by unit id; a unit not listed follows its <see cref="Unit.Roster"/> from the
    /// file, or else keeps its servers all day.
    /// </param>
    /// <param name="options">Grid and convergence of the offered load; null for the defaults.</param>
    /// <param name="chainOptions">Exact chain settings; null for the defaults.</param>
    /// <exception cref="TimeVaryingConvergenceException">Flows or a unit did not settle to a periodic pattern.</exception>
    public static TimeVaryingSolution Solve(
        Network network,
        IReadOnlyDictionary<string, ServerRoster>? rosters = null,
        TimeVaryingOptions? options = null,
        ExactChainOptions? chainOptions = null)
    {
        ArgumentNullException.ThrowIfNull(network);
        options ??= TimeVaryingOptions.Default;
        chainOptions ??= ExactChainOptions.Default;
        var traffic = TimeVaryingTraffic.Solve(network, options);
        var waits = network.Units.Select((unit, j) =>
        {
            ServerRoster? roster = null;
            if (rosters is not null && rosters.TryGetValue(unit.Id, out var given))
            {
                roster = given;
            }
            else if (unit.Roster is Roster fromFile)
            {
                roster = ServerRoster.ByHour(fromFile.ServersByHour);
            }
            else if (!unit.Servers.IsUnlimited)
            {
                roster = ServerRoster.Constant(unit.Servers.Count);
            }

            return SolveUnit(unit, traffic.Units[j], roster, options, chainOptions);
        });
        return new TimeVaryingSolution(traffic, [.. waits]);
    }

    /// <summary>Hourly waits of one unit from its load over the cycle; null roster for unlimited servers.</summary>
    public static HourlyWaits SolveUnit(Unit unit, UnitLoadOverCycle load, ServerRoster? roster, TimeVaryingOptions options, ExactChainOptions chainOptions)
    {
        ArgumentNullException.ThrowIfNull(unit);
        ArgumentNullException.ThrowIfNull(load);
        ArgumentNullException.ThrowIfNull(options);
        ArgumentNullException.ThrowIfNull(chainOptions);
        if (roster is null)
        {
            var none = load.OfferedLoadByHour.Select(_ => 0.0).ToArray();
            return new HourlyWaits(TimeVaryingMethodNames.InfiniteServers, [.. none], load.OfferedLoadByHour, [.. none], [.. none]);
        }

        int cycleHours = load.OfferedLoadByHour.Length;
        double meanArrivals = load.ArrivalsPerHourByHour.Average();
        double meanLoad = load.OfferedLoadByHour.Average();
        double meanServiceHours = meanArrivals > 0.0 ? meanLoad / meanArrivals : unit.EffectiveService.MeanHours;
        if (unit.Capacity is int capacity)
        {
            // A capacity bounds the chain at capacity + 1 states and it always has an answer, where MOL and the fluid
            // would let the queue grow past the places the unit has. Large units without waiting places take seconds in
            // the chain (a long stay settles over many cycles), so they get MOL's loss form instead.
            if (roster.Max <= chainOptions.MaxServers)
            {
                return PeriodicBirthDeathChain.Solve(load.ArrivalsByStep, load.StepsPerHour, roster, meanServiceHours, chainOptions, Math.Max(capacity, roster.Max));
            }

            if (capacity <= roster.Servers.Min())
            {
                return ModifiedOfferedLoadLoss.Evaluate(load, roster);
            }
        }

        if (meanLoad >= roster.MeanOver(cycleHours))
        {
            return HourlyWaits.Unstable;
        }

        bool small = roster.Max <= chainOptions.MaxServers;
        if (small && options.ExactForSmallUnits)
        {
            return PeriodicBirthDeathChain.Solve(load.ArrivalsByStep, load.StepsPerHour, roster, meanServiceHours, chainOptions);
        }

        return ModifiedOfferedLoad.TryEvaluate(load, roster)
            ?? (small
                ? PeriodicBirthDeathChain.Solve(load.ArrivalsByStep, load.StepsPerHour, roster, meanServiceHours, chainOptions)
                : FluidQueue.Evaluate(load, roster, meanServiceHours));
    }
}
