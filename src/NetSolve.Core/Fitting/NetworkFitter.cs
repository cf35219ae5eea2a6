using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Fitting.Estimation;
using NetSolve.Model;

namespace NetSolve.Fitting;

/// <summary>
/// Estimates a network from a movement log: external arrival rates from the journeys entering inside the extract,
/// routing fractions from each stay's next unit, the service distribution (exponential or lognormal, mean and cv)
/// fitted with stays still running or already running taken into account, and servers as the most patients seen in
/// service at once.
/// </summary>
/// <remarks>
/// The stages, each replaceable: <see cref="UnitCounter"/> counts (whole numbers, so row order cannot
/// change a result), then the evidence (<see cref="FitEvidence"/>: stay fits with censoring, intervals,
/// profiles, warnings), then each unit's estimates (<see cref="FitUnit"/>), then the network with the arrival profile
/// where the evidence supports one. Rates and routing are the maximum-likelihood estimates for a
/// Jackson network observed over the extract. Peak concurrency is a lower bound on staffed servers where no patient
/// waited; the summary flags those units.
/// </remarks>
public static class NetworkFitter
{
    /// <summary>
    /// Largest service cv a fitted unit may have: the square root of the largest squared cv the solver's formulas take
    /// (1e6, <c>GgcFormulas.MaximumScv</c>, which this layer may not name).
    /// </summary>
    private const double MostServiceCv = 1_000.0;

    /// <summary>
    /// Fits a network to <paramref name="log"/>; times reported in <paramref name="timeUnit"/>. Servers come from
    /// <paramref name="roster"/> (unit id to servers) where it names the unit, otherwise from the peak in service.
    /// </summary>
    /// <exception cref="ArgumentException">The extract spans no time for arrivals, or a unit has no stay that ended.</exception>
    public static FittedNetwork Fit(MovementLog log, string name, TimeUnit timeUnit, IReadOnlyDictionary<string, int>? roster = null)
    {
        ArgumentNullException.ThrowIfNull(log);
        roster ??= new Dictionary<string, int>(StringComparer.Ordinal);
        double windowHours = EntryWindowHours(log);
        var (counts, moves) = UnitCounter.Count(log);
        // The evidence's entry rates are counted over the same span as the network's arrival rates.
        var evidence = FitEvidence.Summarise(UnitObservationsBuilder.FromLog(log, counts, roster), UnitObservationsBuilder.WindowOf(log, windowHours));
        var fitted = log.Units.Select((unit, u) => FitUnit(unit.Id, unit.Label, counts[u], windowHours, evidence.Units[u]) with
        {
            RosterServers = roster.TryGetValue(unit.Id, out int given) ? given : null,
        }).ToImmutableArray();
        var units = fitted.Select(unit => new Unit(unit.Id, unit.Label, Servers.Of(unit.RosterServers ?? Math.Max(1, unit.PeakInService)), unit.MeanServiceHours, unit.ServiceCv)
        {
            Service = unit.Distribution == ServiceKind.Lognormal
                ? ServiceDistribution.Lognormal(unit.MeanServiceHours, unit.ServiceCv)
                : ServiceDistribution.Exponential(unit.MeanServiceHours),
        }).ToImmutableArray();
        var arrivals = fitted.Where(unit => unit.EntriesPerHour > 0.0).Select(unit => new Arrival(unit.Id, unit.EntriesPerHour)).ToImmutableArray();
        var routes = moves
            .OrderBy(move => move.Key.From).ThenBy(move => move.Key.To)
            .Select(move => new Route(log.Units[move.Key.From].Id, log.Units[move.Key.To].Id, (double)move.Value / counts[move.Key.From].Routed))
            .ToImmutableArray();
        var network = new Network(name, timeUnit, units, arrivals, routes) { ArrivalProfile = evidence.Profile.Profile };
        return new FittedNetwork(network, fitted, log.Patients, windowHours, log, evidence);
    }

    /// <summary>
    /// Hours over which entries are counted: the extract's bounds where given, otherwise the first to the last entry
    /// (not the span of all stays, which a backlog stretches past the last entry).
    /// </summary>
    private static double EntryWindowHours(MovementLog log)
    {
        long first = long.MaxValue;
        long last = long.MinValue;
        for (int p = 0; p < log.Order.Length; p++)
        {
            if (log.Enters[p])
            {
                long arrived = log.Rows[log.Order[p]].ArrivedMs;
                first = Math.Min(first, arrived);
                last = Math.Max(last, arrived);
            }
        }

        long from = log.Options.ExtractStart is null ? first : log.ExtractStartMs;
        long to = log.Options.ExtractEnd is null ? last : log.ExtractEndMs;
        double hours = (to - from) / CensoredStayMean.MillisecondsPerHour;
        if (first == long.MaxValue || !(hours > 0.0))
        {
            throw new ArgumentException("All patients entered at the same moment, so no arrival rate can be measured.", nameof(log));
        }

        return hours;
    }

    /// <summary>
    /// One unit's estimates: the mean stay, cv and distribution from the censoring-aware fit the evidence chose
    /// (the lognormal where it fits clearly better, otherwise the exponential, whose maximum-likelihood mean is
    /// <see cref="CensoredStayMean"/>); counts, waits and the peak in service from the counting stage.
    /// </summary>
    private static FittedUnit FitUnit(string id, string label, UnitCounts seen, double windowHours, UnitEvidence evidence)
    {
        if (evidence.Stay.Mean is not IntervalEstimate mean || !(mean.Value > 0.0))
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture, $"unit '{id}': no stay ended inside the extract, so no service time can be measured"), nameof(seen));
        }

        double cv = evidence.Stay.Cv?.Value ?? 1.0;
        if (!(cv <= MostServiceCv))
        {
            // A stay years long among minutes-long ones (a mistyped date) gives a spread no queueing formula takes.
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                $"unit '{id}': stays vary too much to model (cv {cv:G3}, at most {MostServiceCv:0}, around a mean of {mean.Value:G3} hours): check the log's times for one far off"), nameof(seen));
        }

        return new FittedUnit(id, seen.Stays, seen.Entries / windowHours, mean.Value, cv, MeanWaitHours(seen), seen.PeakInService,
            label, seen.Completed, seen.StillRunning, seen.Timed > 0, seen.Timed > 0 && seen.Waited == 0)
        {
            Distribution = evidence.Stay.Chosen,
        };
    }

    private static double MeanWaitHours(UnitCounts seen) =>
        seen.Timed > 0 ? seen.WaitMs / (double)seen.Timed / CensoredStayMean.MillisecondsPerHour : 0.0;
}
