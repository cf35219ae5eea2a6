using NetSolve.Tests.Support;
using static NetSolve.Tests.Hardening.HardeningRun;

namespace NetSolve.Tests.Hardening;

/// <summary>
/// Option values read by the files' own value parsers (so <c>85%</c> is a fraction and <c>30 min</c> a duration),
/// and every value a planner could mistype a usage error of one line naming the option and its bound, exit 2.
/// </summary>
public sealed class OptionsTests
{
    private static readonly string Millbrook = TestFiles.Network("millbrook-clinic");

    [Theory]
    [InlineData("--max-util", "85%")]
    [InlineData("--max-util", "85 %")]
    [InlineData("--max-util", "0.85")]
    [InlineData("--max-wait", "30 min")]
    [InlineData("--max-wait", "0.5h")]
    [InlineData("--max-wait", "30min")]
    public void Staff_reads_a_target_as_a_file_would(string option, string value)
    {
        var (code, output, error) = CliRun.Run("staff", Millbrook, option, value, "-f", "json");

        Assert.Equal(0, code);
        Assert.Empty(error);
        AssertFinite(output);
    }

    [Fact]
    public void A_percentage_strain_threshold_means_the_same_as_its_fraction()
    {
        var percent = CliRun.Run("solve", Millbrook, "--strain", "70%", "-f", "json");
        var fraction = CliRun.Run("solve", Millbrook, "--strain", "0.7", "-f", "json");

        Assert.Equal(0, percent.ExitCode);
        Assert.Equal(fraction.Out, percent.Out);
    }

    [Theory]
    [InlineData("--max-util", "abc")]
    [InlineData("--max-util", ".nan")]
    [InlineData("--max-util", "185%")]
    [InlineData("--max-wait", "30mins")]
    [InlineData("--max-wait", "1e300d")]
    [InlineData("--budget", "2147483647")]
    [InlineData("--budget", "99999999999999999999")]
    public void A_bad_staff_value_is_one_usage_line_naming_the_option(string option, string value)
    {
        string[] lines = Refused(2, "staff", Millbrook, option, value);

        Assert.Single(lines);
        Assert.StartsWith($"netsolve: {option}: '{value}'", lines[0], StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--from", "abc")]
    [InlineData("--from", ".nan")]
    [InlineData("--from", "1e-320")]
    [InlineData("--to", "1e308")]
    [InlineData("--steps", "99999999999")]
    [InlineData("--steps", "2147483648")]
    public void A_bad_growth_value_is_one_usage_line_naming_the_option(string option, string value)
    {
        string[] lines = Refused(2, "growth", Millbrook, option, value);

        Assert.Single(lines);
        Assert.StartsWith($"netsolve: {option}: '{value}'", lines[0], StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--replications", "2147483647", "from 1 to 10000")]
    [InlineData("-r", "2147483647", "from 1 to 10000")]
    [InlineData("--threads", "99999999999", "from 1 to 1024")]
    [InlineData("--duration", "1e300d", "longer than 3650 days")]
    [InlineData("--warmup", "1e300d", "longer than 3650 days")]
    [InlineData("--duration", "1e-320d", "is too short for a duration (from 1e-6 s to 100 years)")]
    public void A_bad_simulation_value_is_one_usage_line_naming_the_option_and_its_bound(string option, string value, string bound)
    {
        string[] lines = Refused(2, "simulate", Millbrook, option, value);

        Assert.Single(lines);
        Assert.StartsWith($"netsolve: {(option == "-r" ? "--replications" : option)}: '{value}'", lines[0], StringComparison.Ordinal);
        Assert.Contains(bound, lines[0], StringComparison.Ordinal);
    }

    [Fact]
    public void Every_bad_value_is_reported_at_once()
    {
        string[] lines = Refused(2, "simulate", Millbrook, "-r", "2147483647", "--threads", "99999999999", "--duration", "1e300d");

        Assert.Equal(3, lines.Length);
    }

    [Fact]
    public void A_simulation_whose_estimated_work_is_above_the_bound_is_refused_unless_allowed()
    {
        // 2 events x 54.6 visits/h x (3650 + 3650) d x 24 h x 10,000 replications is about 1.9e11 events, above 1e9.
        string[] lines = Refused(2, "simulate", TestFiles.Network("kestrel-general"), "-r", "10000", "--duration", "3650d", "--warmup", "3650d");

        Assert.Single(lines);
        Assert.StartsWith("netsolve: --duration: the run would simulate about ", lines[0], StringComparison.Ordinal);
        Assert.Contains("more than the bound of 1e+9", lines[0], StringComparison.Ordinal);
        Assert.Contains("--allow-long", lines[0], StringComparison.Ordinal);
    }

    [Fact]
    public void Staff_with_no_target_is_a_usage_error()
    {
        string[] lines = Refused(2, "staff", Millbrook);

        Assert.Single(lines);
        Assert.StartsWith("netsolve: staff: give a target", lines[0], StringComparison.Ordinal);
    }

    [Fact]
    public void Pathway_without_from_is_a_usage_error()
    {
        string[] lines = Refused(2, "pathway", Millbrook);

        Assert.Single(lines);
        Assert.StartsWith("netsolve: pathway: give --from UNIT", lines[0], StringComparison.Ordinal);
    }
}
