using NetSolve.Tests.Support;

namespace NetSolve.Tests.Docs;

/// <summary>
/// Every <c>netsolve</c> command written in README.md and docs/*.md runs as written on the bundled examples and
/// exits 0, or with the code its <c># exits N</c> marker promises (DEVELOPERS.md, "Commands in the documents").
/// </summary>
public sealed class DocumentedCommandsTests
{
    private static readonly string[] Readme = ["README.md"];
    private static readonly string[] DocumentsWithCommands = ["README.md", "docs/map-and-report.md", "docs/movement-log.md", "docs/scenarios.md"];

    public static TheoryData<string> Documents => new(
        Readme.Concat(
            Directory.EnumerateFiles(Path.Combine(Repository.Root, "docs"), "*.md")
                .Select(Repository.Relative)
                .Order(StringComparer.Ordinal)));

    [Theory]
    [MemberData(nameof(Documents))]
    public void Every_command_of_the_document_runs_as_written_and_exits_as_it_says(string document)
    {
        var commands = DocumentedCommandReader.Read(Repository.Root, document);

        var failures = DocumentedCommandRunner.RunAll(Repository.Root, commands);

        Assert.True(failures.Count == 0, string.Join(Environment.NewLine, failures));
    }

    [Fact]
    public void The_documents_that_show_commands_are_read_with_their_commands()
    {
        var counts = DocumentsWithCommands
            .ToDictionary(document => document, document => DocumentedCommandReader.Read(Repository.Root, document).Count, StringComparer.Ordinal);

        Assert.All(counts, count => Assert.True(count.Value >= 3, string.Concat(count.Key, " has too few commands")));
    }

    [Fact]
    public void A_command_that_writes_a_file_writes_it_in_a_temporary_folder_and_a_later_command_reads_it_there()
    {
        var commands = new[]
        {
            Command(1, "netsolve fit networks/logs/rowan-urgent-care.csv -o networks/rowan.yaml"),
            Command(2, "netsolve check networks/rowan.yaml"),
        };

        var failures = DocumentedCommandRunner.RunAll(Repository.Root, commands);

        Assert.Empty(failures);
        Assert.False(File.Exists(Path.Combine(Repository.Root, "networks", "rowan.yaml")));
    }

    [Fact]
    public void A_command_that_fails_is_reported_with_its_document_line_and_text()
    {
        var failures = DocumentedCommandRunner.RunAll(Repository.Root, [Command(12, "netsolve solve networks/no-such-hospital.yaml")]);

        string failure = Assert.Single(failures);
        Assert.StartsWith("test.md:12: `netsolve solve networks/no-such-hospital.yaml` exited 1, expected 0: ", failure, StringComparison.Ordinal);
    }

    [Fact]
    public void A_line_marked_as_an_error_fails_when_it_succeeds()
    {
        var failures = DocumentedCommandRunner.RunAll(Repository.Root, [Command(3, "netsolve check networks/harbourside.yaml   # exits 1: shows an error")]);

        Assert.Contains("exited 0, expected 1", Assert.Single(failures), StringComparison.Ordinal);
    }

    [Fact]
    public void A_line_marked_as_an_error_passes_when_it_exits_with_that_code()
    {
        var failures = DocumentedCommandRunner.RunAll(Repository.Root, [Command(3, "netsolve solve networks/harbourside.yaml --steps 0   # exits 2: a usage error")]);

        Assert.Empty(failures);
    }

    [Fact]
    public void A_line_marked_long_runs_with_the_short_run_cap_added()
    {
        // solve takes no run length, so the added cap shows itself as the usage error it causes.
        var failures = DocumentedCommandRunner.RunAll(Repository.Root, [Command(5, "netsolve solve networks/harbourside.yaml   # long")]);

        Assert.Contains("exited 2, expected 0: netsolve: --duration", Assert.Single(failures), StringComparison.Ordinal);
    }

    [Fact]
    public void A_line_outside_the_shell_subset_fails_naming_what_it_uses()
    {
        var failures = DocumentedCommandRunner.RunAll(Repository.Root, [Command(4, "netsolve solve $HOME/x.yaml")]);

        Assert.Contains("uses a shell feature the test does not run: '$HOME'", Assert.Single(failures), StringComparison.Ordinal);
    }

    private static DocumentedCommand Command(int line, string text)
    {
        string folder = Directory.CreateTempSubdirectory("netsolve-docs-reader-").FullName;
        try
        {
            File.WriteAllLines(Path.Combine(folder, "test.md"), [.. Enumerable.Repeat("", line - 1), "    " + text]);
            return Assert.Single(DocumentedCommandReader.Read(folder, "test.md"));
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }
}
