using System.Collections.Immutable;

namespace NetSolve.Solving;

/// <summary>Builds each patient group's results from the groups' traffic and the solved units.</summary>
public static class GroupResults
{
    /// <summary>
    /// One result per group: the default group first when it has external arrivals (a file whose arrivals are all in
    /// groups leaves it out), then the network's groups in file order.
    /// </summary>
    /// <param name="traffic">The groups' traffic of the network solved.</param>
    /// <param name="units">The solved units, by unit position: their mean waits are shared by every group.</param>
    /// <param name="offeredByGroup">
    /// Where units have bed limits: the rate each group offers each unit (default group first, as in
    /// <see cref="CapacityFlowSolution.OfferedByGroup"/>); a group's patients are admitted in the unit's share
    /// 1 − P(full), and those turned away leave the network. Null without bed limits.
    /// </param>
    /// <exception cref="ArgumentException">There is not one unit result per unit of the traffic.</exception>
    public static ImmutableArray<GroupResult> Build(GroupTrafficSolution traffic, IReadOnlyList<UnitResult> units,
        IReadOnlyList<ImmutableArray<double>>? offeredByGroup = null)
    {
        ArgumentNullException.ThrowIfNull(traffic);
        ArgumentNullException.ThrowIfNull(units);
        if (units.Count != traffic.Units.Length)
        {
            throw new ArgumentException("Expected one unit result per unit of the traffic.", nameof(units));
        }

        double?[] waitHours = [.. units.Select(unit => unit.MeanWaitHours)];
        if (offeredByGroup is not null)
        {
            return [.. traffic.Groups.Select((group, g) => (group, g))
                .Where(pair => !pair.group.IsDefault || pair.group.ExternalArrivalsPerHour > 0.0)
                .Select(pair => WithBedLimits(pair.group, offeredByGroup[pair.g], units))];
        }

        return
        [
            .. traffic.Groups
                .Where(group => !group.IsDefault || group.ExternalArrivalsPerHour > 0.0)
                .Select(group => new GroupResult(
                    group.Id,
                    group.Label,
                    group.ExternalArrivalsPerHour,
                    group.ThroughputPerHour,
                    group.MeanTimeInNetworkHours(waitHours),
                    group.MeanInNetwork(waitHours),
                    [.. group.Units.Select(unit => unit.VisitsPerPatient)])),
        ];
    }

    /// <summary>A group's results where units turn patients away or divert them: only admitted patients visit.</summary>
    private static GroupResult WithBedLimits(GroupFlow group, IReadOnlyList<double> offered, IReadOnlyList<UnitResult> units)
    {
        double external = group.ExternalArrivalsPerHour;
        var visits = new double[units.Count];
        double turnedAway = 0.0;
        double? timeHours = 0.0;
        for (int i = 0; i < units.Count; i++)
        {
            double admitted = offered[i] * (1.0 - units[i].PFull);
            visits[i] = external > 0.0 ? admitted / external : 0.0;
            if (units[i].Unit.WhenFull.IsTurnAway)
            {
                turnedAway += offered[i] * units[i].PFull;
            }

            if (visits[i] > 0.0)
            {
                timeHours = units[i].MeanWaitHours is double wait && timeHours is double sum
                    ? sum + (visits[i] * (wait + group.Units[i].MeanServiceHours))
                    : null;
            }
        }

        return new GroupResult(group.Id, group.Label, external, Math.Max(0.0, external - turnedAway), timeHours,
            timeHours is double time ? external * time : null, [.. visits]);
    }
}
