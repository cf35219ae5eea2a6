using NetSolve.Fitting.Estimation;

namespace NetSolve.Tests.Fitting.Estimation;

public sealed class ArrivalProfileEstimateTests
{
    [Fact]
    public void A_busy_afternoon_over_two_weeks_is_written_as_an_hour_of_day_profile()
    {
        // 14 days: 2 entries in every hour, 6 in every hour from 12:00 to 16:00.
        var entries = Enumerable.Range(0, 14 * 24).SelectMany(hour => Enumerable.Repeat(hour + 0.5, hour % 24 is >= 12 and < 16 ? 6 : 2)).ToList();

        var estimate = ArrivalProfileEstimate.Estimate(entries, ExtractWindow.Of(14 * 24.0));

        // Exact by hand: the mean rate per hour is (20·2 + 4·6)/24 = 8/3, so quiet hours are 2/(8/3) = 0.75, busy ones 2.25.
        Assert.Equal(ProfileDecision.Written, estimate.HourOfDay.Decision);
        Assert.Equal(ProfileDecision.TooShort, estimate.DayOfWeek.Decision);
        Assert.Equal(0.75, estimate.Profile!.HourOfDay[3], 1e-12);
        Assert.Equal(2.25, estimate.Profile.HourOfDay[13], 1e-12);
        Assert.True(estimate.Profile.DayOfWeek.IsEmpty);
    }

    [Fact]
    public void A_flat_stream_is_not_written()
    {
        var entries = Enumerable.Range(0, 14 * 24).SelectMany(hour => Enumerable.Repeat(hour + 0.5, 3)).ToList();

        var estimate = ArrivalProfileEstimate.Estimate(entries, ExtractWindow.Of(14 * 24.0));

        // Exact by hand: equal counts in every hour give a chi-squared statistic of 0, p = 1.
        Assert.Equal(ProfileDecision.Flat, estimate.HourOfDay.Decision);
        Assert.Equal(1.0, estimate.HourOfDay.PValue!.Value, 1e-12);
        Assert.Null(estimate.Profile);
    }

    [Fact]
    public void Short_or_thin_extracts_are_not_written()
    {
        var fewDays = ArrivalProfileEstimate.Estimate([.. Enumerable.Range(0, 500).Select(i => i * 0.2)], ExtractWindow.Of(100.0));
        var fewEntries = ArrivalProfileEstimate.Estimate([1.0, 30.0, 200.0], ExtractWindow.Of(10 * 24.0));

        Assert.Equal(ProfileDecision.TooShort, fewDays.HourOfDay.Decision);
        Assert.Equal(ProfileDecision.TooFewEntries, fewEntries.HourOfDay.Decision);
    }

    [Fact]
    public void Weekends_are_found_when_the_extract_starts_midweek()
    {
        // 28 days from Wednesday 06:00 (54 h after Monday 00:00): 4 entries every hour on weekdays, 1 at weekends.
        const double start = 54.0;
        var entries = Enumerable.Range(0, 28 * 24)
            .SelectMany(hour => Enumerable.Repeat(hour + 0.5, (int)((start + hour) % 168.0 / 24.0) >= 5 ? 1 : 4))
            .ToList();

        var estimate = ArrivalProfileEstimate.Estimate(entries, ExtractWindow.Of(28 * 24.0, start));

        // Exact by hand: the daily mean is (5·4 + 2·1)/7 = 22/7 per hour, so weekdays 4/(22/7) = 14/11, weekends 7/22.
        Assert.Equal(ProfileDecision.Written, estimate.DayOfWeek.Decision);
        Assert.Equal(14.0 / 11.0, estimate.Profile!.DayOfWeek[0], 1e-12);
        Assert.Equal(7.0 / 22.0, estimate.Profile.DayOfWeek[6], 1e-12);
        Assert.Equal(96.0, estimate.DayOfWeek.ExposureHours[0], 1e-9);
    }

    [Fact]
    public void Exposure_counts_the_hours_of_a_window_that_starts_and_ends_inside_an_hour()
    {
        // Exact by hand: from 01:30 for 2 h covers half of 01-02, all of 02-03 and half of 03-04.
        var estimate = ArrivalProfileEstimate.Estimate([], ExtractWindow.Of(2.0, 1.5));

        Assert.Equal([0.0, 0.5, 1.0, 0.5], estimate.HourOfDay.ExposureHours.Take(4));
        Assert.Equal(2.0, estimate.DayOfWeek.ExposureHours[0], 1e-12);
    }
}
