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
    /// <exception cref="ArgumentException">There is not one unit result per unit of the traffic.</exception>
    public static ImmutableArray<GroupResult> Build(GroupTrafficSolution traffic, IReadOnlyList<UnitResult> units)
    {
        ArgumentNullException.ThrowIfNull(traffic);
        ArgumentNullException.ThrowIfNull(units);
        if (units.Count != traffic.Units.Length)
        {
            throw new ArgumentException("Expected one unit result per unit of the traffic.", nameof(units));
        }

        double?[] waitHours = [.. units.Select(unit => unit.MeanWaitHours)];
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
}
