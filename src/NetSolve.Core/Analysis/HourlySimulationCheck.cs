using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Simulation;

namespace NetSolve.Analysis;

/// <summary>
/// Confirms rosters by a short simulation of the whole network with every unit on its roster: each hour's mean wait
/// is the simulated mean queue in that hour of day ÷ the hour's arrival rate (Little's law over the hour, as the
/// formulas do), with the half-width of its 95% interval scaled alike.
/// </summary>
/// <remarks>
/// An hour meets the targets in simulation when its interval does not lie wholly above them: the lower end of the mean
/// wait is at most the mean-wait target (and, plus the mean service, at most the time-in-unit target). The simulator
/// records no hourly P(wait &gt; t), so for that target the hour passes when the interval's lower end is at most the
/// predicted mean wait (the formula is not optimistic beyond chance). Utilisation needs no simulation.
/// </remarks>
public static class HourlySimulationCheck
{
    /// <summary>The plan with each unit's simulated waits and checks filled in.</summary>
    public static HourlyStaffingPlan Confirm(Network network, HourlyStaffingPlan plan)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(plan);
        var rosters = plan.Units.ToDictionary(unit => unit.UnitId, unit => unit.ServersByHour, StringComparer.Ordinal);
        var rostered = network with { Units = [.. network.Units.Select(unit => rosters.TryGetValue(unit.Id, out var servers) ? OnRoster(unit, servers) : unit)] };
        var result = Simulator.Run(rostered, new SimulationOptions
        {
            Seed = plan.Options.Seed,
            Replications = plan.Options.Replications,
            WarmupHours = 7 * ArrivalProfile.HoursPerDay,
            DurationHours = plan.Options.SimulatedDays * ArrivalProfile.HoursPerDay,
        });
        var byId = result.Units.ToDictionary(unit => unit.Unit.Id, StringComparer.Ordinal);
        var checkedUnits = plan.Units.Select(unit => byId.TryGetValue(unit.UnitId, out var simulated) ? Check(unit, simulated, plan.Targets, network) : unit);
        return plan with { Units = [.. checkedUnits] };
    }

    /// <summary>The unit on <paramref name="servers"/>: its servers the roster's most, its waiting places kept.</summary>
    private static Unit OnRoster(Unit unit, ImmutableArray<int> servers)
    {
        int most = servers.Max();
        return unit with
        {
            Servers = Servers.Of(most),
            Capacity = unit.Capacity is int capacity ? capacity + Math.Max(0, most - unit.Servers.Count) : null,
            Roster = Roster.Create(servers),
        };
    }

    private static UnitHourlyStaffing Check(UnitHourlyStaffing unit, SimulatedUnit simulated, StaffingTargets targets, Network network)
    {
        double meanServiceHours = network.Units.First(u => u.Id == unit.UnitId).EffectiveService.MeanHours;
        var waits = ImmutableArray.CreateBuilder<(double Mean, double? HalfWidth)>(unit.ServersByHour.Length);
        var meets = ImmutableArray.CreateBuilder<bool>(unit.ServersByHour.Length);
        for (int h = 0; h < unit.ServersByHour.Length; h++)
        {
            double arrivals = unit.ArrivalsPerHourByHour[h];
            var queue = simulated.MeanQueueByHour[h];
            double mean = arrivals > 0.0 && queue is { } q ? q.Mean / arrivals : 0.0;
            double? halfWidth = arrivals > 0.0 && queue is { HalfWidth: double hw } ? hw / arrivals : null;
            double low = mean - (halfWidth ?? 0.0);
            bool ok = (targets.MaxMeanWaitHours is not double maxWait || low <= maxWait * (1.0 + StaffingSearch.TargetTolerance))
                && (targets.MaxMeanTimeInUnitHours is not double maxTime || low + meanServiceHours <= maxTime * (1.0 + StaffingSearch.TargetTolerance))
                && (targets.WaitTail is null || unit.MeanWaitHoursByHour.IsEmpty || low <= unit.MeanWaitHoursByHour[h] + StaffingSearch.TargetTolerance);
            waits.Add((mean, halfWidth));
            meets.Add(ok);
        }

        return unit with { SimulatedMeanWaitHoursByHour = waits.MoveToImmutable(), SimulationMeetsByHour = meets.MoveToImmutable() };
    }
}
