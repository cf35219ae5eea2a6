using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Fitting.Estimation;

/// <summary>
/// The entry point of the fit's estimation and confidence: from each unit's observations to its evidence (stay
/// distribution with censoring, rates, routing fractions, load, profiles, warnings), and to the network's summary.
/// </summary>
/// <remarks>Pure: the same observations give the same evidence. Methods and their sources: docs/movement-log.md, "How fit estimates and how sure it is".</remarks>
public static class FitEvidence
{
    /// <summary>The evidence of one unit observed over <paramref name="window"/>.</summary>
    /// <exception cref="ArgumentException">Inconsistent observations (see <see cref="UnitObservations.Problem"/>).</exception>
    public static UnitEvidence Estimate(UnitObservations unit, ExtractWindow window)
    {
        ArgumentNullException.ThrowIfNull(unit);
        ArgumentNullException.ThrowIfNull(window);
        if (unit.Problem() is string problem)
        {
            throw new ArgumentException(problem, nameof(unit));
        }

        var stay = StayEvidence.Estimate(unit);
        var entries = RateEvidence.Of(unit.EntryHours.Count(entry => entry >= 0.0 && entry <= window.Hours), window.Hours);
        var arrivals = RateEvidence.Of(stay.Stays - stay.Truncated, window.Hours);
        int departures = unit.RoutedStays;
        var routes = departures == 0 ? [] : unit.Routes
            .Where(route => route.Count > 0)
            .OrderBy(route => route.ToUnitId, StringComparer.Ordinal)
            .Select(route => RouteEvidence.Of(route.ToUnitId, Math.Min(route.Count, departures), departures))
            .ToImmutableArray();
        var load = unit.Servers is int servers && stay.Mean is IntervalEstimate mean ? LoadEvidence.Of(arrivals, mean, servers) : null;
        var evidence = new UnitEvidence(unit.UnitId, stay, entries, arrivals, routes, WaitEvidence.Of(unit.WaitHours), unit.Servers, unit.NeverQueued,
            load, ArrivalProfileEstimate.Estimate(unit.EntryHours, window), []);
        return evidence with { Warnings = Warn(evidence) };
    }

    /// <summary>The evidence of every unit and of the network as a whole.</summary>
    public static NetworkEvidence Summarise(IEnumerable<UnitObservations> units, ExtractWindow window)
    {
        ArgumentNullException.ThrowIfNull(units);
        ArgumentNullException.ThrowIfNull(window);
        // One pass, keeping each unit's entries only as counts per slot: the units may be built one at a time from a large log.
        var evidence = ImmutableArray.CreateBuilder<UnitEvidence>();
        var hourCounts = new int[ArrivalProfile.HoursPerDay];
        var dayCounts = new int[ArrivalProfile.DaysPerWeek];
        foreach (var unit in units)
        {
            var unitEvidence = Estimate(unit, window);
            evidence.Add(unitEvidence);
            Add(hourCounts, unitEvidence.Profile.HourOfDay.Entries);
            Add(dayCounts, unitEvidence.Profile.DayOfWeek.Entries);
        }

        return new NetworkEvidence(window, evidence.ToImmutable(), RateEvidence.Of(evidence.Sum(unit => unit.Entries.Count), window.Hours),
            ArrivalProfileEstimate.FromCounts(hourCounts, dayCounts, window));
    }

    private static void Add(int[] sums, ImmutableArray<int> counts)
    {
        for (int slot = 0; slot < sums.Length; slot++)
        {
            sums[slot] += counts[slot];
        }
    }

    private static ImmutableArray<FitWarning> Warn(UnitEvidence unit)
    {
        var warnings = ImmutableArray.CreateBuilder<FitWarning>();
        if (unit.Stay.Stays < EvidenceThresholds.MinStays)
        {
            warnings.Add(FitWarning.FewStays(unit.UnitId, unit.Stay.Stays));
        }

        if (unit.Stay.Mean is null && unit.Stay.Stays > 0)
        {
            warnings.Add(FitWarning.NoStayEnded(unit.UnitId, unit.Stay.Stays));
        }

        warnings.AddRange(unit.Routes.Where(route => route.IsThin).Select(route => FitWarning.ThinRoute(unit.UnitId, route.ToUnitId, route.Count)));
        if (unit.NeverQueued && unit.Servers is int servers)
        {
            warnings.Add(FitWarning.NeverQueued(unit.UnitId, servers));
        }

        if (unit.Load is { MayReachServers: true } load)
        {
            warnings.Add(FitWarning.LoadMayReachServers(unit.UnitId, load.Servers, load.Load.Interval));
        }

        return warnings.ToImmutable();
    }
}
