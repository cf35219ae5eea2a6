using NetSolve.Fitting;
using NetSolve.Fitting.Estimation;
using NetSolve.Fitting.Reading;
using NodaTime;

namespace NetSolve.Tests.Fitting.Estimation;

public sealed class UnitObservationsBuilderTests
{
    // The extract runs from 10:00 on the first day to 10:00 on the next (hours 10 to 34 below).
    private static readonly string[] Rows =
    [
        "P1,ward,2026-03-02T04:00:00,,2026-03-02T12:00:00",                   // already running at the start: age 6, ends at 12
        "P2,emergency,2026-03-02T11:00:00,2026-03-02T11:30:00,2026-03-02T13:00:00",   // entry, waited 0.5 h, then to the ward
        "P2,ward,2026-03-02T13:00:00,,",                                       // still running at the end: censored at 34
        "P3,emergency,2026-03-02T20:00:00,2026-03-02T20:00:00,2026-03-02T21:00:00",   // entry, no wait, leaves
    ];

    private static readonly MovementLogOptions Window = new()
    {
        ExtractStart = Instant.FromUtc(2026, 3, 2, 10, 0),
        ExtractEnd = Instant.FromUtc(2026, 3, 3, 10, 0),
    };

    [Fact]
    public void Stays_are_censored_at_the_end_and_truncated_at_the_start_of_the_extract()
    {
        var units = Observations(Rows).ToDictionary(unit => unit.UnitId, StringComparer.Ordinal);

        // Exact by hand from the rows above.
        var ward = units["ward"];
        Assert.Equal([8.0, 21.0], ward.Stays.Hours);
        Assert.Equal([0, 1], ward.Stays.Censored);
        Assert.Equal([6.0, 0.0], ward.Stays.AgeHours);
        Assert.Empty(ward.Routes);
        var emergency = units["emergency"];
        Assert.Equal([1.0, 1.5], emergency.Stays.Hours);
        Assert.Equal([1, 1], emergency.Stays.Ended);
        Assert.Equal(2, emergency.Departures);
        Assert.Equal([0.0, 0.5], emergency.WaitHours.Order());
        Assert.Equal([1.0, 10.0], emergency.EntryHours.Order());
        Assert.Equal([new RouteCount("ward", 1)], emergency.Routes);
        Assert.False(emergency.NeverQueued);
        Assert.Equal(1, emergency.Servers);
    }

    [Fact]
    public void The_extract_window_starts_at_its_place_in_the_week()
    {
        var (log, _) = MovementLogReader.Read(Csv(Rows), "log.csv", Window);

        var window = UnitObservationsBuilder.WindowOf(log!);

        // Exact by hand: 2026-03-02 is a Monday, so 10:00 is hour 10 of the week; the extract lasts 24 hours.
        Assert.Equal(24.0, window.Hours, 9);
        Assert.Equal(10.0, window.StartHourOfWeek, 9);
    }

    [Fact]
    public void The_order_of_the_rows_does_not_change_the_observations()
    {
        var forward = Observations(Rows);
        var backward = Observations([.. Rows.Reverse()]);

        Assert.Equal(forward.Count, backward.Count);
        for (int i = 0; i < forward.Count; i++)
        {
            Assert.Equal(forward[i].UnitId, backward[i].UnitId);
            Assert.Equal(forward[i].Stays.Hours, backward[i].Stays.Hours);
            Assert.Equal(forward[i].Stays.Ended, backward[i].Stays.Ended);
            Assert.Equal(forward[i].Routes, backward[i].Routes);
            Assert.Equal(forward[i].EntryHours, backward[i].EntryHours);
        }
    }

    [Fact]
    public void Stays_from_a_log_are_grouped_by_length_with_the_timestamps_step_as_their_resolution()
    {
        string[] rows =
        [
            "A,xray,2026-03-02T11:00:00,,2026-03-02T11:00:00",
            "B,xray,2026-03-02T12:00:00,,2026-03-02T12:10:00",
            "C,xray,2026-03-02T13:00:00,,2026-03-02T13:25:00",
            "D,xray,2026-03-02T14:00:00,,2026-03-02T14:10:00",
            "E,xray,2026-03-03T09:59:00,,",
        ];

        var xray = Observations(rows).Single();

        // Exact by hand: ended stays of 0, 10, 10 and 25 minutes (step 5 minutes) and one of 1 minute still running at
        // the extract's end (it ends at the extract's end, not at a timestamp, so it does not set the step).
        Assert.Equal([0.0, 1.0 / 60.0, 10.0 / 60.0, 25.0 / 60.0], xray.Stays.Hours);
        Assert.Equal([1, 0, 2, 1], xray.Stays.Ended);
        Assert.Equal([0, 1, 0, 0], xray.Stays.Censored);
        Assert.Equal(5.0 / 60.0, xray.Stays.ResolutionHours, 12);
    }

    private static string Csv(IEnumerable<string> rows) => "patient,unit,arrived,started,left\n" + string.Join("\n", rows) + "\n";

    private static List<UnitObservations> Observations(IEnumerable<string> rows)
    {
        var (log, diagnostics) = MovementLogReader.Read(Csv(rows), "log.csv", Window);
        Assert.DoesNotContain(diagnostics, d => d.IsError);
        return [.. UnitObservationsBuilder.FromLog(log!)];
    }
}
