using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>
/// The fewest servers in each hour (or shift block) with which every hour of a unit meets the targets, by the
/// time-varying method: the exact periodic chain for rosters up to <see cref="ExactChainOptions.MaxServers"/>
/// servers, MOL above, or MOL first when <see cref="HourlyStaffingOptions.ExactChain"/> is false (docs/time-of-day.md).
/// </summary>
/// <remarks>
/// <para>
/// The queue carries over from hour to hour, so an hour cannot be staffed on its own. The search starts from the
/// stationary staffing of each hour at its offered load (the modified-offered-load staffing of Jennings, Mandelbaum,
/// Massey and Whitt, "Server staffing to meet time-varying demand", Management Science 42(10), 1996, 1383–1394),
/// solves the whole cycle, and adds one server to the hour (or block) that misses its target most until every hour
/// meets it; then it tries one server fewer in each hour or block, most slack first, keeping every change after which
/// every hour still meets the targets, until a pass removes none. The result is a local minimum: no single hour can
/// lose a server; it is not proven to be the fewest staff-hours overall.
/// </para>
/// <para>
/// Every hour keeps at least one server. Units with unlimited servers are left out. A capacity is not modelled here
/// (the chain is solved without one), the service is taken as exponential by the chain, and each unit is fed by the
/// infinite-server flow, as in <see cref="TimeVaryingSolver"/>. Thread-safe.
/// </para>
/// </remarks>
public static class HourlyStaffingSearch
{
    /// <summary>Finds a roster for every unit with finite servers of <paramref name="network"/>.</summary>
    /// <param name="network">A validated network (its arrival profile, if any, shapes the load).</param>
    /// <param name="targets">Mean wait, mean time in unit, P(wait &gt; t) and utilisation, each hour; P(full) is not used.</param>
    /// <param name="options">Shift blocks and the confirming simulation; null for the defaults.</param>
    /// <param name="impossible">Why a target cannot be met by any servers (unit id and reason), or null.</param>
    public static HourlyStaffingPlan? Find(Network network, StaffingTargets targets, HourlyStaffingOptions? options, out (string UnitId, string Reason)? impossible)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(targets);
        options ??= HourlyStaffingOptions.Default;
        impossible = null;
        var traffic = TimeVaryingTraffic.Solve(network);
        var found = ImmutableArray.CreateBuilder<UnitHourlyStaffing>();
        for (int i = 0; i < network.Units.Length; i++)
        {
            var unit = network.Units[i];
            if (unit.Servers.IsUnlimited)
            {
                continue;
            }

            var roster = ForUnit(unit, traffic.Units[i], targets, options, out string? reason);
            if (roster is null)
            {
                impossible = (unit.Id, reason!);
                return null;
            }

            found.Add(roster);
        }

        var plan = new HourlyStaffingPlan(targets, options, traffic.CycleHours, found.ToImmutable());
        return options.Simulate && plan.CycleHours == ArrivalProfile.HoursPerDay ? HourlySimulationCheck.Confirm(network, plan) : plan;
    }

    /// <summary>The roster of one unit from its load over the cycle; null with a reason when no servers meet a target.</summary>
    public static UnitHourlyStaffing? ForUnit(Unit unit, UnitLoadOverCycle load, StaffingTargets targets, HourlyStaffingOptions options, out string? impossible)
    {
        ArgumentNullException.ThrowIfNull(unit);
        ArgumentNullException.ThrowIfNull(load);
        ArgumentNullException.ThrowIfNull(targets);
        ArgumentNullException.ThrowIfNull(options);
        var loads = load.OfferedLoadByHour;
        int hours = loads.Length;
        double meanArrivals = load.ArrivalsPerHourByHour.Average();
        double meanServiceHours = meanArrivals > 0.0 ? loads.Average() / meanArrivals : unit.EffectiveService.MeanHours;
        var blocks = ShiftBlocks.Of(options.ShiftStarts, hours);
        var servers = new int[hours];
        for (int h = 0; h < hours; h++)
        {
            servers[h] = StaffingSearch.MinimumServers(loads[h] / meanServiceHours, meanServiceHours, 1, targets with { MaxTurnedAway = null }, out impossible) ?? 0;
            if (impossible is not null)
            {
                return null;
            }
        }

        ShiftBlocks.Level(blocks, servers);
        var evaluator = new CycleEvaluator(unit, load, targets, meanServiceHours, options.ExactChain);
        int budget = options.MaxEvaluations;
        var (waits, ratios) = evaluator.Evaluate(servers);
        budget--;
        while (budget > 0 && !ratios.All(HourlyTargetCheck.Meets))
        {
            int worst = Worst(ratios, loads, servers);
            ShiftBlocks.Add(blocks, servers, blocks[worst], 1);
            (waits, ratios) = evaluator.Evaluate(servers);
            budget--;
        }

        for (bool removed = ratios.All(HourlyTargetCheck.Meets); removed && budget > 0;)
        {
            removed = false;
            foreach (int block in ShiftBlocks.BySlack(blocks, ratios))
            {
                if (budget <= 0 || servers[ShiftBlocks.FirstHour(blocks, block)] <= 1)
                {
                    continue;
                }

                ShiftBlocks.Add(blocks, servers, block, -1);
                var (fewerWaits, fewerRatios) = evaluator.Evaluate(servers);
                budget--;
                if (fewerRatios.All(HourlyTargetCheck.Meets))
                {
                    (waits, ratios, removed) = (fewerWaits, fewerRatios, true);
                }
                else
                {
                    ShiftBlocks.Add(blocks, servers, block, 1);
                }
            }
        }

        impossible = null;
        return new UnitHourlyStaffing
        {
            UnitId = unit.Id,
            Method = waits.Method,
            OfferedLoadByHour = loads,
            ArrivalsPerHourByHour = load.ArrivalsPerHourByHour,
            ServersByHour = [.. servers],
            MeanWaitHoursByHour = waits.IsStable ? waits.MeanWaitHoursByHour : [],
            WaitOverByHour = waits.IsStable && targets.WaitTail is WaitTailTarget tail
                ? [.. Enumerable.Range(0, hours).Select(h => HourlyTargetCheck.WaitOver(waits, h, tail))]
                : [],
            MeetsByHour = [.. ratios.Select(HourlyTargetCheck.Meets)],
            FlatServers = Flat(evaluator, servers.Max(), hours, ratios.All(HourlyTargetCheck.Meets)),
        };
    }

    /// <summary>The hour that misses most; where every hour is unstable, the one with the highest load per server.</summary>
    private static int Worst(double[] ratios, ImmutableArray<double> loads, int[] servers)
    {
        bool unstable = ratios.All(double.IsPositiveInfinity);
        int worst = 0;
        double worstValue = double.NegativeInfinity;
        for (int h = 0; h < ratios.Length; h++)
        {
            double value = unstable ? loads[h] / Math.Max(servers[h], 1) : ratios[h];
            if (value > worstValue)
            {
                (worst, worstValue) = (h, value);
            }
        }

        return worst;
    }

    /// <summary>
    /// The fewest servers, the same all day, that meet the targets in every hour, searched down from the roster's most
    /// servers <paramref name="start"/>: having at least the roster's servers in every hour, that many meet the
    /// targets whenever the roster does. When the roster itself misses (the search ran out of evaluations) there is
    /// nothing to compare, and the roster's most servers are reported, so the search never runs without bound.
    /// </summary>
    private static int Flat(CycleEvaluator evaluator, int start, int hours, bool rosterMeets)
    {
        bool Meets(int c) => evaluator.Evaluate([.. Enumerable.Repeat(c, hours)]).Ratios.All(HourlyTargetCheck.Meets);
        int c = start;
        if (!rosterMeets)
        {
            return c;
        }

        while (c > 1 && Meets(c - 1))
        {
            c--;
        }

        return c;
    }
}
