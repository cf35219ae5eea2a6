using static NetSolve.Tests.Support.CliRun;

namespace NetSolve.Tests.Cli;

/// <summary>
/// A misspelt command or option is one line naming the word and the nearest real name, exit 2; the words it leaves
/// stray are not named again, and the file is not read.
/// </summary>
public sealed class UnknownWordsTests
{
    private static readonly string Harbourside = Path.Combine(AppContext.BaseDirectory, "networks", "harbourside.yaml");

    private const string UsageHint = "Run 'netsolve --help' for usage.";

    [Fact]
    public void A_misspelt_command_is_one_line_suggesting_the_real_one()
    {
        var (code, output, error) = Run("slove", Harbourside);

        Assert.Equal(2, code);
        Assert.Empty(output);
        Assert.Equal(["netsolve: unknown command 'slove'; did you mean 'solve'?", UsageHint], Lines(error));
    }

    [Fact]
    public void A_word_far_from_every_command_gets_no_suggestion()
    {
        var (code, _, error) = Run("xyzzy");

        Assert.Equal(2, code);
        Assert.Equal(["netsolve: unknown command 'xyzzy'", UsageHint], Lines(error));
    }

    [Theory]
    [InlineData("after FILE", new[] { "solve", "{file}", "--strian", "80" })]
    [InlineData("before FILE, where the parser takes it for FILE", new[] { "solve", "--strian", "80", "{file}" })]
    [InlineData("with its value after an equals sign", new[] { "solve", "--strian=80" })]
    public void A_misspelt_option_is_one_line_suggesting_the_real_one(string where, string[] args)
    {
        var (code, output, error) = Run(args.Select(arg => arg.Replace("{file}", Harbourside, StringComparison.Ordinal)).ToArray());

        Assert.True(code == 2, where);
        Assert.Empty(output);
        Assert.Equal(["netsolve: --strian: unknown option for 'solve'; did you mean '--strain'?", UsageHint], Lines(error));
    }

    [Fact]
    public void A_misspelt_option_is_reported_in_one_line_before_the_usage_hint()
    {
        var (code, _, error) = Run("staff", Harbourside, "--budgte", "3");

        Assert.Equal(2, code);
        Assert.Equal(
            [
                "netsolve: --budgte: unknown option for 'staff'; did you mean '--budget'?",
                UsageHint,
            ],
            Lines(error));
    }

    [Fact]
    public void An_option_every_command_inherits_is_suggested_too()
    {
        var (code, _, error) = Run("solve", Harbourside, "--verbsoe");

        Assert.Equal(2, code);
        Assert.Equal(["netsolve: --verbsoe: unknown option for 'solve'; did you mean '--verbose'?", UsageHint], Lines(error));
    }

    [Fact]
    public void A_negative_number_is_a_value_not_an_unknown_option()
    {
        var (code, _, error) = Run("solve", Harbourside, "--strain", "-5");

        Assert.Equal(2, code);
        Assert.Equal(["netsolve: --strain: '-5' is not a utilisation above 0 and at most 1 (write e.g. 0.85 or 85%)", UsageHint], Lines(error));
    }

    [Theory]
    [InlineData("staff with no target", new[] { "staff", "{file}" })]
    [InlineData("pathway without --from", new[] { "pathway", "{file}" })]
    [InlineData("a duration in words not understood", new[] { "staff", "{file}", "--max-wait", "30mins" })]
    [InlineData("a command without FILE", new[] { "solve" })]
    [InlineData("no command at all", new string[0])]
    [InlineData("compare without a scenario", new[] { "compare", "{file}" })]
    [InlineData("map without -o", new[] { "map", "{file}" })]
    [InlineData("report without -o", new[] { "report", "{file}" })]
    [InlineData("fit without a log", new[] { "fit" })]
    [InlineData("growth with a bad step count", new[] { "growth", "{file}", "--steps", "0" })]
    [InlineData("simulate with a bad replication count", new[] { "simulate", "{file}", "--replications", "0" })]
    [InlineData("check with an option it does not take", new[] { "check", "{file}", "--strain", "80%" })]
    public void Every_usage_error_exits_2_as_the_readme_says(string what, string[] args)
    {
        var (code, output, error) = Run(args.Select(arg => arg.Replace("{file}", Harbourside, StringComparison.Ordinal)).ToArray());

        Assert.True(code == 2, string.Concat(what, ": exit ", code.ToString(System.Globalization.CultureInfo.InvariantCulture), ": ", error));
        Assert.Empty(output);
        Assert.EndsWith(UsageHint + "\n", error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("name: t\nunits:\n  a:\n\tservers: 1\n    service: 1h\narrivals:\n  a: 0.5\n", 4)]
    [InlineData("name: t\nunits:\n  a:\n    servers: 1\n\tservice: 1h\narrivals:\n  a: 0.5\n", 5)]
    public void A_tab_in_the_indentation_is_reported_at_its_own_line_with_the_fix(string text, int line)
    {
        string path = Path.Combine(Path.GetTempPath(), string.Concat("netsolve-tab-", Guid.NewGuid().ToString("N"), ".yaml"));
        File.WriteAllText(path, text);
        try
        {
            var (code, _, error) = Run("check", path);

            Assert.Equal(1, code);
            Assert.Equal(
                [string.Create(System.Globalization.CultureInfo.InvariantCulture, $"{path}:{line}:1: a tab in the indentation; YAML indents with spaces: replace it with spaces")],
                Lines(error));
        }
        finally
        {
            File.Delete(path);
        }
    }

    private static string[] Lines(string text) => text.Split('\n', StringSplitOptions.RemoveEmptyEntries);
}
