using NetSolve.Fitting;
using NetSolve.Fitting.Reading;
using NetSolve.Model;
using NodaTime;

namespace NetSolve.Tests.Fitting;

public sealed class MovementLogTimeTests
{
    private static readonly DateTimeZone London = DateTimeZoneProviders.Tzdb["Europe/London"];

    [Theory]
    [InlineData("2026-03-02T08:15", 2026, 3, 2, 8, 15, 0)]
    [InlineData("2026-03-02 08:15:30", 2026, 3, 2, 8, 15, 30)]
    [InlineData("2026-03-02T08:15:30Z", 2026, 3, 2, 8, 15, 30)]
    [InlineData("2026-03-02T09:15:30+01:00", 2026, 3, 2, 8, 15, 30)]
    [InlineData("2026-03-02T03:15:30-0500", 2026, 3, 2, 8, 15, 30)]
    [InlineData("02/03/2026 08:15", 2026, 3, 2, 8, 15, 0)]
    [InlineData("02.03.2026 08:15:30", 2026, 3, 2, 8, 15, 30)]
    public void Every_documented_format_reads_as_the_same_instant(string text, int year, int month, int day, int hour, int minute, int second)
    {
        // Exact by hand: each text names the given UTC time (local times read in UTC, the default zone).
        Assert.Equal(Instant.FromUtc(year, month, day, hour, minute, second), LogTimeText.Parse(text, DateTimeZone.Utc));
    }

    [Fact]
    public void Fractional_seconds_are_kept_to_the_millisecond()
    {
        var time = LogTimeText.Parse("2026-03-02T08:15:30.250+00:00", DateTimeZone.Utc);

        // Exact by hand: 250 ms past 08:15:30.
        Assert.Equal(Instant.FromUtc(2026, 3, 2, 8, 15, 30).PlusNanoseconds(250_000_000), time);
    }

    [Theory]
    [InlineData("2026-02-30T08:00")]
    [InlineData("2026-03-02T25:00")]
    [InlineData("03/02/26 08:00")]
    [InlineData("2026-03-02")]
    [InlineData("2026-03-02T08:00+25:00")]
    [InlineData("2026-03-02T08:00:00.1234567891")]
    [InlineData("yesterday")]
    public void Anything_else_is_not_a_time(string text)
    {
        Assert.Null(LogTimeParserProbe(text));
    }

    [Fact]
    public void A_stay_across_the_spring_clock_change_is_an_hour_shorter_than_its_wall_clock_times()
    {
        // Source: tz database, file europe, Rule EU (Mar lastSun 1:00u): London clocks go from 01:00 GMT to 02:00 BST on 29 March 2026.
        double hours = StayHours("2026-03-28T22:00", "2026-03-29T06:00", London);

        Assert.Equal(7.0, hours, 1e-9);
        Assert.Equal(8.0, StayHours("2026-03-28T22:00", "2026-03-29T06:00", DateTimeZone.Utc), 1e-9);
    }

    [Fact]
    public void A_stay_across_the_autumn_clock_change_is_an_hour_longer_than_its_wall_clock_times()
    {
        // Source: tz database, file europe, Rule EU (Oct lastSun 1:00u): London clocks go from 02:00 BST back to 01:00 GMT on 25 October 2026.
        Assert.Equal(9.0, StayHours("2026-10-24T22:00", "2026-10-25T06:00", London), 1e-9);
    }

    [Fact]
    public void Local_times_in_a_skipped_or_repeated_hour_are_counted()
    {
        // Source: tz database, Rule EU: 01:30 on 29 March 2026 never happens in London; 01:30 on 25 October 2026 happens twice.
        string text = "patient,unit,arrived,left\nP1,ed,2026-03-29T01:30,2026-03-29T03:00\nP2,ed,2026-10-25T01:30,2026-10-25T03:00\n";

        var (log, _) = MovementLogReader.Read(text, "log.csv", new MovementLogOptions { TimeZone = London });

        Assert.Equal(2, log!.Problems.ClockChangeTimes);
    }

    private static double StayHours(string arrived, string left, DateTimeZone zone)
    {
        string text = $"patient,unit,arrived,left\nP1,ward,{arrived},{left}\nP2,ward,2026-01-01T00:00,2026-01-01T01:00\n";
        var (log, diagnostics) = MovementLogReader.Read(text, "log.csv", new MovementLogOptions { TimeZone = zone });
        Assert.Empty(diagnostics);
        var options = NetworkFitter.Fit(log!, "t", TimeUnit.Hour).Units.Single();
        // The mean of this stay and a 1-hour one, over two ended stays.
        return (options.MeanServiceHours * 2.0) - 1.0;
    }

    private static Instant? LogTimeParserProbe(string text) => LogTimeText.Parse(text, DateTimeZone.Utc);
}
