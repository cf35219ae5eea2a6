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
}
