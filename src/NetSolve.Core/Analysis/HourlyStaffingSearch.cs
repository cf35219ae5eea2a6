using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>
/// The fewest servers in each hour (or shift block) with which every hour of a unit meets the targets, by the
/// time-varying method: the exact periodic chain for rosters up to <see cref="ExactChainOptions.MaxServers"/>
/// servers, MOL above, or the solver's own choice when <see cref="HourlyStaffingOptions.ExactChain"/> is false
/// (docs/time-of-day.md).
/// </summary>
/// <remarks>
/// <para>
/// The queue carries over from hour to hour, so an hour cannot be staffed on its own. The search starts from the
/// stationary staffing of each hour at its offered load (the modified-offered-load staffing of Jennings, Mandelbaum,
/// Massey and Whitt, "Server staffing to meet time-varying demand", Management Science 42(10), 1996, 1383–1394), and
/// from ceil(load ÷ cap) in each hour under a utilisation cap, which needs no solve at all. It solves the whole cycle
/// and adds one server to every block with an hour that misses its target, round after round, until every hour
/// meets it; then it tries one server fewer in each block, most slack first, keeping every change after which every
/// hour still meets the targets, until a pass removes none. The result is a local minimum: no single block can lose
/// a server; it is not proven to be the fewest staff-hours overall.
/// </para>
/// <para>
/// The work is bounded: at most <see cref="HourlyStaffingOptions.MaxEvaluations"/> solves of the cycle per unit,
/// the flat comparison included, and a roster tried before is not solved again. Every hour keeps at least one
/// server. Units with unlimited servers are left out. A capacity is not modelled here (the chain is solved without
/// one), the service is taken as exponential by the chain, and each unit is fed by the infinite-server flow, as in
/// <see cref="TimeVaryingSolver"/>. Thread-safe.
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
        // Refused before the search, as the steady state refuses it: otherwise the search adds servers one evaluation
        // at a time towards a count no unit may have (a cap of 0 never met; a tiny cap past the most servers).
        impossible = CapUnreachable(loads, targets.MaxUtilisation);
        if (impossible is not null)
        {
            return null;
        }

        var waitTargets = targets with { MaxTurnedAway = null, MaxUtilisation = null };
        for (int h = 0; h < hours; h++)
        {
            servers[h] = Math.Max(1, UnderCap(loads[h], targets.MaxUtilisation));
            if (waitTargets.IsEmpty)
            {
                continue;
            }

            int? stationary = StaffingSearch.MinimumServers(loads[h] / meanServiceHours, meanServiceHours, 1, waitTargets, out impossible);
            if (impossible is not null)
            {
                return null;
            }

            servers[h] = Math.Max(servers[h], stationary ?? 0);
        }

        ShiftBlocks.Level(blocks, servers);
        impossible = unit.Capacity is null ? NeverSettles(loads, servers, meanServiceHours) : null;
        if (impossible is not null)
        {
            return null;
        }

        var evaluator = new CycleEvaluator(unit, load, targets, meanServiceHours, options.ExactChain);
        int budget = options.MaxEvaluations;
        bool Spend() => evaluator.Solves < budget;
        var (waits, ratios) = evaluator.Evaluate(servers);
        while (Spend() && !ratios.All(HourlyTargetCheck.Meets))
        {
            AddWhereMissing(blocks, servers, ratios, loads);
            (waits, ratios) = evaluator.Evaluate(servers);
        }

        var floor = blocks.Select((_, h) => Math.Max(1, UnderCap(loads[h], targets.MaxUtilisation))).ToArray();
        for (bool removed = ratios.All(HourlyTargetCheck.Meets) && !waitTargets.IsEmpty; removed && Spend();)
        {
            removed = false;
            foreach (int block in ShiftBlocks.BySlack(blocks, ratios))
            {
                if (!Spend() || !ShiftBlocks.CanRemove(blocks, servers, floor, block))
                {
                    continue;
                }

                ShiftBlocks.Add(blocks, servers, block, -1);
                var (fewerWaits, fewerRatios) = evaluator.Evaluate(servers);
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

        int flat = Flat(evaluator, servers, floor.Max(), ratios.All(HourlyTargetCheck.Meets), budget);
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
            FlatServers = flat,
            Evaluations = evaluator.Solves,
        };
    }

    /// <summary>Why no servers keep every hour under <paramref name="cap"/>, or null when some do (or there is no cap or no load).</summary>
    private static string? CapUnreachable(ImmutableArray<double> loads, double? cap)
    {
        if (cap is not double most || !loads.Any(load => load > 0.0))
        {
            return null;
        }

        if (!(most > 0.0))
        {
            return StaffingSearch.ZeroUtilisation;
        }

        double needed = Math.Ceiling((loads.Max() / most) - StaffingSearch.TargetTolerance);
        return needed > Servers.MaxCount ? StaffingSearch.TooMany((long)Math.Min(needed, 1e15)) : null;
    }

    /// <summary>
    /// Why the starting roster cannot be judged hour by hour, or null: its queue would take longer than
    /// <see cref="CycleSettling.MostHours"/> to settle into its daily pattern (a cap near 100% with no waiting target).
    /// Refused at once: the chain would take minutes to find a pattern the unit never reaches in practice. A unit with a
    /// capacity is held within its places and settles however busy it is (it turns patients away instead).
    /// </summary>
    private static string? NeverSettles(ImmutableArray<double> loads, int[] servers, double meanServiceHours)
    {
        double hours = CycleSettling.Hours(loads, servers, meanServiceHours);
        if (hours <= CycleSettling.MostHours)
        {
            return null;
        }

        double busy = loads.Average() / servers.Average();
        return string.Create(CultureInfo.InvariantCulture,
            $"its servers would be busy {busy * 100.0:0.#}% of the time over the cycle, and a queue that busy takes {(double.IsFinite(hours) ? $"about {hours / CycleSettling.HoursPerYear:0.#} years" : "for ever")} to settle into a daily pattern (past the year a roster is judged over): set a lower --max-util (0.85 is the common planning rule of thumb) or a waiting target");
    }

    /// <summary>Servers that keep an hour's utilisation at or under the cap: ceil(load ÷ cap); 0 without a cap.</summary>
    private static int UnderCap(double load, double? cap) =>
        cap is double most && most > 0.0 ? (int)Math.Ceiling((load / most) - StaffingSearch.TargetTolerance) : 0;

    /// <summary>
    /// One server more in every block with an hour that misses its targets; where every hour is unstable, in the block
    /// of the hour with the highest load per server (the one that keeps the cycle from settling).
    /// </summary>
    private static void AddWhereMissing(int[] blocks, int[] servers, double[] ratios, ImmutableArray<double> loads)
    {
        if (ratios.All(double.IsPositiveInfinity))
        {
            int worst = 0;
            for (int h = 1; h < ratios.Length; h++)
            {
                worst = loads[h] / Math.Max(servers[h], 1) > loads[worst] / Math.Max(servers[worst], 1) ? h : worst;
            }

            ShiftBlocks.Add(blocks, servers, blocks[worst], 1);
            return;
        }

        foreach (int block in Enumerable.Range(0, ratios.Length).Where(h => !HourlyTargetCheck.Meets(ratios[h])).Select(h => blocks[h]).Distinct().ToArray())
        {
            ShiftBlocks.Add(blocks, servers, block, 1);
        }
    }

    /// <summary>
    /// The fewest servers, the same all day, that meet the targets in every hour, searched by halving between the
    /// highest floor (ceil(load ÷ cap), or 1) and the roster's most servers: having at least the roster's servers in
    /// every hour, that many meet the targets whenever the roster does, and more servers never wait longer. When the
    /// roster itself misses (the search ran out of evaluations), or the budget runs out, the roster's most servers are
    /// reported, so the search never runs without bound.
    /// </summary>
    private static int Flat(CycleEvaluator evaluator, int[] roster, int floor, bool rosterMeets, int budget)
    {
        int hours = roster.Length;
        int high = roster.Max();
        if (!rosterMeets)
        {
            return high;
        }

        int low = Math.Max(1, floor) - 1;
        while (high - low > 1 && evaluator.Solves < budget)
        {
            int middle = low + ((high - low) / 2);
            if (evaluator.Evaluate([.. Enumerable.Repeat(middle, hours)]).Ratios.All(HourlyTargetCheck.Meets))
            {
                high = middle;
            }
            else
            {
                low = middle;
            }
        }

        return high - low > 1 ? roster.Max() : high;
    }
}
