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
    public void A_report_name_that_is_not_html_is_a_usage_error_before_anything_is_written()
    {
        string network = Path.Combine(folder.Path, "rowan.yaml");

        // The report is HTML: a name ending in .yaml would have put HTML where a network file was expected.
        var fit = CliRun.Run("fit", TestFiles.Log("rowan-urgent-care"), "-o", network, "--report", Path.Combine(folder.Path, "rowan-report.yaml"));

        Assert.Equal(2, fit.ExitCode);
        Assert.Contains("--report '", fit.Error, StringComparison.Ordinal);
        Assert.Contains("': the file name must end in .html, .htm", fit.Error, StringComparison.Ordinal);
        Assert.Empty(Directory.EnumerateFileSystemEntries(folder.Path));
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

    [Fact]
    public void A_roster_file_sets_the_servers_of_the_units_it_names()
    {
        string roster = Roster("# beds and staffed rooms\nunit,servers\nxray,3\nobservation, 12\n");
        string network = Path.Combine(folder.Path, "rowan.yaml");

        var fit = CliRun.Run("fit", TestFiles.Log("rowan-urgent-care"), "-o", network, "--servers", roster, "--servers", "lab=2");

        Assert.Equal(0, fit.ExitCode);
        string written = File.ReadAllText(network);
        Assert.Contains("servers: 3", written, StringComparison.Ordinal);
        Assert.Contains("servers: 12", written, StringComparison.Ordinal);
        Assert.Contains("servers: 2", written, StringComparison.Ordinal);
        Assert.DoesNotContain("unit 'xray': never queued", fit.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Every_bad_row_of_a_roster_file_is_refused_on_its_own_located_line()
    {
        string roster = Roster("unit,servers\nxray,3\nlab,none\nxray,4\nxrya,2\nobservation\n");

        var fit = CliRun.Run("fit", TestFiles.Log("rowan-urgent-care"), "--servers", roster);

        // Exact by hand: line 3 column 5 holds 'none'; line 4 repeats xray; line 5 misspells it; line 6 lacks servers.
        Assert.Equal(1, fit.ExitCode);
        string[] lines = fit.Error.TrimEnd('\n').Split('\n');
        Assert.Equal(4, lines.Length);
        Assert.StartsWith(roster + ":3:5: unit 'lab': servers 'none' is not a whole number of at least 1", lines[0], StringComparison.Ordinal);
        Assert.StartsWith(roster + ":4:1: unit 'xray': already given on line 2", lines[1], StringComparison.Ordinal);
        Assert.StartsWith(roster + ":5:1: the log has no unit 'xrya'; did you mean 'xray'?", lines[2], StringComparison.Ordinal);
        Assert.StartsWith(roster + ":6:1: expected 2 cells (unit,servers), found 1", lines[3], StringComparison.Ordinal);
    }

    [Fact]
    public void A_unit_given_both_in_a_roster_file_and_as_an_entry_is_refused()
    {
        string roster = Roster("unit,servers\nxray,3\n");

        var fit = CliRun.Run("fit", TestFiles.Log("rowan-urgent-care"), "--servers", roster, "--servers", "xray=4");

        Assert.Equal(1, fit.ExitCode);
        Assert.StartsWith("--servers: unit 'xray' is given twice", fit.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_roster_file_without_its_header_is_refused_at_line_one()
    {
        string roster = Roster("xray,3\n");

        var fit = CliRun.Run("fit", TestFiles.Log("rowan-urgent-care"), "--servers", roster);

        Assert.Equal(1, fit.ExitCode);
        Assert.StartsWith(roster + ":1:1: a roster's header must be unit,servers", fit.Error, StringComparison.Ordinal);
    }

    private string Roster(string text)
    {
        string path = Path.Combine(folder.Path, "roster.csv");
        File.WriteAllText(path, text);
        return path;
    }

    public void Dispose() => folder.Dispose();
}
