namespace NetSolve.Tests.Docs;

/// <summary>Which lines of a document are read as <c>netsolve</c> commands (DEVELOPERS.md, "Commands in the documents").</summary>
public sealed class DocumentedCommandReaderTests
{
    [Fact]
    public void Shell_blocks_continued_lines_indented_code_and_whole_inline_commands_are_read_with_their_lines()
    {
        var commands = Read(
            "Text with `netsolve solve networks/harbourside.yaml` inline.",
            "```sh",
            "netsolve staff networks/harbourside.yaml \\",
            "  --max-wait 30min   # exits 1: shown failing",
            "```",
            "",
            "    netsolve simulate networks/larkspur-simulation.yaml   # long");

        Assert.Equal([1, 3, 7], commands.Select(command => command.Line).ToArray());
        Assert.Equal(["solve", "staff", "simulate"], commands.Select(command => command.Arguments[0].Text).ToArray());
        Assert.Equal("30min", commands[1].Arguments[^1].Text);
        Assert.Equal([0, 1, 0], commands.Select(command => command.ExpectedExitCode).ToArray());
        Assert.Equal([false, false, true], commands.Select(command => command.IsLong).ToArray());
    }

    [Fact]
    public void Output_blocks_syntax_with_placeholders_and_other_programs_are_not_read()
    {
        var commands = Read(
            "`netsolve solve FILE` and `netsolve map FILE -o map.svg` are syntax.",
            "```text",
            "netsolve solve networks/harbourside.yaml",
            "netsolve: warning: unit 'ward' ...",
            "```",
            "```sh",
            "dotnet test -- --filter-class '*Docs*'",
            "NETSOLVE_APPROVE=1 dotnet test",
            "```");

        Assert.Empty(commands);
    }

    private static IReadOnlyList<DocumentedCommand> Read(params string[] lines)
    {
        string folder = Directory.CreateTempSubdirectory("netsolve-docs-reader-").FullName;
        try
        {
            File.WriteAllLines(Path.Combine(folder, "test.md"), lines);
            return DocumentedCommandReader.Read(folder, "test.md");
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }
}
