using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening.Corpus;

/// <summary>
/// Hostile values from the command line and from files that used to be echoed raw to the terminal (ESC sequences,
/// NUL, direction overrides) or, in an output path, ended in exit 70: each is now shown escaped as <c>\uXXXX</c> in a
/// located line, and a path no file may have is a usage error naming the option.
/// </summary>
public sealed class EchoCorpusTests
{
    private static readonly string Harbourside = TestFiles.Network("harbourside");

    private static readonly string RowanLog = TestFiles.Log("rowan-urgent-care");

    [Theory]
    [InlineData("simulate", "--set", "\u202E1", "\\u202E1")]
    [InlineData("solve", "--strain", "\u001B[2J", "\\u001B[2J")]
    [InlineData("solve", "--format", "a\0b", "a\\u0000b")]
    [InlineData("growth", "--steps", "1\u00072", "1\\u00072")]
    [InlineData("solve", "--set", "servers.lab\n=3", "servers.lab\\u000A=3")]
    public void A_hostile_option_value_is_echoed_escaped(string command, string option, string value, string shown)
    {
        var result = CorpusCase.Run([command, Harbourside, option, value]);

        Assert.NotEqual(0, result.ExitCode);
        Assert.Contains(shown, result.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_unit_name_with_control_characters_in_a_movement_log_is_refused_with_the_characters_escaped()
    {
        var result = CorpusCase.Run(["fit", CorpusCase.File("log-control-characters.csv")]);

        Assert.Equal(1, result.ExitCode);
        Assert.Contains("log-control-characters.csv:5:", result.Error, StringComparison.Ordinal);
        Assert.Contains("log-control-characters.csv:7:", result.Error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("map", "out.svg\0")]
    [InlineData("report", "out.html\0")]
    [InlineData("fit", "out.yaml\0")]
    public void An_output_path_with_a_NUL_is_a_usage_error_naming_the_option(string command, string name)
    {
        string input = command == "fit" ? RowanLog : Harbourside;
        var result = CorpusCase.RunWriting(path => [command, input, "--output", path], name);

        Assert.Equal(2, result.ExitCode);
        Assert.StartsWith("netsolve: --output: ", result.Error, StringComparison.Ordinal);
        Assert.Contains("\\u0000", result.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_map_written_under_a_name_with_a_direction_override_is_confirmed_with_the_name_escaped()
    {
        var result = CorpusCase.RunWriting(path => ["map", Harbourside, "--output", path], "\u202Eout.svg");

        Assert.Equal(0, result.ExitCode);
        Assert.Contains("\\u202Eout.svg", result.Out, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("\u001B[31mred")]
    [InlineData("two\nlines")]
    [InlineData("\u202Eeman")]
    public void A_fitted_network_name_with_a_control_or_direction_character_is_a_usage_error(string name)
    {
        var result = CorpusCase.Run(["fit", RowanLog, "--name", name]);

        Assert.Equal(2, result.ExitCode);
        Assert.StartsWith("netsolve: --name: ", result.Error, StringComparison.Ordinal);
    }
}
