using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>
/// The fewest added servers such that every unit meets the targets: for each unit, the smallest c at least today's
/// with utilisation, mean wait, mean time in unit, P(wait &gt; t) and, for a unit with a capacity, P(full) within the
/// targets, each computed by the same method as the solver (docs/methods.md).
/// </summary>
/// <remarks>
/// <para>
/// A unit without a capacity is searched with <see cref="GgcFormulas"/> at its solved flow, mean service, arrival SCV
/// and service SCV (Erlang C exactly when both SCVs are 1). A unit with a capacity K and c servers is searched with
/// <see cref="FiniteCapacityFormulas"/> at its offered rate, keeping its K − c waiting places: each added server comes
/// with one more place (K rises with c), so a pure loss unit (K = c) stays one and is searched by Erlang B.
/// </para>
/// <para>
/// Exact for a Jackson network (Poisson arrivals, exponential service, no capacity): each unit's flow comes from the
/// traffic equations and does not depend on any unit's servers, and each target involves only its own unit, so the
/// units are independent and the total (however weighted by cost per server) is smallest when each unit takes its own
/// smallest c. Every measure checked falls as c grows, so the first c that meets all targets, found by stepping c
/// upward with the Erlang B recurrence (O(1) per step), is the minimum.
/// </para>
/// <para>
/// Otherwise a unit's arrival SCV depends slightly on the servers upstream (the departure formula) and, with
/// capacities, a unit's offered rate depends on the blocking upstream. The search holds each at the value solved
/// for the network being searched, then re-solves the network with the chosen servers by
/// <see cref="NetworkSolver.Solve"/>, so the reported 'after' numbers are exact for those servers; if some unit then
/// misses a target (its flow or arrival SCV moved), it searches again from the re-solved values, never removing a
/// server, until no unit changes (at most <see cref="MaxRounds"/> rounds). Thread-safe.
/// </para>
/// </remarks>
public static class StaffingSearch
{
    /// <summary>
    /// Relative: a measure within this of its target meets it, so that a target met exactly on paper (7.2 erlangs on
    /// 12 beds is 60%) is not missed by the last bit of a floating-point quotient.
    /// </summary>
    public const double TargetTolerance = 1e-12;

    /// <summary>
    /// The most search-and-re-solve rounds: each round after the first adds at least one server or ends the search.
    /// A Jackson network settles in one; flows and arrival SCVs that move with the servers settle in a few.
    /// </summary>
    public const int MaxRounds = 50;

    /// <summary>Searches every unit of <paramref name="solution"/>'s network.</summary>
    /// <param name="solution">The network solved as given.</param>
    /// <param name="targets">What every unit must meet.</param>
    /// <param name="costPerServer">Optional weight of one server per unit id (default 1); every id must name a unit.</param>
    public static StaffingPlan MeetTargets(NetworkSolution solution, StaffingTargets targets, IReadOnlyDictionary<string, double>? costPerServer = null) =>
        MeetTargets(solution, targets, costPerServer, only: null);

    /// <summary>
    /// Searches the units of <paramref name="solution"/>'s network named in <paramref name="only"/> (every unit when
    /// null), each against <paramref name="targets"/> and its own (<see cref="StaffingTargets.For"/>); the others keep
    /// their servers and are not checked.
    /// </summary>
    /// <param name="solution">The network solved as given.</param>
    /// <param name="targets">What every searched unit must meet, beside its own targets.</param>
    /// <param name="costPerServer">Optional weight of one server per unit id (default 1); every id must name a unit.</param>
    /// <param name="only">The unit ids that may take servers; null for all. Every id must name a unit.</param>
    public static StaffingPlan MeetTargets(NetworkSolution solution, StaffingTargets targets, IReadOnlyDictionary<string, double>? costPerServer, IReadOnlySet<string>? only)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(targets);
        var network = solution.Network;
        if (costPerServer?.Keys.FirstOrDefault(id => !network.Units.Any(unit => unit.Id == id)) is string unknown)
        {
            throw new ArgumentException($"No unit '{unknown}' in the network.", nameof(costPerServer));
        }

        if (only?.FirstOrDefault(id => !network.Units.Any(unit => unit.Id == id)) is string missing)
        {
            throw new ArgumentException($"No unit '{missing}' in the network.", nameof(only));
        }

        var inputs = SolverInputs.Of(network, network.Groups.IsEmpty ? null : GroupTraffic.Solve(network));
        int n = network.Units.Length;
        var floor = network.Units.Select(unit => unit.Servers.IsUnlimited ? (int?)null : unit.Servers.Count).ToArray();
        var searched = solution;
        NetworkSolution? after = null;
        UnitStaffing[] answers = [];
        for (int round = 0; round < MaxRounds; round++)
        {
            answers = new UnitStaffing[n];
            bool changed = false;
            for (int i = 0; i < n; i++)
            {
                var unit = network.Units[i];
                double cost = costPerServer?.GetValueOrDefault(unit.Id, 1.0) ?? 1.0;
                if (only is not null && !only.Contains(unit.Id))
                {
                    answers[i] = new UnitStaffing(unit.Id, floor[i], floor[i], cost, null);
                    continue;
                }

                int? required = Required(searched.Units[i], inputs.MeanServiceHours[i], floor[i], targets.For(unit), network.TimeUnit, out string? impossible);
                answers[i] = new UnitStaffing(unit.Id, unit.Servers.IsUnlimited ? null : unit.Servers.Count, required, cost, impossible);
                changed |= required is int r && r != floor[i];
                floor[i] = required ?? floor[i];
            }

            if (answers.Any(answer => answer.Impossible is not null))
            {
                after = null;
                break;
            }

            if (round > 0 && !changed)
            {
                break;
            }

            after = NetworkSolver.Solve(network with { Units = [.. network.Units.Select((unit, i) => WithServers(unit, floor[i]))] }, solution.StrainThreshold);
            searched = after;
        }

        return new StaffingPlan(targets, [.. answers], solution, after);
    }

    /// <summary>The unit with <paramref name="servers"/> servers; a capacity keeps its waiting places (rises by as many).</summary>
    private static Unit WithServers(Unit unit, int? servers)
    {
        if (servers is not int count || unit.Servers.IsUnlimited || count == unit.Servers.Count)
        {
            return unit;
        }

        return unit with
        {
            Servers = Servers.Of(count),
            Capacity = unit.Capacity is int capacity ? capacity + (count - unit.Servers.Count) : null,
        };
    }

    private static int? Required(UnitResult result, double meanServiceHours, int? atLeast, StaffingTargets targets, TimeUnit timeUnit, out string? impossible)
    {
        var unit = result.Unit;
        if (unit.Capacity is int capacity && !unit.Servers.IsUnlimited)
        {
            double offered = result.ArrivalsPerHour + result.TurnedAwayPerHour + result.DivertedPerHour;
            return MinimumServersWithCapacity(offered, meanServiceHours, atLeast ?? unit.Servers.Count, capacity - unit.Servers.Count, targets, out impossible, timeUnit,
                result.ServiceScv, unit.EffectiveService);
        }

        return MinimumServers(result.ArrivalsPerHour, meanServiceHours, atLeast, result.ArrivalScv, result.ServiceScv, targets, out impossible, timeUnit, unit.EffectiveService);
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
    public static int? MinimumServers(double arrivalsPerHour, double meanServiceHours, int? atLeast, StaffingTargets targets, out string? impossible, TimeUnit timeUnit = TimeUnit.Hour) =>
        MinimumServers(arrivalsPerHour, meanServiceHours, atLeast, 1.0, 1.0, targets, out impossible, timeUnit);

    /// <summary>
    /// The fewest servers, at least <paramref name="atLeast"/>, with which a unit without a capacity meets
    /// <paramref name="targets"/> by <see cref="GgcFormulas"/> (Erlang C when both SCVs are 1); null with a reason
    /// when none does, and null for unlimited servers (<paramref name="atLeast"/> null) with a reason only when a
    /// target cannot be met. The P(full) target does not apply to a unit without a capacity.
    /// </summary>
    /// <param name="arrivalsPerHour">λ, finite and not negative.</param>
    /// <param name="meanServiceHours">E[S], positive.</param>
    /// <param name="atLeast">Servers today (the search never removes servers); null for unlimited.</param>
    /// <param name="arrivalScv">ca², held fixed over the search (0 to <see cref="GgcFormulas.MaximumScv"/>).</param>
    /// <param name="serviceScv">cs² (0 to <see cref="GgcFormulas.MaximumScv"/>).</param>
    /// <param name="targets">The targets.</param>
    /// <param name="impossible">Why no number of servers will do, or null.</param>
    /// <param name="timeUnit">The time unit the reason states times in.</param>
    /// <param name="serviceShape">The unit's service distribution, for the light-traffic term when cs² &gt; 1 (as the solver uses it); null: a gamma.</param>
    public static int? MinimumServers(double arrivalsPerHour, double meanServiceHours, int? atLeast, double arrivalScv, double serviceScv,
        StaffingTargets targets, out string? impossible, TimeUnit timeUnit = TimeUnit.Hour, ServiceDistribution? serviceShape = null)
    {
        ArgumentNullException.ThrowIfNull(targets);
        bool neverWaits = arrivalScv == 0.0 && serviceScv == 0.0;
        impossible = arrivalsPerHour > 0.0 ? Unreachable(meanServiceHours, targets, atLeast is null, neverWaits, timeUnit) : null;
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

        // One server with non-Poisson arrivals takes the Kraemer–Langenbach-Belz correction, which depends on the load:
        // asked of GgcFormulas itself. Otherwise the variability factor comes from GgcFormulas.VariabilityFactor for
        // each c (it depends on c and the load for several servers), exactly 1.0 when both SCVs are 1, so the checks
        // below are then Erlang C to the last bit.
        bool correctedOneServer = arrivalScv != 1.0;
        if (first == 1 && correctedOneServer && MeetsOneServer(arrivalsPerHour, meanServiceHours, arrivalScv, serviceScv, maxUtilisation, waitLimit, targets.WaitTail))
        {
            return 1;
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

            if ((c > 1 || !correctedOneServer)
                && Meets((int)c, load, blocking, GgcFormulas.VariabilityFactor((int)c, load / c, arrivalScv, serviceScv, serviceShape), arrivalsPerHour, meanServiceHours, maxUtilisation, waitLimit, targets.WaitTail))
            {
                return (int)c;
            }
        }

        impossible = TooMany(Servers.MaxCount + 1L);
        return null;
    }

    /// <summary>
    /// The fewest servers, at least <paramref name="atLeast"/>, with which a unit of limited capacity meets
    /// <paramref name="targets"/> by <see cref="FiniteCapacityFormulas"/> at its offered rate, with
    /// <paramref name="waitingPlaces"/> places beyond the servers (capacity = servers + places; 0 is a pure loss unit,
    /// searched by Erlang B). Such a unit is never unstable; the utilisation, waits and wait tail are those of admitted
    /// patients, the P(full) target is the share of arrivals that find it full. Null with a reason when none does.
    /// </summary>
    /// <param name="offeredPerHour">Patients arriving, admitted or not; finite and not negative.</param>
    /// <param name="meanServiceHours">E[S], positive.</param>
    /// <param name="atLeast">Servers today, at least 1 (the search never removes servers).</param>
    /// <param name="waitingPlaces">Capacity minus servers, held as servers are added; not negative.</param>
    /// <param name="targets">The targets.</param>
    /// <param name="impossible">Why no number of servers will do, or null.</param>
    /// <param name="timeUnit">The time unit the reason states times in.</param>
    /// <param name="serviceScv">cs² of the service (1: exponential, M/M/c/K); the loss formula (no waiting places) ignores it.</param>
    /// <param name="serviceShape">The unit's service distribution, as for <see cref="FiniteCapacityFormulas"/>; null: a gamma.</param>
    public static int? MinimumServersWithCapacity(double offeredPerHour, double meanServiceHours, int atLeast, int waitingPlaces,
        StaffingTargets targets, out string? impossible, TimeUnit timeUnit = TimeUnit.Hour, double serviceScv = 1.0, ServiceDistribution? serviceShape = null)
    {
        ArgumentNullException.ThrowIfNull(targets);
        ArgumentOutOfRangeException.ThrowIfLessThan(atLeast, 1);
        ArgumentOutOfRangeException.ThrowIfNegative(waitingPlaces);
        impossible = offeredPerHour > 0.0 ? UnreachableWithCapacity(meanServiceHours, targets, waitingPlaces, timeUnit) : null;
        if (impossible is not null)
        {
            return null;
        }

        if (!(offeredPerHour > 0.0))
        {
            return atLeast;
        }

        double waitLimit = Math.Min(targets.MaxMeanWaitHours ?? double.PositiveInfinity, (targets.MaxMeanTimeInUnitHours ?? double.PositiveInfinity) - meanServiceHours);
        for (long c = atLeast; c + waitingPlaces <= Servers.MaxCount; c++)
        {
            var unit = FiniteCapacityFormulas.Solve((int)c, (int)c + waitingPlaces, offeredPerHour, meanServiceHours, serviceScv, serviceShape);
            if ((targets.MaxUtilisation is not double utilisation || Within(unit.Utilisation, utilisation))
                && (targets.MaxTurnedAway is not double full || Within(unit.FullProbability, full))
                && Within(unit.MeanWaitHours, waitLimit)
                && (targets.WaitTail is not WaitTailTarget tail || Within(WaitTailTarget.ShareWaitingLonger(unit.WaitProbability, unit.MeanWaitHours, tail.WaitHours), tail.MaxProbability)))
            {
                return (int)c;
            }
        }

        impossible = TooMany(Servers.MaxCount + 1L);
        return null;
    }

    private static bool MeetsOneServer(double arrivalsPerHour, double meanServiceHours, double arrivalScv, double serviceScv,
        double maxUtilisation, double waitLimit, WaitTailTarget? tail)
    {
        var estimate = GgcFormulas.Estimate(1, arrivalsPerHour, meanServiceHours, arrivalScv, serviceScv);
        return estimate.IsStable
            && Within(estimate.Utilisation, maxUtilisation)
            && Within(estimate.MeanWaitHours!.Value, waitLimit)
            && (tail is null || Within(GgcFormulas.WaitLongerThan(1, arrivalsPerHour, meanServiceHours, arrivalScv, serviceScv, tail.WaitHours), tail.MaxProbability));
    }

    private static bool Meets(int servers, double load, double blocking, double factor, double arrivalsPerHour, double meanServiceHours,
        double maxUtilisation, double waitLimit, WaitTailTarget? tail)
    {
        double utilisation = load / servers;
        if (utilisation >= 1.0 || !Within(utilisation, maxUtilisation))
        {
            return false;
        }

        if (factor == 0.0)
        {
            return true; // Fixed arrivals and fixed service below capacity: nobody waits (GgcFormulas).
        }

        double waitProbability = Math.Min(1.0, blocking / (1.0 - (utilisation * (1.0 - blocking))));
        double drainPerHour = (servers / meanServiceHours) - arrivalsPerHour;
        if (!Within(waitProbability / drainPerHour * factor, waitLimit))
        {
            return false;
        }

        return tail is null || Within(waitProbability * Math.Exp(-(drainPerHour / factor) * tail.WaitHours), tail.MaxProbability);
    }

    /// <summary>True when <paramref name="value"/> is at most <paramref name="target"/>, within <see cref="TargetTolerance"/> relative.</summary>
    public static bool Within(double value, double target) => value <= target + (TargetTolerance * Math.Abs(target));

    private static string? Unreachable(double meanServiceHours, StaffingTargets targets, bool unlimited, bool neverWaits, TimeUnit timeUnit)
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
            return ZeroUtilisation;
        }

        if (targets.MaxMeanWaitHours is double wait && !(wait > 0.0) && !neverWaits)
        {
            return "a mean wait of 0 cannot be met: with finite servers some arriving patients always wait (Erlang C is above 0)";
        }

        if (targets.WaitTail is { MaxProbability: double p } && !(p > 0.0) && !neverWaits)
        {
            return "a 0% chance of a long wait cannot be met: with finite servers the chance of waiting longer than any time is above 0";
        }

        return null;
    }

    private static string? UnreachableWithCapacity(double meanServiceHours, StaffingTargets targets, int waitingPlaces, TimeUnit timeUnit)
    {
        if (targets.MaxTurnedAway is double full && !(full > 0.0))
        {
            return "a 0% chance of finding the unit full cannot be met while patients arrive: with a limited capacity the unit is sometimes full";
        }

        // With no waiting places nobody waits, so a zero wait is met; the other reasons are those of any finite unit.
        return Unreachable(meanServiceHours, targets, unlimited: false, neverWaits: waitingPlaces == 0, timeUnit);
    }

    /// <summary>Why a utilisation cap of 0 is refused where patients arrive.</summary>
    internal const string ZeroUtilisation = "a maximum utilisation of 0 cannot be met while patients arrive";

    /// <summary>Why a target needing at least <paramref name="servers"/> servers is refused.</summary>
    internal static string TooMany(long servers) => string.Create(CultureInfo.InvariantCulture,
        $"would need {servers} servers or more, beyond the {Servers.MaxCount} a unit may have");
}
