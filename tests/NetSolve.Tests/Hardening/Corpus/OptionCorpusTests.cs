using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening.Corpus;

/// <summary>
/// Option values a planner could type that used to end in an unhandled exception (exit 134 with a stack trace) or
/// exit 70: each is now a usage error of one line naming the option, or, for a percentage, simply understood.
/// </summary>
public sealed class OptionCorpusTests
{
    private static readonly string Harbourside = TestFiles.Network("harbourside");

    [Fact]
    public void A_utilisation_target_written_as_a_percentage_is_understood()
    {
        var result = CorpusCase.Run(["staff", Harbourside, "--max-util", "85%"]);

        Assert.Equal(0, result.ExitCode);
    }

    [Theory]
    [InlineData("staff", "--max-util", "abc")]
    [InlineData("staff", "--max-util", ".nan")]
    [InlineData("growth", "--from", "abc")]
    [InlineData("growth", "--from", ".nan")]
    [InlineData("growth", "--steps", "99999999999")]
    [InlineData("staff", "--budget", "99999999999")]
    [InlineData("staff", "--budget", "2147483647")]
    [InlineData("simulate", "--replications", "99999999999")]
    [InlineData("simulate", "--replications", "2147483647")]
    [InlineData("simulate", "--threads", "99999999999")]
    [InlineData("simulate", "--duration", "1e300d")]
    public void An_absurd_option_value_is_one_usage_line_naming_the_option(string command, string option, string value)
    {
        var result = CorpusCase.Run([command, Harbourside, option, value]);

        Assert.Equal(2, result.ExitCode);
        Assert.Contains(option, result.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_huge_replication_count_with_a_short_alias_is_a_usage_error()
    {
        var result = CorpusCase.Run(["simulate", Harbourside, "-r", "99999999999"]);

        Assert.Equal(2, result.ExitCode);
    }

    [Fact]
    public void A_value_starting_with_an_at_sign_is_a_value_not_a_response_file_to_read()
    {
        // Found by the fuzzer: the parser took "@SUM(A1:A9)" for a file of arguments and said so without naming the option.
        var result = CorpusCase.Run(["staff", Harbourside, "--by-hour", "--max-wait", "1h", "--shifts", "@SUM(A1:A9)"]);

        Assert.Equal(2, result.ExitCode);
        Assert.StartsWith("netsolve: --shifts", result.Error, StringComparison.Ordinal);
        Assert.DoesNotContain("Response file", result.Error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("0%", "a maximum utilisation of 0 cannot be met while patients arrive")]
    [InlineData("1e-7", "beyond the 1000000 a unit may have")]
    public void A_roster_search_under_a_utilisation_cap_no_servers_can_meet_is_refused_at_once(string cap, string reason)
    {
        // Found by the fuzzer: "--max-util 0%" with --by-hour searched for minutes, adding servers one trial at a time,
        // and a cap needing over a million servers ended in exit 70; the steady-state search refuses both at once. The
        // line now starts as every located line does (it lacked the program and command).
        var result = CorpusCase.Run(["staff", TestFiles.Network("millbrook-clinic"), "--by-hour", "--no-check", "--max-util", cap]);

        Assert.Equal(1, result.ExitCode);
        Assert.StartsWith("netsolve: staff --by-hour: unit 'reception': ", result.Error, StringComparison.Ordinal);
        Assert.Contains(reason, result.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_roster_search_under_a_cap_of_one_hundred_percent_is_refused_at_once_with_the_way_round()
    {
        // Found by the 100,000-input fuzzing run: "--max-util 1" with --by-hour put the assessment unit (64 beds, stays
        // near a day) at 99% busy over the week, and the exact chain worked 58 s to find a pattern that takes years to
        // settle (relaxation time 1/(cμ(1 − √ρ)²), Abate and Whitt, Queueing Systems 2, 1987). It is refused in one line.
        var result = CorpusCase.Run(["staff", TestFiles.Network("larkspur-simulation"), "--by-hour", "--no-check", "--max-util", "1"]);

        Assert.Equal(1, result.ExitCode);
        Assert.StartsWith("netsolve: staff --by-hour: unit 'assessment': ", result.Error, StringComparison.Ordinal);
        Assert.Contains("years to settle into a daily pattern", result.Error, StringComparison.Ordinal);
        Assert.Contains("set a lower --max-util", result.Error, StringComparison.Ordinal);
        Assert.Single(result.Error.TrimEnd('\n').Split('\n'));
    }

    [Fact]
    public void An_exact_roster_search_estimated_at_hours_of_work_is_refused_with_the_way_round()
    {
        // A desk whose busiest hour needs fifty one-minute servers: thousands of chain steps per hour over thousands of states, for each trial roster.
        string network = CorpusCase.File("exact-chain-fast-service.yaml");

        var result = CorpusCase.Run(["staff", network, "--by-hour", "--exact", "--max-wait", "5min", "--no-check"]);

        Assert.Equal(2, result.ExitCode);
        Assert.StartsWith("netsolve: --exact: ", result.Error, StringComparison.Ordinal);
        Assert.Contains("--allow-long", result.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Allow_long_on_staff_needs_the_exact_roster_search()
    {
        var result = CorpusCase.Run(["staff", Harbourside, "--allow-long"]);

        Assert.Equal(2, result.ExitCode);
        Assert.Contains("give it with --by-hour --exact", result.Error, StringComparison.Ordinal);
    }
}
