namespace NetSolve.Tests.Docs;

/// <summary>The shell subset documented command lines may use (DEVELOPERS.md, "Commands in the documents").</summary>
public sealed class ShellLineParserTests
{
    private const string Root = "/repo";

    [Fact]
    public void Quotes_are_removed_and_keep_spaces_and_comparison_signs_inside_one_word()
    {
        var line = ShellLineParser.Parse("netsolve solve a.yaml --target 'ward: mean_wait <= 1h' --set \"servers.ward=3\"", Root);

        Assert.Equal(["netsolve", "solve", "a.yaml", "--target", "ward: mean_wait <= 1h", "--set", "servers.ward=3"], Words(line.Commands[0]));
    }

    [Fact]
    public void A_trailing_comment_is_kept_apart_for_the_markers()
    {
        var line = ShellLineParser.Parse("netsolve check bad.yaml   # exits 1: a misspelt key", Root);

        Assert.Equal(["netsolve", "check", "bad.yaml"], Words(line.Commands[0]));
        Assert.Equal("# exits 1: a misspelt key", line.Comment);
    }

    [Fact]
    public void Semicolons_and_double_ampersands_separate_commands()
    {
        var line = ShellLineParser.Parse("export PATH=\"$PWD:/bin\"; netsolve solve a.yaml && netsolve check a.yaml", Root);

        Assert.Equal(3, line.Commands.Count);
        Assert.Equal(["netsolve", "check", "a.yaml"], Words(line.Commands[2]));
    }

    [Fact]
    public void Only_the_first_command_of_a_pipeline_is_kept()
    {
        var line = ShellLineParser.Parse("netsolve solve a.yaml --format csv | head -3", Root);

        Assert.Equal(["netsolve", "solve", "a.yaml", "--format", "csv"], Words(Assert.Single(line.Commands)));
    }

    [Fact]
    public void A_redirection_names_the_stdout_file_and_is_not_an_argument()
    {
        var command = Assert.Single(ShellLineParser.Parse("netsolve solve a.yaml --format json > out.json", Root).Commands);

        Assert.Equal(["netsolve", "solve", "a.yaml", "--format", "json"], Words(command));
        Assert.Equal("out.json", command.StdoutFile);
    }

    [Fact]
    public void Pwd_is_the_working_directory_and_an_unquoted_star_makes_a_pattern()
    {
        var words = Assert.Single(ShellLineParser.Parse("netsolve compare $PWD/a.yaml ${PWD}/s/*.yaml 'x*'", Root).Commands).Words;

        Assert.Equal(["netsolve", "compare", "/repo/a.yaml", "/repo/s/*.yaml", "x*"], (string[])[.. words.Select(word => word.Text)]);
        Assert.Equal([false, false, false, true, false], (bool[])[.. words.Select(word => word.IsPattern)]);
    }

    [Fact]
    public void A_variable_other_than_pwd_makes_only_its_own_command_one_that_cannot_run()
    {
        var line = ShellLineParser.Parse("export PATH=\"$PWD:$PATH\"; netsolve solve $HOME/a.yaml; netsolve check a.yaml", Root);

        Assert.Equal(["'$PATH' (only $PWD is read)", "'$HOME' (only $PWD is read)", null], line.Commands.Select(command => command.Problem).ToArray());
    }

    [Theory]
    [InlineData("netsolve solve $(ls networks | head -1)")]
    [InlineData("netsolve solve `ls`")]
    [InlineData("netsolve solve a.yaml 2> err.txt")]
    [InlineData("netsolve solve a.yaml >> out.txt")]
    [InlineData("netsolve solve < a.yaml")]
    [InlineData("netsolve solve a.yaml || true")]
    [InlineData("netsolve solve a.yaml &")]
    [InlineData("netsolve solve 'a.yaml")]
    [InlineData("netsolve solve a.yaml >")]
    public void A_shell_feature_outside_the_subset_is_refused(string text)
    {
        Assert.Throws<FormatException>(() => ShellLineParser.Parse(text, Root));
    }

    private static string[] Words(ShellCommand command) => [.. command.Words.Select(word => word.Text)];
}
