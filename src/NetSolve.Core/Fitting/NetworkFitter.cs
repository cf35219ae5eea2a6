using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Model;

namespace NetSolve.Fitting;

/// <summary>
/// Estimates a network from observed stays: external arrival rates from each patient's first stay, routing
/// fractions from consecutive stays of the same patient, mean service time and its variability per unit, and
/// servers as the most patients seen in service at once.
/// </summary>
/// <remarks>
/// These are the maximum-likelihood estimates for a Jackson network observed over the window (counts over
/// exposure for rates, transition frequencies for routing). Peak concurrency is a lower bound on staffed
/// servers; the planner should check it against the roster.
/// </remarks>
public static class NetworkFitter
{
    /// <summary>Fits a network to <paramref name="visits"/>; times reported in <paramref name="timeUnit"/>.</summary>
    /// <exception cref="ArgumentException">No visits, or the arrivals span no time.</exception>
    public static FittedNetwork Fit(IReadOnlyList<UnitVisit> visits, string name, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(visits);
        if (visits.Count == 0)
        {
            throw new ArgumentException("A movement log needs at least one stay.", nameof(visits));
        }

        var patients = visits.GroupBy(visit => visit.Patient, StringComparer.Ordinal)
            .Select(patient => patient.OrderBy(visit => visit.ArrivedHours).ThenBy(visit => visit.Line).ToList())
            .ToList();

        // Rates are counted over the span of entries into the hospital, not of all stays: a backlog can
        // stretch the last stays far past the last entry.
        double first = patients.Min(path => path[0].ArrivedHours);
        double last = patients.Max(path => path[0].ArrivedHours);
        double window = last - first;
        if (!(window > 0.0))
        {
            throw new ArgumentException("All patients entered at the same moment, so no arrival rate can be measured.", nameof(visits));
        }

        var unitIds = visits.Select(visit => visit.UnitId).Distinct(StringComparer.Ordinal).Order(StringComparer.Ordinal).ToList();
        var entries = new Dictionary<string, int>(StringComparer.Ordinal);
        var moves = new Dictionary<(string From, string To), int>();
        foreach (var path in patients)
        {
            entries[path[0].UnitId] = entries.GetValueOrDefault(path[0].UnitId) + 1;
            for (int k = 0; k + 1 < path.Count; k++)
            {
                var key = (path[k].UnitId, path[k + 1].UnitId);
                moves[key] = moves.GetValueOrDefault(key) + 1;
            }
        }

        var byUnit = visits.GroupBy(visit => visit.UnitId, StringComparer.Ordinal).ToDictionary(group => group.Key, group => group.ToList(), StringComparer.Ordinal);
        var fitted = unitIds.Select(id => FitUnit(id, byUnit[id], entries.GetValueOrDefault(id) / window)).ToImmutableArray();
        var units = fitted.Select(unit => new Unit(unit.Id, unit.Id, Servers.Of(Math.Max(1, unit.PeakInService)), unit.MeanServiceHours, unit.ServiceCv)).ToImmutableArray();
        var arrivals = fitted.Where(unit => unit.EntriesPerHour > 0.0).Select(unit => new Arrival(unit.Id, unit.EntriesPerHour)).ToImmutableArray();
        var routes = moves
            .OrderBy(move => move.Key.From, StringComparer.Ordinal).ThenBy(move => move.Key.To, StringComparer.Ordinal)
            .Select(move => new Route(move.Key.From, move.Key.To, (double)move.Value / byUnit[move.Key.From].Count))
            .ToImmutableArray();
        var network = new Network(name, timeUnit, units, arrivals, routes);
        return new FittedNetwork(network, fitted, patients.Count, window);
    }

    private static FittedUnit FitUnit(string id, List<UnitVisit> stays, double entriesPerHour)
    {
        double mean = stays.Average(stay => stay.ServiceHours);
        if (!(mean > 0.0))
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture, $"unit '{id}': every stay has zero length, so no service time can be measured"), nameof(stays));
        }

        double variance = stays.Count > 1 ? stays.Sum(stay => Math.Pow(stay.ServiceHours - mean, 2)) / (stays.Count - 1) : 0.0;
        return new FittedUnit(id, stays.Count, entriesPerHour, mean, Math.Sqrt(variance) / mean, stays.Average(stay => stay.WaitHours), PeakInService(stays));
    }

    /// <summary>Most stays in service at once; a stay ending exactly when another starts does not overlap it.</summary>
    private static int PeakInService(List<UnitVisit> stays)
    {
        var events = new List<(double Time, int Change)>(stays.Count * 2);
        foreach (var stay in stays)
        {
            events.Add((stay.StartedHours ?? stay.ArrivedHours, +1));
            events.Add((stay.LeftHours, -1));
        }

        events.Sort((a, b) => a.Time != b.Time ? a.Time.CompareTo(b.Time) : a.Change.CompareTo(b.Change));
        int current = 0;
        int peak = 0;
        foreach (var (_, change) in events)
        {
            current += change;
            peak = Math.Max(peak, current);
        }

        return peak;
    }
}
