using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening.Corpus;

/// <summary>
/// Movement logs and <c>fit</c> options the fuzzer found ending in exit 70 or an unlocated line: a stay years long
/// (a mistyped date) gave a spread no queueing formula takes, and a <c>--report</c> name with a NUL or no characters
/// reached the file system; each is now one located line.
/// </summary>
public sealed class FitCorpusTests
{
    private static readonly string Log = TestFiles.Log("rowan-urgent-care");

    [Fact]
    public void A_stay_that_ends_in_the_year_9999_is_one_located_line_naming_the_unit()
    {
        string log = CorpusCase.File("log-stay-years-off.csv");

        var result = CorpusCase.Run(["fit", log]);

        // The log is the first 120 lines of networks/logs/rowan-urgent-care.csv with one x-ray stay ending 9999-12-31.
        Assert.Equal(1, result.ExitCode);
        Assert.StartsWith(log + ": unit 'xray': stays vary too much to model", result.Error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("out.html\0", "is not a usable file name")]
    [InlineData("", "an empty value names no file")]
    public void A_report_name_no_file_may_have_is_a_usage_error_naming_the_option(string name, string reason)
    {
        var result = CorpusCase.Run(["fit", Log, "--report", name]);

        Assert.Equal(2, result.ExitCode);
        Assert.StartsWith("netsolve: --report: ", result.Error, StringComparison.Ordinal);
        Assert.Contains(reason, result.Error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("fit", "--unit-map")]
    [InlineData("solve", null)]
    public void An_empty_path_to_read_is_one_line_that_shows_it(string command, string? option)
    {
        string[] arguments = option is null ? [command, string.Empty] : [command, Log, option, string.Empty];

        var result = CorpusCase.Run(arguments);

        Assert.Equal(1, result.ExitCode);
        Assert.StartsWith("'': an empty path names no file", result.Error, StringComparison.Ordinal);
    }
}
