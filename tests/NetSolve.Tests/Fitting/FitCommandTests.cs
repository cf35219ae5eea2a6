using NetSolve.Tests.Hardening;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Fitting;

public sealed class FitCommandTests : IDisposable
{
    private readonly TempFolder folder = new();

    [Theory]
    [InlineData("--time-zone", "Europe/Londn", "--time-zone: 'Europe/Londn' is not an IANA time zone name")]
    [InlineData("--extract-end", "soon", "--extract-end: 'soon' is not a time")]
    [InlineData("--new-journey-after", "often", "--new-journey-after: 'often'")]
    public void A_bad_reading_option_is_a_usage_error(string option, string value, string expected)
    {
        var result = CliRun.Run("fit", TestFiles.Log("rowan-urgent-care"), option, value);

        Assert.Equal(2, result.ExitCode);
        Assert.Contains(expected, result.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void An_extract_that_ends_before_it_starts_is_refused()
    {
        var result = CliRun.Run("fit", TestFiles.Log("rowan-urgent-care"), "--extract-start", "2026-03-10T00:00", "--extract-end", "2026-03-09T00:00");

        Assert.Equal(1, result.ExitCode);
        Assert.Equal("--extract-end: the extract must end after it starts (--extract-start)", result.Error.TrimEnd('\n'));
    }

    [Fact]
    public void Strict_fitting_of_a_messy_log_fails_with_the_row_located()
    {
        string log = Write("log.csv", "patient,unit,arrived,left\nP1,ed,2026-03-02T08:00,2026-03-02T09:00\nP1,ed,2026-03-02T08:00,2026-03-02T09:00\n");

        var result = CliRun.Run("fit", log, "--strict");

        Assert.Equal(1, result.ExitCode);
        Assert.Equal(log + ":3:1: unit 'ed': the row repeats another row exactly (a duplicate; dropped)", result.Error.TrimEnd('\n'));
    }

    [Fact]
    public void A_log_with_hostile_unit_names_gives_a_file_that_check_accepts()
    {
        string log = Write("log.csv", "patient,unit,arrived,started,left\nP1,Ward 7,2026-03-02T08:00,2026-03-02T08:00,2026-03-02T09:00\nP1,x-ray/ct,2026-03-02T09:00,2026-03-02T09:10,2026-03-02T09:30\nP2,ward #2,2026-03-02T10:00,2026-03-02T10:00,2026-03-02T12:00\nP3,\"ward \"\"Ash\"\"\",2026-03-02T11:00,2026-03-02T11:00,2026-03-02T12:00\n");
        string network = Path.Combine(folder.Path, "fitted.yaml");

        var fit = CliRun.Run("fit", log, "-o", network);
        var check = CliRun.Run("check", network);

        Assert.Equal(0, fit.ExitCode);
        Assert.Equal(0, check.ExitCode);
        Assert.Contains("label: \"ward \\\"Ash\\\"\"", File.ReadAllText(network), StringComparison.Ordinal);
    }

    [Fact]
    public void The_summary_flags_units_that_never_queued_and_logs_without_start_times()
    {
        string timed = Write("timed.csv", "patient,unit,arrived,started,left\nP1,ed,2026-03-02T08:00,2026-03-02T08:00,2026-03-02T09:00\nP2,ed,2026-03-02T08:30,2026-03-02T08:30,2026-03-02T10:00\n");
        string untimed = Write("untimed.csv", "patient,unit,arrived,left\nP1,ed,2026-03-02T08:00,2026-03-02T09:00\nP2,ed,2026-03-02T08:30,2026-03-02T10:00\n");

        var never = CliRun.Run("fit", timed, "-o", Path.Combine(folder.Path, "a.yaml"));
        var waits = CliRun.Run("fit", untimed, "-o", Path.Combine(folder.Path, "b.yaml"));

        // Exact by hand: both patients are in service from 08:30 to 09:00, and neither waited.
        Assert.Contains("unit 'ed': never queued: at least 2 servers", never.Out, StringComparison.Ordinal);
        Assert.Contains("no start-of-service times (column 'started'): waits count as service", waits.Out, StringComparison.Ordinal);
    }

    public void Dispose() => folder.Dispose();

    private string Write(string name, string text)
    {
        string path = Path.Combine(folder.Path, name);
        File.WriteAllText(path, text);
        return path;
    }
}
