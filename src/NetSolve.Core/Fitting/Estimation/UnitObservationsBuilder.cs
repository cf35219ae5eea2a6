using System.Collections.Immutable;
using NetSolve.Fitting.Reading;

namespace NetSolve.Fitting.Estimation;

/// <summary>
/// Turns the stays of a <see cref="MovementLog"/> into each unit's <see cref="UnitObservations"/>: a stay still
/// running at the extract's end is censored there, one already running at its start is left-truncated.
/// </summary>
/// <remarks>
/// The log's journeys are already ordered by the data (ties broken by time and unit, not by the line), so the
/// observations do not depend on the order of the rows. One unit is built at a time, and its stays are grouped by
/// length (<see cref="StayGroups"/>), so a 10-million-row log holds its largest unit's stays once, as 8 bytes a stay,
/// only while they are sorted. Servers are the peak in service that the counting stage found (a lower
/// bound), flagged as never queued when start times are recorded and no patient waited.
/// </remarks>
public static class UnitObservationsBuilder
{
    /// <summary>
    /// The extract's window of <paramref name="log"/>: its length (or <paramref name="hours"/>, the span entries are
    /// counted over, when given), and its start's place in the week on the log's local clock.
    /// </summary>
    public static ExtractWindow WindowOf(MovementLog log, double? hours = null)
    {
        ArgumentNullException.ThrowIfNull(log);
        hours ??= (log.ExtractEndMs - log.ExtractStartMs) / CensoredStayMean.MillisecondsPerHour;
        var local = log.ExtractStart.InZone(log.Options.TimeZone).LocalDateTime;
        double startHourOfWeek = ((((int)local.DayOfWeek - 1) * 24.0) + local.TimeOfDay.TickOfDay / (double)NodaTime.NodaConstants.TicksPerHour) % ExtractWindow.HoursPerWeek;
        return ExtractWindow.Of(Math.Max(hours.Value, double.Epsilon), startHourOfWeek);
    }

    /// <summary>The observations of every unit of <paramref name="log"/>, in the log's unit order, built one at a time as they are enumerated.</summary>
    public static IEnumerable<UnitObservations> FromLog(MovementLog log)
    {
        ArgumentNullException.ThrowIfNull(log);
        var (counts, _) = UnitCounter.Count(log);
        return FromLog(log, counts, new Dictionary<string, int>(StringComparer.Ordinal));
    }

    /// <summary>
    /// As <see cref="FromLog(MovementLog)"/>, reusing counts already made: servers are the roster's where it names the
    /// unit (then not a lower bound), otherwise the peak in service with the never-queued flag.
    /// </summary>
    internal static IEnumerable<UnitObservations> FromLog(MovementLog log, UnitCounts[] counts, IReadOnlyDictionary<string, int> roster)
    {
        int[] byUnit = PositionsByUnit(log, counts, out int[] firstOf);
        for (int u = 0; u < counts.Length; u++)
        {
            var seen = Build(log, u, counts[u], new ArraySegment<int>(byUnit, firstOf[u], counts[u].Stays));
            yield return roster.TryGetValue(seen.UnitId, out int servers) ? seen with { Servers = servers, NeverQueued = false } : seen;
        }
    }

    /// <summary>Positions in the log's journey order, grouped by unit (a counting sort: one array of the log's length).</summary>
    private static int[] PositionsByUnit(MovementLog log, UnitCounts[] counts, out int[] firstOf)
    {
        firstOf = new int[counts.Length];
        for (int u = 1; u < counts.Length; u++)
        {
            firstOf[u] = firstOf[u - 1] + counts[u - 1].Stays;
        }

        int[] next = (int[])firstOf.Clone();
        int[] byUnit = new int[log.Order.Length];
        for (int p = 0; p < log.Order.Length; p++)
        {
            byUnit[next[log.Rows[log.Order[p]].Unit]++] = p;
        }

        return byUnit;
    }

    private static UnitObservations Build(MovementLog log, int unit, UnitCounts counts, ArraySegment<int> positions)
    {
        const double PerHour = CensoredStayMean.MillisecondsPerHour;
        long start = log.ExtractStartMs;
        long end = log.ExtractEndMs;
        var stays = new MillisecondStays(positions.Count);
        var waits = ImmutableArray.CreateBuilder<double>(counts.Timed);
        var entries = ImmutableArray.CreateBuilder<double>(counts.Entries);
        var routes = new SortedDictionary<string, int>(StringComparer.Ordinal);
        foreach (int p in positions)
        {
            ref readonly var row = ref log.Rows[log.Order[p]];
            int next = log.Next[p];
            bool stillRunning = next == StayOutcome.StillRunning || row.IsCensored || row.LeftMs > end;
            long serviceStart = row.ServiceStartMs;
            long stay = Math.Max(0L, (stillRunning ? end : row.LeftMs) - serviceStart);
            stays.Add(stay, Math.Min(stay, Math.Max(0L, start - serviceStart)), stillRunning);
            if (row.StartedMs != StayRow.NotRecorded && row.ArrivedMs >= start)
            {
                waits.Add(Math.Max(0L, row.StartedMs - row.ArrivedMs) / PerHour);
            }

            if (log.Enters[p])
            {
                entries.Add((row.ArrivedMs - start) / PerHour);
            }

            if (next >= 0 && !stillRunning)
            {
                string to = log.Units[next].Id;
                routes[to] = routes.GetValueOrDefault(to) + 1;
            }
        }

        // Waits and entries in an order set by their values, not by the patients' numbers (which follow the rows):
        // sums of hours then come out the same to the last bit however the rows were ordered.
        waits.Sort();
        entries.Sort();
        // The counting stage counted the same waits and entries, so the arrays are full and handed over without a copy.
        return new UnitObservations(log.Units[unit].Id, stays.Group(), waits.MoveToImmutable(), entries.MoveToImmutable(),
            [.. routes.Select(route => new RouteCount(route.Key, route.Value))],
            counts.Stays == 0 ? null : Math.Max(1, counts.PeakInService), counts.Timed > 0 && counts.Waited == 0, counts.Routed);
    }
}
