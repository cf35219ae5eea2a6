using NetSolve.Fitting;
using NetSolve.Fitting.Reading;
using NetSolve.Model;
using NodaTime;

namespace NetSolve.Tests.Fitting;

public sealed class MovementLogMessyRowTests
{
    private const string Header = "patient,unit,arrived,started,left\n";

    [Fact]
    public void An_exact_duplicate_is_dropped_and_makes_no_self_loop()
    {
        const string text = Header + """
            P1,ed,2026-03-02T08:00,2026-03-02T08:00,2026-03-02T09:00
            P1,ed,2026-03-02T08:00,2026-03-02T08:00,2026-03-02T09:00
            P1,ward,2026-03-02T09:00,2026-03-02T09:00,2026-03-02T19:00
            P2,ed,2026-03-02T10:00,2026-03-02T10:00,2026-03-02T11:00
            """;

        var fitted = Fit(text);

        // Exact by hand: two ed stays remain, one moving on to the ward; no ed -> ed route.
        Assert.Equal(1, fitted.Log.Problems.Duplicates);
        Assert.Equal(2, fitted.Units.Single(unit => unit.Id == "ed").Stays);
        Assert.DoesNotContain(fitted.Network.Routes, route => route.From == route.To);
        Assert.Equal(0.5, fitted.Network.Routes.Single().Probability, 1e-12);
    }

    [Fact]
    public void A_long_gap_between_stays_starts_a_new_journey_with_a_new_entry()
    {
        const string text = Header + """
            P1,ed,2026-03-02T08:00,2026-03-02T08:00,2026-03-02T09:00
            P1,ward,2026-03-20T08:00,2026-03-20T08:00,2026-03-21T08:00
            P2,ed,2026-03-02T10:00,2026-03-02T10:00,2026-03-02T11:00
            P2,ward,2026-03-02T11:00,2026-03-02T11:00,2026-03-03T11:00
            """;

        var fitted = Fit(text);

        // Exact by hand: P1's second stay, 18 days later, is a readmission: entries at ed (2) and ward (1), one ed -> ward move.
        Assert.Equal(1, fitted.Log.Problems.Readmissions);
        Assert.Equal(3, fitted.Log.Journeys);
        Assert.Equal(0.5, fitted.Network.Routes.Single(route => route.From == "ed").Probability, 1e-12);
        Assert.True(fitted.Units.Single(unit => unit.Id == "ward").EntriesPerHour > 0.0);
    }

    [Fact]
    public void A_gap_within_the_new_journey_limit_stays_one_journey()
    {
        const string text = Header + """
            P1,ed,2026-03-02T08:00,2026-03-02T08:00,2026-03-02T09:00
            P1,ward,2026-03-02T20:00,2026-03-02T20:00,2026-03-03T08:00
            P2,ed,2026-03-02T10:00,2026-03-02T10:00,2026-03-02T11:00
            """;

        var fitted = Fit(text);

        // Exact by hand: an 11-hour gap is under the default 24 h, so ed -> ward is a move, not a readmission.
        Assert.Equal(0, fitted.Log.Problems.Readmissions);
        Assert.Equal(0.5, fitted.Network.Routes.Single().Probability, 1e-12);
    }

    [Fact]
    public void An_overlapping_stay_is_a_transfer_and_a_nested_stay_is_a_side_visit()
    {
        const string text = Header + """
            P1,ed,2026-03-02T08:00,2026-03-02T08:00,2026-03-02T10:00
            P1,ward,2026-03-02T09:30,2026-03-02T09:30,2026-03-03T09:30
            P1,xray,2026-03-02T12:00,2026-03-02T12:00,2026-03-02T12:30
            P2,ed,2026-03-02T11:00,2026-03-02T11:00,2026-03-02T12:00
            """;

        var fitted = Fit(text);

        // Exact by hand: ed overlaps ward by 30 min (a transfer ed -> ward); the X-ray lies inside the ward stay.
        Assert.Equal(1, fitted.Log.Problems.OverlappingStays);
        Assert.Equal(1, fitted.Log.Problems.NestedStays);
        Assert.Equal(("ed", "ward"), (fitted.Network.Routes.Single().From, fitted.Network.Routes.Single().To));
        Assert.Equal(1, fitted.Units.Single(unit => unit.Id == "xray").Stays);
    }

    [Fact]
    public void A_negative_duration_is_dropped_and_a_zero_one_kept_both_counted()
    {
        const string text = Header + """
            P1,ed,2026-03-02T08:00,2026-03-02T08:00,2026-03-02T07:00
            P2,ed,2026-03-02T09:00,2026-03-02T09:00,2026-03-02T09:00
            P3,ed,2026-03-02T10:00,2026-03-02T10:00,2026-03-02T12:00
            """;

        var fitted = Fit(text);

        Assert.Equal(1, fitted.Log.Problems.NegativeDurations);
        Assert.Equal(1, fitted.Log.Problems.ZeroDurations);
        Assert.Equal(2, fitted.Units.Single().Stays);
    }

    [Fact]
    public void An_unknown_column_is_ignored_with_a_warning_and_rows_out_of_order_are_counted()
    {
        const string text = """
            patient,unit,arrived,left,ward_name
            P1,ed,2026-03-02T10:00,2026-03-02T11:00,Ash
            P1,ed,2026-03-02T08:00,2026-03-02T09:00,Ash
            P2,ed,2026-03-02T09:00,2026-03-02T10:00,Ash
            """;

        var (log, diagnostics) = MovementLogReader.Read(text, "log.csv");

        var warning = Assert.Single(diagnostics);
        Assert.False(warning.IsError);
        Assert.Equal(1, log!.Problems.UnknownColumns);
        // Exact by hand: P1's second row arrives at 08:00, before its first row's 10:00.
        Assert.Equal(1, log.Problems.RowsOutOfOrder);
    }

    [Theory]
    [InlineData("P1,ed,2026-03-02T08:00,,2026-03-02T09:00\nP1,ed,2026-03-02T08:00,,2026-03-02T09:00\n", "log.csv:3:1: unit 'ed': the row repeats another row exactly (a duplicate; dropped)")]
    [InlineData("P1,ed,2026-03-02T08:00,,2026-03-02T07:00\n", "log.csv:2:25: unit 'ed': times must run arrived <= started <= left (a negative duration; the row is dropped)")]
    [InlineData("P1,ed,2026-03-02T08:00,,2026-03-02T08:00\n", "log.csv:2:25: unit 'ed': the stay has no length (a zero duration)")]
    [InlineData("P1,ed,2026-03-05T08:00,,2026-03-05T09:00\nP1,ed,2026-03-02T08:00,,2026-03-02T09:00\n", "log.csv:3:1: unit 'ed': the row arrives before an earlier row of the same patient (rows out of order)")]
    [InlineData("P1,ed,2026-03-02T08:00,,2026-03-02T09:00\nP1,ward,2026-03-05T08:00,,2026-03-05T09:00\n", "log.csv:3:1: unit 'ward': a new journey of the same patient (a readmission after a long gap)")]
    [InlineData("P1,ed,2026-03-02T08:00,,2026-03-02T10:00\nP1,ward,2026-03-02T09:00,,2026-03-02T19:00\n", "log.csv:3:1: unit 'ward': the stay begins before the patient's previous stay ends (an overlap; taken as a transfer)")]
    public void Strict_reading_fails_on_each_kind_of_messy_row_at_its_line(string rows, string expected)
    {
        // Exact by hand: "P1,ed,2026-03-02T08:00,," is 24 characters, so 'left' starts at column 25.
        var (log, diagnostics) = MovementLogReader.Read(Header + rows, "log.csv", new MovementLogOptions { Strict = true });

        Assert.Null(log);
        Assert.Equal(expected, diagnostics[0].ToString());
    }

    [Fact]
    public void Strict_reading_fails_on_an_unknown_column()
    {
        var (log, diagnostics) = MovementLogReader.Read("patient,unit,arrived,left,bed\n", "log.csv", new MovementLogOptions { Strict = true });

        Assert.Null(log);
        Assert.StartsWith("log.csv:1:1: unknown column 'bed'", diagnostics[0].ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void The_new_journey_limit_can_be_changed()
    {
        const string text = Header + """
            P1,ed,2026-03-02T08:00,,2026-03-02T09:00
            P1,ward,2026-03-02T20:00,,2026-03-03T08:00
            P2,ed,2026-03-02T10:00,,2026-03-02T11:00
            """;

        var (log, _) = MovementLogReader.Read(text, "log.csv", new MovementLogOptions { NewJourneyAfter = Duration.FromHours(6) });

        // Exact by hand: the 11-hour gap is over 6 h.
        Assert.Equal(1, log!.Problems.Readmissions);
    }

    private static FittedNetwork Fit(string text)
    {
        var (log, diagnostics) = MovementLogReader.Read(text, "log.csv");
        Assert.DoesNotContain(diagnostics, d => d.IsError);
        return NetworkFitter.Fit(log!, "test", TimeUnit.Hour);
    }
}
