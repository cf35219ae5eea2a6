using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// The entry point <c>solve</c> uses for the hour-by-hour view: only a network whose arrivals vary by hour (an
/// <c>arrival_profile</c> at the top or in a group) gets one, since without a profile every hour equals the steady state.
/// </summary>
public static class HourByHour
{
    /// <summary>True when external arrivals vary by hour or weekday (a top-level or group <c>arrival_profile</c>).</summary>
    public static bool ArrivalsVary(Network network)
    {
        ArgumentNullException.ThrowIfNull(network);
        return network.ArrivalProfile is not null || network.Groups.Any(group => group.ArrivalProfile is not null);
    }

    /// <summary>
    /// Adds the hour-by-hour solution (the solver's defaults: MOL where the load stays below the servers, the exact chain for heavily loaded small units and where MOL has no answer) to
    /// <paramref name="solution"/> when arrivals vary by hour; returns it unchanged otherwise.
    /// </summary>
    /// <exception cref="TimeVaryingConvergenceException">Flows or a unit did not settle to a periodic pattern.</exception>
    public static NetworkSolution AddWhenArrivalsVary(NetworkSolution solution)
    {
        ArgumentNullException.ThrowIfNull(solution);
        return ArrivalsVary(solution.Network)
            ? solution with { ByHour = TimeVaryingSolver.Solve(solution.Network) }
            : solution;
    }

    /// <summary>
    /// Servers in each hour of a cycle of <paramref name="cycleHours"/> hours: the unit's roster from the file, else its
    /// servers all day; null for unlimited servers without a roster. The same choice <see cref="TimeVaryingSolver.Solve"/> makes.
    /// </summary>
    public static int[]? ServersByHour(Unit unit, int cycleHours)
    {
        ArgumentNullException.ThrowIfNull(unit);
        ServerRoster? roster = unit.Roster is Roster fromFile ? ServerRoster.ByHour(fromFile.ServersByHour)
            : unit.Servers.IsUnlimited ? null
            : ServerRoster.Constant(unit.Servers.Count);
        return roster is null ? null : [.. Enumerable.Range(0, cycleHours).Select(roster.At)];
    }
}
