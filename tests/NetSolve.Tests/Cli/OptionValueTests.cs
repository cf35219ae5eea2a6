using static NetSolve.Tests.Support.CliRun;
using System.Globalization;

namespace NetSolve.Tests.Cli;

/// <summary>
/// Option values are read by the program's own parsers: in invariant culture, with limits, every bad value a usage
/// error of one line naming its option, all of them at once, exit 2, never a stack trace.
/// </summary>
public sealed class OptionValueTests
{
    private static readonly string Harbourside = Path.Combine(AppContext.BaseDirectory, "networks", "harbourside.yaml");

    private const string UsageHint = "Run 'netsolve --help' for usage.";

    [Fact]
    public void Every_bad_option_of_staff_is_one_line_naming_it_and_the_command_exits_2()
    {
        var (code, output, error) = Run("staff", Harbourside, "--max-wait", "abc", "--max-util", "185%", "--budget", "-1");

        Assert.Equal(2, code);
        Assert.Empty(output);
        Assert.Equal(
            [
                "netsolve: --max-util: '185%' is not a utilisation from 0 to 1 (write e.g. 0.85 or 85%)",
                "netsolve: --max-wait: 'abc' is not a duration (write e.g. 30min, 4h, 2d; a bare number is in the file's time unit)",
                "netsolve: --budget: '-1' is not a whole number from 0 to 1000000",
                "netsolve: staff: --budget answers its own question; give it without targets or --only (--cost weighs its servers)",
                UsageHint,
            ],
            Lines(error));
    }

    [Fact]
    public void A_bad_value_and_a_broken_rule_between_options_are_reported_together()
    {
        var (code, _, error) = Run("growth", Harbourside, "--steps", "abc", "--from", "3", "--to", "2");

        Assert.Equal(2, code);
        Assert.Equal(
            [
                "netsolve: --steps: 'abc' is not a whole number from 1 to 10000",
                "netsolve: growth: the last factor (2) is below the first (3); give --to above --from",
                UsageHint,
            ],
            Lines(error));
    }

    [Theory]
    [InlineData("--strain", "1e308")]
    [InlineData("--strain", "NaN")]
    [InlineData("--strain", "-0.5")]
    [InlineData("--format", "xml")]
    public void Solve_refuses_an_absurd_shared_option(string option, string value) => AssertOneUsageLine(["solve", Harbourside, option, value], option);

    [Theory]
    [InlineData("--max-util", "1e308")]
    [InlineData("--max-util", "NaN")]
    [InlineData("--max-util", "Infinity")]
    [InlineData("--budget", "99999999999")]
    [InlineData("--budget", "1e308")]
    [InlineData("--budget", "2000000000")]
    [InlineData("--max-wait", "30mins")]
    [InlineData("--max-time", "-1h")]
    [InlineData("--at-most", "150%")]
    [InlineData("--max-turned-away", "150%")]
    [InlineData("--max-turned-away", "often")]
    [InlineData("--cost", "ward")]
    [InlineData("--cost", "ward=1e308")]
    public void Staff_refuses_an_absurd_value(string option, string value)
    {
        // Otherwise a complete question, so the bad value is the only problem.
        string[] rest = option switch
        {
            "--budget" or "--max-util" or "--max-turned-away" => [],
            "--at-most" => ["--wait-over", "4h"],
            _ => ["--max-util", "0.9"],
        };
        AssertOneUsageLine(["staff", Harbourside, .. rest, option, value], option);
    }

    [Theory]
    [InlineData("--steps", "99999999999")]
    [InlineData("--steps", "0")]
    [InlineData("--steps", "1e3")]
    [InlineData("--from", "1e308")]
    [InlineData("--from", "-1")]
    [InlineData("--to", "NaN")]
    [InlineData("--to", "0")]
    public void Growth_refuses_an_absurd_value(string option, string value) => AssertOneUsageLine(["growth", Harbourside, option, value], option);

    [Theory]
    [InlineData("--replications", "99999999999")]
    [InlineData("--replications", "2000000000")]
    [InlineData("--replications", "0")]
    [InlineData("--threads", "99999999999")]
    [InlineData("--threads", "-1")]
    [InlineData("--seed", "-1")]
    [InlineData("--seed", "99999999999999999999")]
    [InlineData("--duration", "1e308")]
    [InlineData("--duration", "1e308h")]
    [InlineData("--duration", "NaN")]
    [InlineData("--warmup", "-1d")]
    [InlineData("--warmup", "4000d")]
    [InlineData("--wait-over", "soon")]
    public void Simulate_refuses_an_absurd_value_before_it_runs(string option, string value) =>
        AssertOneUsageLine(["simulate", Harbourside, option, value], option);

    [Fact]
    public void A_bare_run_length_too_long_in_the_files_time_unit_is_a_usage_error_naming_the_option()
    {
        // 5000 minutes is a short run; in a file measured in days it is 5000 days, past the ten-year limit.
        string path = Path.Combine(Path.GetTempPath(), $"netsolve-days-{Guid.NewGuid():N}.yaml");
        File.WriteAllText(path, "time_unit: day\nunits:\n  ward:\n    servers: 10\n    service: 2d\narrivals:\n  ward: 3\n");
        try
        {
            var (code, output, error) = Run("simulate", path, "--duration", "5000");

            Assert.Equal(2, code);
            Assert.Empty(output);
            Assert.Equal(["netsolve: --duration: '5000' is longer than 3650 days; longer runs are better spent as more replications", UsageHint], Lines(error));
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Theory]
    [InlineData("staff")]
    [InlineData("staff", "--wait-over", "4h")]
    [InlineData("staff", "--max-wait", "30mins")]
    [InlineData("pathway")]
    [InlineData("pathway", "--to", "ward")]
    [InlineData("compare")]
    public void A_question_missing_or_half_asked_is_a_usage_error(params string[] args)
    {
        var (code, output, error) = Run([args[0], Harbourside, .. args[1..]]);

        Assert.Equal(2, code);
        Assert.Empty(output);
        Assert.Equal(UsageHint, Lines(error)[^1]);
        Assert.DoesNotContain("warning", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Numbers_are_read_the_same_under_a_comma_decimal_culture()
    {
        var culture = CultureInfo.CurrentCulture;
        try
        {
            var (_, invariant, _) = Run("growth", Harbourside, "--from", "0.5", "--to", "1.5", "--steps", "3", "--format", "csv");
            CultureInfo.CurrentCulture = new CultureInfo("de-DE");
            var (code, german, _) = Run("growth", Harbourside, "--from", "0.5", "--to", "1.5", "--steps", "3", "--format", "csv");
            var (commaCode, _, commaError) = Run("staff", Harbourside, "--max-util", "0,8");

            Assert.Equal(0, code);
            Assert.Equal(invariant, german);
            Assert.Equal(2, commaCode);
            Assert.StartsWith("netsolve: --max-util: '0,8' is not a utilisation", commaError, StringComparison.Ordinal);
        }
        finally
        {
            CultureInfo.CurrentCulture = culture;
        }
    }

    [Fact]
    public void Unknown_units_named_in_options_are_all_reported_with_suggestions_and_exit_1()
    {
        var (code, output, error) = Run("pathway", Harbourside, "--from", "emergancy", "--to", "wrd", "--path", "lab,imagng");

        Assert.Equal(1, code);
        Assert.Empty(output);
        Assert.Equal(
            [
                "netsolve: --from emergancy: unknown unit 'emergancy'; did you mean 'emergency'?",
                "netsolve: --to wrd: unknown unit 'wrd'; did you mean 'ward'?",
                "netsolve: --path lab,imagng: unknown unit 'imagng'; did you mean 'imaging'?",
            ],
            Lines(error).Where(line => line.StartsWith("netsolve:", StringComparison.Ordinal)),
            StringComparer.Ordinal);
    }

    private static void AssertOneUsageLine(string[] args, string option)
    {
        var (code, output, error) = Run(args);

        Assert.True(code == 2, error);
        Assert.Empty(output);
        var lines = Lines(error);
        Assert.Equal(2, lines.Length);
        Assert.StartsWith($"netsolve: {option}: ", lines[0], StringComparison.Ordinal);
        Assert.Equal(UsageHint, lines[1]);
        Assert.DoesNotContain("Exception", error, StringComparison.Ordinal);
    }

    private static string[] Lines(string text) => text.Split('\n', StringSplitOptions.RemoveEmptyEntries);

}
