using NetSolve.Fitting;
using NetSolve.Fitting.Estimation;

namespace NetSolve.Tests.Fitting.Estimation;

public sealed class UnitObservationsBuilderTests
{
    // The extract runs from hour 10 to hour 34 on the log's clock.
    private static readonly UnitVisit[] Visits =
    [
        new("P1", "ward", 4.0, null, 12.0, 2),          // already running at the start: age 6, ends at 12
        new("P2", "emergency", 11.0, 11.5, 13.0, 3),    // entry, waited 0.5 h, then to the ward
        new("P2", "ward", 13.0, null, 40.0, 4),         // still running at the end: censored at 34
        new("P3", "emergency", 20.0, 20.0, 21.0, 5),    // entry, no wait, leaves
        new("P4", "emergency", 40.0, 40.0, 41.0, 6),    // after the extract: not seen
    ];

    [Fact]
    public void Stays_are_censored_at_the_end_and_truncated_at_the_start_of_the_extract()
    {
        var units = UnitObservationsBuilder.FromVisits(Visits, 10.0, ExtractWindow.Of(24.0)).ToDictionary(unit => unit.UnitId, StringComparer.Ordinal);

        // Exact by hand from the rows above.
        var ward = units["ward"];
        Assert.Equal([8.0, 21.0], ward.StayHours);
        Assert.Equal([false, true], ward.Censored);
        Assert.Equal([6.0, 0.0], ward.AgeAtStartHours);
        Assert.Empty(ward.Routes);
        var emergency = units["emergency"];
        Assert.Equal([1.5, 1.0], emergency.StayHours);
        Assert.Equal([0.5, 0.0], emergency.WaitHours);
        Assert.Equal([1.0, 10.0], emergency.EntryHours);
        Assert.Equal([new RouteCount("ward", 1)], emergency.Routes);
        Assert.False(emergency.NeverQueued);
        Assert.Equal(1, emergency.Servers);
    }

    [Fact]
    public void The_order_of_the_rows_does_not_change_the_observations()
    {
        var forward = UnitObservationsBuilder.FromVisits(Visits, 10.0, ExtractWindow.Of(24.0));
        var backward = UnitObservationsBuilder.FromVisits([.. Visits.Reverse()], 10.0, ExtractWindow.Of(24.0));

        Assert.Equal(forward.Length, backward.Length);
        for (int i = 0; i < forward.Length; i++)
        {
            Assert.Equal(forward[i].UnitId, backward[i].UnitId);
            Assert.Equal(forward[i].StayHours.OrderBy(x => x), backward[i].StayHours.OrderBy(x => x));
            Assert.Equal(forward[i].Routes, backward[i].Routes);
            Assert.Equal(forward[i].EntryHours.OrderBy(x => x), backward[i].EntryHours.OrderBy(x => x));
        }
    }
}
