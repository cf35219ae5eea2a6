using System.Text.Json;
using NetSolve.Tests.Hardening;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Fitting;

public sealed class FitOutputTests : IDisposable
{
    private readonly TempFolder folder = new();

    [Fact]
    public void The_fitted_demo_log_writes_its_service_distributions_and_passes_check()
    {
        string network = Path.Combine(folder.Path, "rowan.yaml");

        var fit = CliRun.Run("fit", TestFiles.Log("rowan-urgent-care"), "-o", network);
        var check = CliRun.Run("check", network);

        Assert.Equal(0, fit.ExitCode);
        Assert.Equal(0, check.ExitCode);
        Assert.Contains("service_distribution: exponential", File.ReadAllText(network), StringComparison.Ordinal);
        Assert.Contains("mean stay (95%)", fit.Out, StringComparison.Ordinal);
        Assert.Contains("predicted wait", fit.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Json_format_gives_the_fit_evidence_with_observed_and_predicted_waits()
    {
        var fit = CliRun.Run("fit", TestFiles.Log("rowan-urgent-care"), "--format", "json");

        Assert.Equal(0, fit.ExitCode);
        using var document = JsonDocument.Parse(fit.Out);
        var evidence = document.RootElement.GetProperty("fit_evidence");
        Assert.Equal(4, evidence.GetProperty("units").GetArrayLength());
        Assert.Contains("units:", document.RootElement.GetProperty("network").GetString(), StringComparison.Ordinal);
        Assert.DoesNotContain("NaN", fit.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void A_report_of_the_fit_has_the_section_on_how_sure_the_fit_is()
    {
        string report = Path.Combine(folder.Path, "rowan.html");

        var fit = CliRun.Run("fit", TestFiles.Log("rowan-urgent-care"), "-o", Path.Combine(folder.Path, "rowan.yaml"), "--report", report);

        Assert.Equal(0, fit.ExitCode);
        string html = File.ReadAllText(report);
        Assert.Contains("<section id=\"fit-evidence\">", html, StringComparison.Ordinal);
        Assert.Contains("<section id=\"units\">", html, StringComparison.Ordinal);
    }

    [Fact]
    public void Servers_from_the_roster_replace_the_peak_and_lift_the_never_queued_flag()
    {
        string log = Path.Combine(folder.Path, "timed.csv");
        File.WriteAllText(log, "patient,unit,arrived,started,left\nP1,ed,2026-03-02T08:00,2026-03-02T08:00,2026-03-02T09:00\nP2,ed,2026-03-02T08:30,2026-03-02T08:30,2026-03-02T10:00\n");
        string network = Path.Combine(folder.Path, "ed.yaml");

        var fit = CliRun.Run("fit", log, "-o", network, "--servers", "ed=5");

        Assert.Equal(0, fit.ExitCode);
        Assert.Contains("servers: 5", File.ReadAllText(network), StringComparison.Ordinal);
        Assert.DoesNotContain("never queued", fit.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void A_roster_entry_for_a_unit_the_log_lacks_is_refused_in_one_line()
    {
        var fit = CliRun.Run("fit", TestFiles.Log("rowan-urgent-care"), "--servers", "icu=4");

        Assert.Equal(1, fit.ExitCode);
        Assert.StartsWith("--servers: the log has no unit 'icu'", fit.Error, StringComparison.Ordinal);
        Assert.Single(fit.Error.TrimEnd('\n').Split('\n'));
    }

    [Theory]
    [InlineData("xray=none")]
    [InlineData("xray=0")]
    [InlineData("xray=1e308")]
    public void A_roster_entry_that_is_not_a_count_is_a_usage_error_naming_the_option(string entry)
    {
        var fit = CliRun.Run("fit", TestFiles.Log("rowan-urgent-care"), "--servers", entry);

        Assert.Equal(2, fit.ExitCode);
        Assert.Contains(string.Concat("--servers: '", entry, "' is not UNIT=N"), fit.Error, StringComparison.Ordinal);
    }

    public void Dispose() => folder.Dispose();
}
