using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// Hour-by-hour waits of every unit of a network: the offered load from <see cref="TimeVaryingTraffic"/>, then per
/// unit MOL (<see cref="ModifiedOfferedLoad"/>) where the load stays below the servers, else the exact chain
/// (<see cref="PeriodicBirthDeathChain"/>) whatever the servers. Units of at most
/// <see cref="ExactChainOptions.MaxServers"/> servers whose varying load reaches
/// <see cref="ExactChainOptions.HeavyPeakLoad"/> of the servers get the chain even where MOL has an answer, since MOL
/// misses the queue carried over from the busy hours; so do larger units loaded that heavily whose servers complete
/// few services an hour (<see cref="ExactChainOptions.MaxCompletionsPerHour"/>), where the chain is cheap. A unit with a capacity gets the chain with its capacity (arrivals
/// at a full unit turned away), except a large one without waiting places, which gets
/// <see cref="ModifiedOfferedLoadLoss"/>.
/// </summary>
/// <remarks>
/// Each unit is taken on its own, fed by the infinite-server arrival rate λ_j(t) net of the patients that full units
/// above it turn away or divert (<see cref="TurnedAwayFlows"/>, fed back until the shares settle): upstream queues, which delay and
/// smooth the flow, are not fed back. The mean service used for waits is the unit's mean over its patients (offered
/// load over arrival rate over the cycle), so groups with their own service times count by their share. The exact
/// chain assumes exponential service; MOL carries the service cv through the offered load only. Thread-safe.
/// </remarks>
public static class TimeVaryingSolver
{
    // Rounds of feeding the turned-away shares back into the traffic equations; each round costs one solve of the
    // network, and the shares settle in a few (the change shrinks with the share of load a full unit passes on).
    private const int MaxTurnedAwayRounds = 10;

    // Largest change in any hour's admitted share at which the turned-away flows count as settled.
    private const double TurnedAwayTolerance = 1e-4;

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
        var rosterOf = network.Units.Select(unit =>
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

            return roster;
        }).ToArray();

        // Units with a capacity send patients away when full, mostly in their busy hours; the units below them then
        // receive fewer patients than the infinite-server load says. The turned-away shares are fed back into the
        // traffic equations until they settle (a fixed point, as for the steady-state blocking).
        var traffic = TimeVaryingTraffic.Solve(network, options);
        var waits = SolveUnits(network, traffic, rosterOf, options, chainOptions);
        double[]?[]? shares = null;
        for (int round = 1; round <= MaxTurnedAwayRounds; round++)
        {
            var flows = TurnedAway(network, traffic, waits);
            if (flows is null)
            {
                break;
            }

            double change = Change(shares, flows.AdmittedShareByHour);
            if (change <= TurnedAwayTolerance)
            {
                break;
            }

            shares = flows.AdmittedShareByHour;
            traffic = TimeVaryingTraffic.Solve(network, options, flows);
            waits = SolveUnits(network, traffic, rosterOf, options, chainOptions);
        }

        return new TimeVaryingSolution(traffic, [.. waits]);
    }

    private static HourlyWaits[] SolveUnits(Network network, TimeVaryingTrafficSolution traffic, ServerRoster?[] rosters, TimeVaryingOptions options, ExactChainOptions chainOptions) =>
        [.. network.Units.Select((unit, j) => SolveUnit(unit, traffic.Units[j], rosters[j], options, chainOptions))];

    // The admitted share of each unit that turns patients away and the diverted patients each unit receives, by hour;
    // null when no unit sends anyone away.
    private static TurnedAwayFlows? TurnedAway(Network network, TimeVaryingTrafficSolution traffic, HourlyWaits[] waits)
    {
        int n = network.Units.Length;
        var admitted = new double[]?[n];
        var divertedIn = new double[]?[n];
        var index = network.BuildIndex();
        bool any = false;
        for (int j = 0; j < n; j++)
        {
            var away = waits[j].TurnedAwayShareByHour;
            if (away.IsDefaultOrEmpty || away.All(share => share <= 0.0))
            {
                continue;
            }

            any = true;
            admitted[j] = [.. away.Select(share => 1.0 - share)];
            if (network.Units[j].WhenFull.DivertToUnitId is string target)
            {
                int t = index[target];
                divertedIn[t] ??= new double[away.Length];
                var arrivals = traffic.Units[j].ArrivalsPerHourByHour;
                for (int h = 0; h < away.Length; h++)
                {
                    divertedIn[t]![h] += away[h] * arrivals[h];
                }
            }
        }

        return any ? new TurnedAwayFlows(admitted, divertedIn) : null;
    }

    private static double Change(double[]?[]? before, double[]?[] after)
    {
        double change = 0.0;
        for (int j = 0; j < after.Length; j++)
        {
            for (int h = 0; after[j] is not null && h < after[j]!.Length; h++)
            {
                double previous = before?[j] is { } shares ? shares[h] : 1.0;
                change = Math.Max(change, Math.Abs(after[j]![h] - previous));
            }
        }

        return change;
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
            // A capacity bounds the chain at capacity + 1 states and it always has an answer, where MOL would let the
            // queue grow past the places the unit has. Large units without waiting places (a ward of hundreds of beds,
            // stays of days) settle slowly in the chain, and Erlang B at the load is their standard form.
            if (roster.Max > chainOptions.MaxServers && capacity <= roster.Servers.Min())
            {
                return ModifiedOfferedLoadLoss.Evaluate(load, roster);
            }

            return PeriodicBirthDeathChain.Solve(load.ArrivalsByStep, load.StepsPerHour, roster, meanServiceHours, chainOptions, Math.Max(capacity, roster.Max));
        }

        if (meanLoad >= roster.MeanOver(cycleHours))
        {
            return HourlyWaits.Unstable;
        }

        bool small = roster.Max <= chainOptions.MaxServers;
        bool affordable = small || roster.Max / meanServiceHours <= chainOptions.MaxCompletionsPerHour;
        if ((small && options.ExactForSmallUnits) || (affordable && Varies(load, roster) && PeakLoadShare(load, roster) >= chainOptions.HeavyPeakLoad))
        {
            return PeriodicBirthDeathChain.Solve(load.ArrivalsByStep, load.StepsPerHour, roster, meanServiceHours, chainOptions);
        }

        return ModifiedOfferedLoad.TryEvaluate(load, roster)
            ?? PeriodicBirthDeathChain.Solve(load.ArrivalsByStep, load.StepsPerHour, roster, meanServiceHours, chainOptions);
    }

    // True when the offered load or the servers change over the cycle: with both constant MOL is the stationary Erlang C
    // model and exact, so the chain would only cost time.
    private static bool Varies(UnitLoadOverCycle load, ServerRoster roster)
    {
        var loads = load.OfferedLoadByHour;
        double spread = loads.Max() - loads.Min();
        return spread > 1e-9 * Math.Max(1.0, loads.Max()) || roster.Servers.Distinct().Skip(1).Any();
    }

    // The largest share of its servers the offered load reaches in any hour (+∞ in an hour without servers but with load).
    private static double PeakLoadShare(UnitLoadOverCycle load, ServerRoster roster)
    {
        double peak = 0.0;
        for (int h = 0; h < load.OfferedLoadByHour.Length; h++)
        {
            int servers = roster.At(h);
            double offered = load.OfferedLoadByHour[h];
            peak = Math.Max(peak, servers > 0 ? offered / servers : (offered > 0.0 ? double.PositiveInfinity : 0.0));
        }

        return peak;
    }
}
