using NetSolve.Fitting;
using NetSolve.Fitting.Estimation;
using NetSolve.Fitting.Reading;
using NetSolve.Tests.Support;
using NodaTime;
using Interval = NetSolve.Fitting.Estimation.Interval;

namespace NetSolve.Tests.Fitting.Estimation;

public sealed class RowanEvidenceTests
{
    /// <summary>The log starts on Monday 2026-03-02 at 00:12:14, its first arrival: 0.2039 h into the week.</summary>
    private const double StartHourOfWeek = (12.0 / 60.0) + (14.0 / 3600.0);

    [Fact]
    public void The_bundled_demo_log_cut_at_14_days_recovers_its_parameters_within_their_intervals()
    {
        var start = Instant.FromUtc(2026, 3, 2, 0, 12, 14);
        var options = new MovementLogOptions { ExtractStart = start, ExtractEnd = start + Duration.FromDays(14) };
        var (log, diagnostics) = MovementLogReader.Read(File.ReadAllText(TestFiles.Log("rowan-urgent-care")), "log.csv", options);
        Assert.DoesNotContain(diagnostics, d => d.IsError);
        var window = UnitObservationsBuilder.WindowOf(log!);
        Assert.Equal(StartHourOfWeek, window.StartHourOfWeek, 9);

        var evidence = FitEvidence.Summarise(UnitObservationsBuilder.FromLog(log!), window);

        var units = evidence.Units.ToDictionary(unit => unit.UnitId, StringComparer.Ordinal);
        double Route(string from, string to) => units[from].Routes.Single(route => route.ToUnitId == to).Fraction.Value;
        // Source: the generating parameters of the invented log (docs/movement-log.md, "The bundled demo log"):
        // 5 entries an hour; mean service 40 min, 15 min, 30 min, 6 h; routes 25%, 20%, 8% out of urgent care, 90% and
        // 85% back. Common practice: of 11 independent 95% intervals about half a one misses by chance; 2 or more
        // misses would happen about one time in ten, 3 or more about one time in fifty, so at most 2 may miss.
        var checks = new (string What, Interval Interval, double Truth)[]
        {
            ("entries", evidence.Entries.PerHour.Interval, 5.0),
            ("urgent care stay", units["urgent_care"].Stay.Mean!.Value.Interval, 40.0 / 60.0),
            ("xray stay", units["xray"].Stay.Mean!.Value.Interval, 0.25),
            ("lab stay", units["lab"].Stay.Mean!.Value.Interval, 0.5),
            ("observation stay", units["observation"].Stay.Mean!.Value.Interval, 6.0),
            ("to xray", units["urgent_care"].Routes.Single(route => route.ToUnitId == "xray").Fraction.Interval, 0.25),
            ("to lab", units["urgent_care"].Routes.Single(route => route.ToUnitId == "lab").Fraction.Interval, 0.20),
            ("to observation", units["urgent_care"].Routes.Single(route => route.ToUnitId == "observation").Fraction.Interval, 0.08),
            ("xray back", units["xray"].Routes.Single(route => route.ToUnitId == "urgent_care").Fraction.Interval, 0.90),
            ("lab back", units["lab"].Routes.Single(route => route.ToUnitId == "urgent_care").Fraction.Interval, 0.85),
            ("urgent care arrivals", units["urgent_care"].Arrivals.PerHour.Interval, 5.0 * (1.0 + (0.25 * 0.9) + (0.2 * 0.85))),
        };

        var missed = checks.Where(check => !check.Interval.Contains(check.Truth)).Select(check => check.What).ToList();
        Assert.True(missed.Count <= 2, "missed: " + string.Join(", ", missed));
        Assert.InRange(Route("urgent_care", "xray"), 0.22, 0.28);
        Assert.Equal(7, units["urgent_care"].Servers);
    }
}
