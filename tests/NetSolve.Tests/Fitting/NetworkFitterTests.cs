using NetSolve.Fitting;
using NetSolve.Model;
using NetSolve.Presentation;
using NetSolve.Parsing;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Fitting;

public sealed class NetworkFitterTests
{
    private const double Tolerance = 1e-9;

    // Three patients, counted by hand:
    // P1 emergency 08:00-09:00, xray 09:00 (served 09:30) to 10:00, emergency 10:00-10:30
    // P2 emergency 09:00-11:00
    // P3 emergency 10:00 (served 10:15) to 10:45, then the ward 10:45-22:45
    private const string HandLog = """
        patient,unit,arrived,started,left
        P1,emergency,2026-03-02T08:00,2026-03-02T08:00,2026-03-02T09:00
        P1,xray,2026-03-02T09:00,2026-03-02T09:30,2026-03-02T10:00
        P1,emergency,2026-03-02T10:00,2026-03-02T10:00,2026-03-02T10:30
        P2,emergency,2026-03-02T09:00,2026-03-02T09:00,2026-03-02T11:00
        P3,emergency,2026-03-02T10:00,2026-03-02T10:15,2026-03-02T10:45
        P3,ward,2026-03-02T10:45,,2026-03-02T22:45
        """;

    [Fact]
    public void A_hand_counted_log_gives_the_hand_counted_network()
    {
        var fitted = Fit(HandLog);
        var emergency = fitted.Units.Single(unit => unit.Id == "emergency");

        // Exact by hand: 3 patients enter at emergency between 08:00 and 10:00, so 3 / 2 h.
        Assert.Equal(1.5, emergency.EntriesPerHour, Tolerance);
        // Exact by hand: emergency stays of 1, 0.5, 2 and 0.5 h: mean 1 h. The exponential's AIC is 2 + 2 x 4 = 10; the
        // lognormal's (log mean -0.173, log sd 0.575) is 9.53, lower by 0.47, not by the 2 needed to prefer it, so the
        // exponential is written, with its cv of 1.
        Assert.Equal(4, emergency.Stays);
        Assert.Equal(1.0, emergency.MeanServiceHours, Tolerance);
        Assert.Equal(ServiceKind.Exponential, emergency.Distribution);
        Assert.Equal(1.0, emergency.ServiceCv, Tolerance);
        // Exact by hand: only P3 waited at emergency, 0.25 h, over 4 stays.
        Assert.Equal(0.0625, emergency.MeanWaitHours, Tolerance);
        // Exact by hand: at 10:15 P2, P1's second stay and P3 are all in service.
        Assert.Equal(3, emergency.PeakInService);

        // Exact by hand: of 4 emergency stays, one goes on to X-ray and one to the ward; X-ray always returns.
        Assert.Equal(0.25, Probability(fitted, "emergency", "xray"), Tolerance);
        Assert.Equal(0.25, Probability(fitted, "emergency", "ward"), Tolerance);
        Assert.Equal(1.0, Probability(fitted, "xray", "emergency"), Tolerance);
        Assert.Equal(3, fitted.Network.Routes.Length);
        Assert.Equal(3, fitted.Patients);
    }

    [Fact]
    public void A_log_without_start_of_service_counts_the_whole_stay_as_service()
    {
        var fitted = Fit(HandLog);
        var ward = fitted.Units.Single(unit => unit.Id == "ward");

        // Exact by hand: the ward row has no start time, so its 12 h stay is all service and no wait.
        Assert.Equal(12.0, ward.MeanServiceHours, Tolerance);
        Assert.Equal(0.0, ward.MeanWaitHours, Tolerance);
    }

    [Fact]
    public void The_fitted_network_written_as_a_file_reads_back_as_a_valid_network()
    {
        var fitted = Fit(HandLog);
        var text = new StringWriter();
        NetworkYamlWriter.Write(fitted.Network, text, ["fitted"]);

        var read = NetworkReader.ReadText(text.ToString(), "fitted.yaml");

        Assert.False(read.HasErrors, string.Join("\n", read.Diagnostics));
        Assert.Equal(fitted.Network.Units.Select(unit => unit.Id), read.Network!.Units.Select(unit => unit.Id), StringComparer.Ordinal);
        Assert.Equal(fitted.Network.ExternalArrivalsPerHour, read.Network.ExternalArrivalsPerHour, 1e-5);
    }

    [Fact]
    public void The_bundled_demo_log_recovers_the_parameters_it_was_generated_with()
    {
        string text = File.ReadAllText(TestFiles.Log("rowan-urgent-care"));
        var fitted = Fit(text);
        var urgent = fitted.Units.Single(unit => unit.Id == "urgent_care");

        // Source: the generating parameters of the invented log (docs/movement-log.md): 5 arrivals/h, 40 min
        // mean service, 7 clinicians, routes 25% X-ray, 20% lab, 8% observation, 90% of X-ray and 85% of lab back.
        // About 1,650 patients and 4,100 stays make each estimate good to a few percent.
        Assert.InRange(urgent.EntriesPerHour, 4.6, 5.4);
        Assert.InRange(urgent.MeanServiceHours, 0.62, 0.72);
        Assert.Equal(7, urgent.PeakInService);
        Assert.InRange(Probability(fitted, "urgent_care", "xray"), 0.22, 0.28);
        Assert.InRange(Probability(fitted, "urgent_care", "lab"), 0.17, 0.23);
        Assert.InRange(Probability(fitted, "urgent_care", "observation"), 0.06, 0.10);
        Assert.InRange(Probability(fitted, "xray", "urgent_care"), 0.86, 0.94);
        Assert.InRange(Probability(fitted, "lab", "urgent_care"), 0.81, 0.89);
    }

    [Theory]
    [InlineData("patient,unit,arived,left\n", "log.csv:1:1: warning: unknown column 'arived'; did you mean 'arrived'? (columns: patient,unit,arrived,started,left); ignored")]
    [InlineData("patient,unit,arrived,left\nP1,ed,2026-03-02 08:00,yesterday\n", "log.csv:2:24: unit 'ed': 'yesterday' is not a time (write e.g. 2026-03-02T08:15, 2026-03-02T08:15:30+01:00 or 02/03/2026 08:15)")]
    [InlineData("patient,unit,arrived,left\nP1,ed,2026-03-02T08:00\n", "log.csv:2:1: expected 4 cells, found 3")]
    [InlineData("", "log.csv:1:1: the log is empty; it needs the header patient,unit,arrived,started,left and one row per stay")]
    public void Bad_logs_get_one_located_line_each(string text, string expected)
    {
        // Exact by hand: columns count from 1 along the line, so "P1,ed,2026-03-02T08:00," puts 'left' at column 24.
        var (_, diagnostics) = MovementLogReader.Read(text, "log.csv");

        Assert.Equal(expected, diagnostics[0].ToString());
        Assert.All(diagnostics, diagnostic => Assert.DoesNotContain('\n', diagnostic.ToString()));
    }

    private static FittedNetwork Fit(string text)
    {
        var (log, diagnostics) = MovementLogReader.Read(text, "log.csv");
        Assert.Empty(diagnostics);
        return NetworkFitter.Fit(log!, "test", TimeUnit.Hour);
    }

    private static double Probability(FittedNetwork fitted, string from, string to) =>
        fitted.Network.Routes.Single(route => route.From == from && route.To == to).Probability;
}
