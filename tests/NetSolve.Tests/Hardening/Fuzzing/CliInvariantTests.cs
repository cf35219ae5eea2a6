using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>The harness's own check fails on each kind of broken contract and passes a plain error.</summary>
public sealed class CliInvariantTests
{
    private static readonly string[] Solve = ["solve", "network.yaml"];

    [Fact]
    public void A_located_one_line_error_with_exit_1_keeps_the_contract()
    {
        var result = new CliResult(1, string.Empty, "network.yaml:3:5: unit 'lab': service: 'abc' is not a duration\n");

        Assert.Empty(CliInvariant.Check(result, Solve, "service: abc"));
    }

    [Theory]
    [InlineData(70, "", "netsolve: internal error: boom\n", "Crash")]
    [InlineData(134, "", "Unhandled exception. System.InvalidOperationException: x\n   at Main()\n", "Crash")]
    [InlineData(1, "", "bad\n   at NetSolve.Parsing.Read()\n", "ErrorShape")]
    [InlineData(1, "", "", "ErrorShape")]
    [InlineData(1, "", "something went wrong\n", "ErrorShape")]
    [InlineData(2, "", "netsolve: the value is bad\n", "ErrorShape")]
    [InlineData(0, "util Infinity%\n", "", "NotFinite")]
    [InlineData(0, "{\"wait\": NaN}\n", "", "NotFinite")]
    [InlineData(0, "label \u001B[2J\n", "", "UnsafeText")]
    [InlineData(0, "label \u202Egnp.exe\n", "", "UnsafeText")]
    public void Each_broken_part_of_the_contract_is_found(int exitCode, string output, string error, string kind)
    {
        var findings = CliInvariant.Check(new CliResult(exitCode, output, error), Solve, string.Empty);

        Assert.Contains(Enum.Parse<FuzzFailureKind>(kind), findings.Select(finding => finding.Kind));
    }

    [Theory]
    [InlineData("network.yaml:3:5: unit 'lab': bad")]
    [InlineData("/tmp/x/base.yaml: no such file")]
    [InlineData("network.yaml: is a directory, not a network file")]
    [InlineData("netsolve: --steps: '0' is not a whole number from 1 to 10000")]
    [InlineData("netsolve: solve: give a target")]
    [InlineData("netsolve: warning: unit 'lab' relaxes slowly")]
    [InlineData("--set servers.x=1: unknown unit 'x'")]
    [InlineData("Run 'netsolve --help' for usage.")]
    public void A_line_that_says_its_file_option_or_command_is_located(string line) =>
        Assert.True(CliInvariant.IsLocated(line, Solve));

        [Fact]
    public void A_label_the_planner_wrote_as_Infinity_is_not_a_number_the_program_made()
    {
        var result = new CliResult(0, "Infinity ward  12 servers\n", string.Empty);

        Assert.Empty(CliInvariant.Check(result, Solve, "label: Infinity ward"));
    }

    [Fact]
    public void A_csv_cell_that_a_spreadsheet_would_run_is_found_and_a_negative_number_is_not()
    {
        string[] csv = ["solve", "network.yaml", "--format", "csv"];

        Assert.Contains(FuzzFailureKind.UnsafeText, CliInvariant.Check(new CliResult(0, "id,label\nlab,=HYPERLINK(1)\n", string.Empty), csv, string.Empty).Select(finding => finding.Kind));
        Assert.Empty(CliInvariant.Check(new CliResult(0, "id,change\nlab,-0.25\n", string.Empty), csv, string.Empty));
    }

    [Theory]
    [InlineData("out.json", "{\"units\": [", "json that does not parse")]
    [InlineData("out.svg", "<svg><g></svg>", "svg that is not well-formed XML")]
    [InlineData("out.html", "<html><body>", "html without its closing tag")]
    [InlineData("out.dot", "digraph {", "dot without its closing brace")]
    public void A_half_written_output_file_is_found(string name, string content, string problem)
    {
        var folder = Directory.CreateTempSubdirectory("netsolve-invariant-");
        try
        {
            string path = Path.Combine(folder.FullName, name);
            File.WriteAllText(path, content);

            var findings = CliInvariant.CheckOutput(0, path, null, [], string.Empty);

            Assert.StartsWith(problem, Assert.Single(findings).Detail, StringComparison.Ordinal);
        }
        finally
        {
            folder.Delete(recursive: true);
        }
    }

    [Fact]
    public void An_output_file_left_as_it_was_or_absent_after_a_failure_keeps_the_contract()
    {
        var folder = Directory.CreateTempSubdirectory("netsolve-invariant-");
        try
        {
            string path = Path.Combine(folder.FullName, "out.svg");
            byte[] old = "old content\n"u8.ToArray();
            File.WriteAllBytes(path, old);

            Assert.Empty(CliInvariant.CheckOutput(1, path, old, [], string.Empty));
            Assert.Empty(CliInvariant.CheckOutput(1, Path.Combine(folder.FullName, "absent.svg"), null, [], string.Empty));
            Assert.Single(CliInvariant.CheckOutput(1, path, old, [Path.Combine(folder.FullName, ".out.svg.tmp")], string.Empty));
        }
        finally
        {
            folder.Delete(recursive: true);
        }
    }
}
