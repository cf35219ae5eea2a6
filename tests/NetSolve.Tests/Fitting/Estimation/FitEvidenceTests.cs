using System.Collections.Immutable;
using NetSolve.Fitting.Estimation;

namespace NetSolve.Tests.Fitting.Estimation;

public sealed class FitEvidenceTests
{
    private static readonly ExtractWindow Day = ExtractWindow.Of(24.0);

    [Fact]
    public void Routes_are_fractions_of_the_ended_stays_with_wilson_intervals()
    {
        // 40 stays of 1 h, 4 still running: 36 ended; 9 moved to theatre and 27 left.
        var unit = Unit("ward", stays: 40, censored: 4, routes: [new RouteCount("theatre", 9)]);

        var evidence = FitEvidence.Estimate(unit, Day);

        // Exact by hand: 9 / 36 = 0.25, with the Wilson interval of 9 out of 36.
        var route = Assert.Single(evidence.Routes);
        Assert.Equal(0.25, route.Fraction.Value);
        Assert.Equal(36, route.Total);
        Assert.Equal(ConfidenceIntervals.Wilson(9, 36), route.Fraction.Interval);
        Assert.Contains(evidence.Warnings, warning => warning.Kind == FitWarningKind.ThinRoute && warning.Message.Contains("'theatre'", StringComparison.Ordinal));
    }

    [Fact]
    public void Thin_data_is_warned_about_and_plenty_is_not()
    {
        var thin = FitEvidence.Estimate(Unit("xray", stays: 12, censored: 0, routes: [new RouteCount("ward", 12)]), Day);
        var plenty = FitEvidence.Estimate(Unit("ward", stays: 60, censored: 0, routes: [new RouteCount("home", 30)]), Day);

        Assert.Equal([FitWarningKind.FewStays], thin.Warnings.Select(warning => warning.Kind));
        Assert.Empty(plenty.Warnings);
    }

    [Fact]
    public void A_unit_whose_load_interval_reaches_its_servers_is_warned_about()
    {
        // 40 arrivals of stays near 1 h in 24 h on 2 servers: load about 0.83, but the interval's upper end passes 1.
        var unit = Unit("assessment", stays: 40, censored: 0, routes: []) with { Servers = 2 };

        var evidence = FitEvidence.Estimate(unit, Day);

        // Exact by hand: 40 / 24 h × the fitted mean stay / 2 servers.
        Assert.Equal(40.0 / 24.0 * evidence.Stay.Mean!.Value.Value / 2.0, evidence.Load!.Load.Value, 1e-9);
        Assert.True(evidence.Load.MayReachServers);
        Assert.Contains(evidence.Warnings, warning => warning.Kind == FitWarningKind.LoadMayReachServers);
    }

    [Fact]
    public void A_unit_that_never_queued_says_its_servers_are_a_lower_bound()
    {
        var unit = Unit("ward", stays: 40, censored: 0, routes: []) with { Servers = 30, NeverQueued = true, WaitHours = [0.0, 0.0] };

        var evidence = FitEvidence.Estimate(unit, Day);

        var warning = Assert.Single(evidence.Warnings);
        Assert.Equal(FitWarningKind.NeverQueued, warning.Kind);
        Assert.Contains("at least 30", warning.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_unit_with_no_ended_stay_has_no_mean_and_says_why()
    {
        var evidence = FitEvidence.Estimate(Unit("ward", stays: 5, censored: 5, routes: []), Day);

        Assert.Null(evidence.Stay.Mean);
        Assert.Empty(evidence.Routes);
        Assert.Contains(evidence.Warnings, warning => warning.Kind == FitWarningKind.NoStayEnded);
    }

    [Fact]
    public void Entries_and_arrivals_are_counted_over_the_window()
    {
        var unit = Unit("emergency", stays: 48, censored: 0, routes: []) with { EntryHours = [.. Enumerable.Range(0, 24).Select(hour => hour + 0.5)] };

        var network = FitEvidence.Summarise([unit, Unit("ward", stays: 30, censored: 0, routes: [])], Day);

        // Exact by hand: 24 entries and 48 stays in 24 h.
        Assert.Equal(1.0, network.Units[0].Entries.PerHour.Value);
        Assert.Equal(2.0, network.Units[0].Arrivals.PerHour.Value);
        Assert.Equal(24, network.Entries.Count);
        Assert.Equal(78, network.Stays);
    }

    [Fact]
    public void Inconsistent_observations_are_refused()
    {
        var unit = Unit("ward", stays: 3, censored: 0, routes: []);
        var shortCounts = unit with { Stays = unit.Stays with { Censored = [0] } };
        var outOfOrder = unit with { Stays = unit.Stays with { Hours = [.. unit.Stays.Hours.Reverse()] } };

        Assert.Throws<ArgumentException>(() => FitEvidence.Estimate(shortCounts, Day));
        Assert.Throws<ArgumentException>(() => FitEvidence.Estimate(outOfOrder, Day));
        Assert.Throws<ArgumentException>(() => FitEvidence.Estimate(unit with { Departures = 4 }, Day));
        Assert.Throws<ArgumentOutOfRangeException>(() => ExtractWindow.Of(0.0));
        Assert.Throws<ArgumentOutOfRangeException>(() => ExtractWindow.Of(24.0, 168.0));
    }

    /// <summary>Stays of 1 h, then 2 h, alternating; the last <paramref name="censored"/> of them still running.</summary>
    private static UnitObservations Unit(string id, int stays, int censored, ImmutableArray<RouteCount> routes) => new(
        id,
        [.. Enumerable.Range(0, stays).Select(i => i % 2 == 0 ? 0.5 : 1.5)],
        [.. Enumerable.Range(0, stays).Select(i => i >= stays - censored)],
        [],
        [],
        [],
        routes);
}
