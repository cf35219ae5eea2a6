using System.Globalization;
using System.Text;
using NetSolve.Fitting;
using NetSolve.Fitting.Reading;
using NetSolve.Model;
using NodaTime;

namespace NetSolve.Tests.Fitting;

public sealed class MovementLogCensoringTests
{
    private const double StayHours = 120.0;
    private const double ArrivalsPerHour = 100.0 / 24.0;
    private const double WindowHours = 7 * 24.0;
    private static readonly DateTime Origin = new(2026, 3, 2, 0, 0, 0, DateTimeKind.Utc);

    [Fact]
    public void A_seven_day_extract_of_five_day_stays_recovers_the_mean_stay_and_the_entry_rate()
    {
        var (text, completeOnlyMeanHours) = WardExtract(seed: 20260302);
        var options = new MovementLogOptions
        {
            ExtractStart = Instant.FromDateTimeUtc(Origin),
            ExtractEnd = Instant.FromDateTimeUtc(Origin.AddHours(WindowHours)),
        };

        var (log, diagnostics) = MovementLogReader.Read(text, "ward.csv", options);
        var ward = NetworkFitter.Fit(log!, "ward", TimeUnit.Hour).Units.Single();

        Assert.DoesNotContain(diagnostics, d => d.IsError);
        // Source: the generating parameters (exponential stays of mean 120 h, 100 arrivals a day). About 700 stays end
        // inside the window, so the censored estimate's standard error is about 1/sqrt(700) = 3.8%; 10% is 2.6 of them.
        Assert.InRange(ward.MeanServiceHours, StayHours * 0.9, StayHours * 1.1);
        // About 700 entries in the window: standard error 3.8% as well.
        Assert.InRange(ward.EntriesPerHour, ArrivalsPerHour * 0.9, ArrivalsPerHour * 1.1);
        Assert.True(ward.StillRunning > 300, "most of the ward's 500 patients are still in at the extract's end");
        // The same extract counted without censoring, complete stays only, is far short: the bias the estimate removes.
        Assert.InRange(completeOnlyMeanHours, 0.0, StayHours * 0.6);
    }

    [Fact]
    public void A_stay_still_running_at_the_end_counts_its_time_but_not_as_an_ended_stay()
    {
        const string text = """
            patient,unit,arrived,left
            P1,ward,2026-03-02T00:00,2026-03-02T10:00
            P2,ward,2026-03-02T02:00,
            """;
        var options = new MovementLogOptions { ExtractEnd = Instant.FromUtc(2026, 3, 2, 12, 0) };

        var (log, _) = MovementLogReader.Read(text, "ward.csv", options);
        var ward = NetworkFitter.Fit(log!, "ward", TimeUnit.Hour).Units.Single();

        // Exact by hand: 10 h observed for P1 and 10 h (02:00 to 12:00) for P2, over the one stay that ended: 20 h.
        Assert.Equal(20.0, ward.MeanServiceHours, 1e-9);
        Assert.Equal(1, ward.StillRunning);
        Assert.Equal(1, log!.Problems.StillRunningAtEnd);
    }

    [Fact]
    public void A_stay_already_running_at_the_start_counts_only_its_time_inside_the_extract()
    {
        const string text = """
            patient,unit,arrived,left
            P1,ward,2026-03-01T00:00,2026-03-02T04:00
            P2,ward,2026-03-02T02:00,2026-03-02T08:00
            """;
        var options = new MovementLogOptions { ExtractStart = Instant.FromUtc(2026, 3, 2, 0, 0) };

        var (log, _) = MovementLogReader.Read(text, "ward.csv", options);
        var ward = NetworkFitter.Fit(log!, "ward", TimeUnit.Hour).Units.Single();

        // Exact by hand: P1 is seen 4 h inside the extract, P2 6 h; two stays ended: 10 h / 2.
        Assert.Equal(5.0, ward.MeanServiceHours, 1e-9);
        Assert.Equal(1, log!.Problems.RunningAtStart);
        // Exact by hand: only P2 entered inside the extract, over 00:00 (its start) to 02:00 (the last entry): 1 / 2 h.
        Assert.Equal(0.5, ward.EntriesPerHour, 1e-9);
    }

    /// <summary>
    /// A ward with Poisson arrivals from 40 days before the window, exponential stays, seen through a 7-day window:
    /// stays arriving before it keep their true arrival, stays leaving after it have an empty <c>left</c>.
    /// </summary>
    private static (string Text, double CompleteOnlyMeanHours) WardExtract(int seed)
    {
        var random = new Random(seed);
        var text = new StringBuilder("patient,unit,arrived,left\n");
        double time = -40 * 24.0;
        int patient = 0;
        double completeSum = 0.0;
        int complete = 0;
        while (true)
        {
            time += -Math.Log(1.0 - random.NextDouble()) / ArrivalsPerHour;
            if (time >= WindowHours)
            {
                break;
            }

            double left = time + (-Math.Log(1.0 - random.NextDouble()) * StayHours);
            patient++;
            if (left <= 0.0)
            {
                continue;
            }

            string leftText = left > WindowHours ? string.Empty : Format(left);
            text.Append(CultureInfo.InvariantCulture, $"P{patient},ward,{Format(time)},{leftText}\n");
            if (left <= WindowHours && time >= 0.0)
            {
                completeSum += left - time;
                complete++;
            }
        }

        return (text.ToString(), completeSum / complete);
    }

    private static string Format(double hours) =>
        Origin.AddSeconds(Math.Round(hours * 3600.0)).ToString("yyyy-MM-dd'T'HH:mm:ss", CultureInfo.InvariantCulture);
}
