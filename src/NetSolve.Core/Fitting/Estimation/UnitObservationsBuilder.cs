using System.Collections.Immutable;

namespace NetSolve.Fitting.Estimation;

/// <summary>
/// Turns the stays read from a movement log into each unit's <see cref="UnitObservations"/> for an extract window:
/// a stay still running at the window's end is censored there, one already running at its start is left-truncated.
/// </summary>
/// <remarks>
/// Patients' journeys are their stays in order of arrival, ties broken by the time they left and then by unit id, so
/// the observations do not depend on the order of the rows. Servers are the most patients seen in service at once
/// (a lower bound), with the never-queued flag when every recorded wait is 0.
/// </remarks>
public static class UnitObservationsBuilder
{
    /// <summary>The observations of every unit in <paramref name="visits"/>, in unit id order.</summary>
    /// <param name="visits">The stays, times in hours on the log's clock.</param>
    /// <param name="startHours">The extract's start on the log's clock; stays before it are truncated or dropped.</param>
    /// <param name="window">The extract's length and its start's place in the week.</param>
    public static ImmutableArray<UnitObservations> FromVisits(IReadOnlyList<UnitVisit> visits, double startHours, ExtractWindow window)
    {
        ArgumentNullException.ThrowIfNull(visits);
        ArgumentNullException.ThrowIfNull(window);
        double endHours = startHours + window.Hours;
        var units = new SortedDictionary<string, Accumulator>(StringComparer.Ordinal);
        Accumulator For(string id) => units.TryGetValue(id, out var found) ? found : units[id] = new Accumulator();

        foreach (var journey in visits.GroupBy(visit => visit.Patient, StringComparer.Ordinal))
        {
            var stays = journey.OrderBy(visit => visit.ArrivedHours).ThenBy(visit => visit.LeftHours).ThenBy(visit => visit.UnitId, StringComparer.Ordinal).ToList();
            if (stays[0].ArrivedHours >= startHours && stays[0].ArrivedHours <= endHours)
            {
                For(stays[0].UnitId).Entries.Add(stays[0].ArrivedHours - startHours);
            }

            for (int k = 0; k < stays.Count; k++)
            {
                var visit = stays[k];
                double serviceStart = visit.StartedHours ?? visit.ArrivedHours;
                if (serviceStart > endHours || visit.LeftHours < startHours)
                {
                    continue;
                }

                var unit = For(visit.UnitId);
                bool censored = visit.LeftHours > endHours;
                unit.StayHours.Add(Math.Min(visit.LeftHours, endHours) - serviceStart);
                unit.Censored.Add(censored);
                unit.Ages.Add(Math.Max(0.0, startHours - serviceStart));
                unit.Busy.Add((serviceStart, Math.Min(visit.LeftHours, endHours)));
                if (visit.StartedHours is not null && visit.ArrivedHours >= startHours)
                {
                    unit.Waits.Add(visit.WaitHours);
                }

                if (!censored && k + 1 < stays.Count)
                {
                    string to = stays[k + 1].UnitId;
                    unit.Routes[to] = unit.Routes.GetValueOrDefault(to) + 1;
                }
            }
        }

        return [.. units.Select(pair => pair.Value.Build(pair.Key))];
    }

    /// <summary>One unit's observations while they are gathered.</summary>
    private sealed class Accumulator
    {
        public List<double> StayHours { get; } = [];

        public List<bool> Censored { get; } = [];

        public List<double> Ages { get; } = [];

        public List<double> Waits { get; } = [];

        public List<double> Entries { get; } = [];

        public List<(double From, double To)> Busy { get; } = [];

        public SortedDictionary<string, int> Routes { get; } = new(StringComparer.Ordinal);

        public UnitObservations Build(string id)
        {
            int? servers = Busy.Count == 0 ? null : Math.Max(1, PeakInService());
            bool neverQueued = Waits.Count > 0 && Waits.All(wait => wait <= 0.0);
            return new UnitObservations(id, [.. StayHours], [.. Censored], [.. Ages], [.. Waits], [.. Entries],
                [.. Routes.Select(route => new RouteCount(route.Key, route.Value))], servers, neverQueued);
        }

        /// <summary>Most stays in service at once; one ending exactly when another starts does not overlap it.</summary>
        private int PeakInService()
        {
            var events = Busy.SelectMany(span => new[] { (Time: span.From, Change: 1), (Time: span.To, Change: -1) })
                .OrderBy(change => change.Time).ThenBy(change => change.Change);
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
}
