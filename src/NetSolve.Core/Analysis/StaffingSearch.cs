using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>
/// The fewest added servers such that every unit meets the targets: for each unit, the smallest c at least today's
/// with utilisation, mean wait, mean time in unit and P(wait &gt; t) within the targets.
/// </summary>
/// <remarks>
/// Exact, not heuristic. In a Jackson network each unit's flow comes from the traffic equations and does not depend
/// on any unit's servers, and each target involves only its own unit, so the units are independent and the total
/// (however weighted by cost per server) is smallest when each unit takes its own smallest c. Every measure checked
/// falls as c grows (ρ = a/c; Erlang C and Wq = C/(cμ − λ) decrease in c; P(Wq &gt; t) = C·e^(−(cμ−λ)t) too), so
/// the first c that meets all targets, found by stepping c upward with the Erlang B recurrence (O(1) per step), is
/// the minimum. Thread-safe.
/// </remarks>
public static class StaffingSearch
{
    /// <summary>
    /// Relative: a measure within this of its target meets it, so that a target met exactly on paper (7.2 erlangs on
    /// 12 beds is 60%) is not missed by the last bit of a floating-point quotient.
    /// </summary>
    public const double TargetTolerance = 1e-12;

    /// <summary>Searches every unit of <paramref name="solution"/>'s network.</summary>
    /// <param name="solution">The network solved as given.</param>
    /// <param name="targets">What every unit must meet.</param>
    /// <param name="costPerServer">Optional weight of one server per unit id (default 1); every id must name a unit.</param>
    public static StaffingPlan MeetTargets(NetworkSolution solution, StaffingTargets targets, IReadOnlyDictionary<string, double>? costPerServer = null)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(targets);
        var network = solution.Network;
        if (costPerServer?.Keys.FirstOrDefault(id => !network.Units.Any(unit => unit.Id == id)) is string unknown)
        {
            throw new ArgumentException($"No unit '{unknown}' in the network.", nameof(costPerServer));
        }

        var answers = ImmutableArray.CreateBuilder<UnitStaffing>(network.Units.Length);
        var units = network.Units.ToBuilder();
        foreach (var result in solution.Units)
        {
            var unit = result.Unit;
            double cost = costPerServer?.GetValueOrDefault(unit.Id, 1.0) ?? 1.0;
            int? current = unit.Servers.IsUnlimited ? null : unit.Servers.Count;
            int? required = MinimumServers(result.ArrivalsPerHour, unit.MeanServiceHours, current, targets, out string? impossible, network.TimeUnit);
            answers.Add(new UnitStaffing(unit.Id, current, required, cost, impossible));
            if (required is int servers && current is not null)
            {
                units[answers.Count - 1] = unit with { Servers = Servers.Of(servers) };
            }
        }

        var plan = answers.MoveToImmutable();
        NetworkSolution? after = null;
        if (plan.All(answer => answer.Impossible is null))
        {
            var flows = solution.Units.Select(unit => unit.ArrivalsPerHour).ToArray();
            after = NetworkSolver.FromFlows(network with { Units = units.ToImmutable() }, flows, solution.StrainThreshold);
        }

        return new StaffingPlan(targets, plan, solution, after);
    }

    /// <summary>
    /// The fewest servers, at least <paramref name="atLeast"/>, with which an M/M/c unit meets <paramref name="targets"/>;
    /// null with a reason when none does. For unlimited servers (<paramref name="atLeast"/> null) returns null and
    /// a reason only when a target cannot be met (a mean time in unit below the service time).
    /// </summary>
    /// <param name="arrivalsPerHour">λ, finite and not negative.</param>
    /// <param name="meanServiceHours">1/μ, positive.</param>
    /// <param name="atLeast">Servers today (the search never removes servers); null for unlimited.</param>
    /// <param name="targets">The targets.</param>
    /// <param name="impossible">Why no number of servers will do, or null.</param>
    /// <param name="timeUnit">The time unit the reason states times in.</param>
    public static int? MinimumServers(double arrivalsPerHour, double meanServiceHours, int? atLeast, StaffingTargets targets, out string? impossible, TimeUnit timeUnit = TimeUnit.Hour)
    {
        ArgumentNullException.ThrowIfNull(targets);
        impossible = arrivalsPerHour > 0.0 ? Unreachable(meanServiceHours, targets, atLeast is null, timeUnit) : null;
        if (impossible is not null || atLeast is not int start)
        {
            return null;
        }

        if (!(arrivalsPerHour > 0.0))
        {
            return start;
        }

        double load = arrivalsPerHour * meanServiceHours;
        double maxUtilisation = Math.Min(1.0, targets.MaxUtilisation ?? 1.0);
        double waitLimit = Math.Min(targets.MaxMeanWaitHours ?? double.PositiveInfinity, (targets.MaxMeanTimeInUnitHours ?? double.PositiveInfinity) - meanServiceHours);
        long first = Math.Max(start, Math.Max((long)Math.Floor(load) + 1, (long)Math.Ceiling(load / maxUtilisation)));
        while (first > start && load < first - 1 && Within(load / (first - 1), maxUtilisation))
        {
            first--; // Ceiling of a rounded quotient can overshoot by one.
        }

        if (first > Servers.MaxCount)
        {
            impossible = TooMany(first);
            return null;
        }

        double blocking = 1.0;
        for (int k = 1; k <= first; k++)
        {
            blocking = load * blocking / (k + (load * blocking));
        }

        for (long c = first; c <= Servers.MaxCount; c++)
        {
            if (c > first)
            {
                blocking = load * blocking / (c + (load * blocking));
            }

            if (Meets((int)c, load, blocking, arrivalsPerHour, meanServiceHours, maxUtilisation, waitLimit, targets.WaitTail))
            {
                return (int)c;
            }
        }

        impossible = TooMany(Servers.MaxCount + 1L);
        return null;
    }

    private static bool Meets(int servers, double load, double blocking, double arrivalsPerHour, double meanServiceHours,
        double maxUtilisation, double waitLimit, WaitTailTarget? tail)
    {
        double utilisation = load / servers;
        if (utilisation >= 1.0 || !Within(utilisation, maxUtilisation))
        {
            return false;
        }

        double waitProbability = Math.Min(1.0, blocking / (1.0 - (utilisation * (1.0 - blocking))));
        double drainPerHour = (servers / meanServiceHours) - arrivalsPerHour;
        if (!Within(waitProbability / drainPerHour, waitLimit))
        {
            return false;
        }

        return tail is null || Within(waitProbability * Math.Exp(-drainPerHour * tail.WaitHours), tail.MaxProbability);
    }

    /// <summary>True when <paramref name="value"/> is at most <paramref name="target"/>, within <see cref="TargetTolerance"/> relative.</summary>
    public static bool Within(double value, double target) => value <= target + (TargetTolerance * Math.Abs(target));

    private static string? Unreachable(double meanServiceHours, StaffingTargets targets, bool unlimited, TimeUnit timeUnit)
    {
        if (targets.MaxMeanTimeInUnitHours is double time && (unlimited ? meanServiceHours > time : meanServiceHours >= time))
        {
            string suffix = TimeConstants.Suffix(timeUnit);
            return string.Create(CultureInfo.InvariantCulture,
                $"the mean service time alone is {TimeConstants.FromHours(meanServiceHours, timeUnit):0.####} {suffix}, so a mean time in unit of {TimeConstants.FromHours(time, timeUnit):0.####} {suffix} cannot be met by adding servers; shorten the service instead");
        }

        if (unlimited)
        {
            return null;
        }

        if (targets.MaxUtilisation is double utilisation && !(utilisation > 0.0))
        {
            return "a maximum utilisation of 0 cannot be met while patients arrive";
        }

        if (targets.MaxMeanWaitHours is double wait && !(wait > 0.0))
        {
            return "a mean wait of 0 cannot be met: with finite servers some arriving patients always wait (Erlang C is above 0)";
        }

        if (targets.WaitTail is { MaxProbability: double p } && !(p > 0.0))
        {
            return "a 0% chance of a long wait cannot be met: with finite servers the chance of waiting longer than any time is above 0";
        }

        return null;
    }

    private static string TooMany(long servers) => string.Create(CultureInfo.InvariantCulture,
        $"would need {servers} servers or more, beyond the {Servers.MaxCount} a unit may have");
}
