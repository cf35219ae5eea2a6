using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Model;

namespace NetSolve.Fitting;

/// <summary>
/// Estimates a network from a movement log: external arrival rates from the journeys entering inside the extract,
/// routing fractions from each stay's next unit, mean service allowing for stays still running, its variability,
/// and servers as the most patients seen in service at once.
/// </summary>
/// <remarks>
/// The stages, each replaceable: <see cref="UnitObservationCounter"/> counts (whole numbers, so row order cannot
/// change a result), then each unit's estimates (<see cref="FitUnit"/>: the mean stay from
/// <see cref="CensoredStayMean"/>), then the network. Rates and routing are the maximum-likelihood estimates for a
/// Jackson network observed over the extract. Peak concurrency is a lower bound on staffed servers where no patient
/// waited; the summary flags those units.
/// </remarks>
public static class NetworkFitter
{
    /// <summary>Fits a network to <paramref name="log"/>; times reported in <paramref name="timeUnit"/>.</summary>
    /// <exception cref="ArgumentException">The extract spans no time for arrivals, or a unit has no stay that ended.</exception>
    public static FittedNetwork Fit(MovementLog log, string name, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(log);
        double windowHours = EntryWindowHours(log);
        var (observations, moves) = UnitObservationCounter.Count(log);
        var fitted = log.Units.Select((unit, u) => FitUnit(unit.Id, unit.Label, observations[u], windowHours)).ToImmutableArray();
        var units = fitted.Select(unit => new Unit(unit.Id, unit.Label, Servers.Of(Math.Max(1, unit.PeakInService)), unit.MeanServiceHours, unit.ServiceCv)).ToImmutableArray();
        var arrivals = fitted.Where(unit => unit.EntriesPerHour > 0.0).Select(unit => new Arrival(unit.Id, unit.EntriesPerHour)).ToImmutableArray();
        var routes = moves
            .OrderBy(move => move.Key.From).ThenBy(move => move.Key.To)
            .Select(move => new Route(log.Units[move.Key.From].Id, log.Units[move.Key.To].Id, (double)move.Value / observations[move.Key.From].Routed))
            .ToImmutableArray();
        var network = new Network(name, timeUnit, units, arrivals, routes);
        return new FittedNetwork(network, fitted, log.Patients, windowHours, log);
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

    private static FittedUnit FitUnit(string id, string label, UnitObservations seen, double windowHours)
    {
        double mean = CensoredStayMean.ExponentialHours(seen.ObservedServiceMs, seen.Completed);
        if (!(mean > 0.0))
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture, $"unit '{id}': no stay ended inside the extract, so no service time can be measured"), nameof(seen));
        }

        return new FittedUnit(id, seen.Stays, seen.Entries / windowHours, mean, WholeStayCv(seen), MeanWaitHours(seen), seen.PeakInService,
            label, seen.Completed, seen.StillRunning, seen.Timed > 0, seen.Timed > 0 && seen.Waited == 0);
    }

    /// <summary>Sample standard deviation over mean of the stays seen whole; 0 with fewer than two.</summary>
    private static double WholeStayCv(UnitObservations seen)
    {
        int n = seen.WholeStays;
        if (n < 2)
        {
            return 0.0;
        }

        // Exact integer sums: n * sum(x^2) - sum(x)^2 is n(n-1) times the sample variance.
        Int128 spread = (n * seen.WholeServiceSquaresMs) - ((Int128)seen.WholeServiceMs * seen.WholeServiceMs);
        double variance = (double)spread / ((double)n * (n - 1));
        double mean = seen.WholeServiceMs / (double)n;
        return Math.Sqrt(Math.Max(0.0, variance)) / mean;
    }

    private static double MeanWaitHours(UnitObservations seen) =>
        seen.Timed > 0 ? seen.WaitMs / (double)seen.Timed / CensoredStayMean.MillisecondsPerHour : 0.0;
}
