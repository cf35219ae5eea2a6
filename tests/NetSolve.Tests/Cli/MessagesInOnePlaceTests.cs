using System.Text.RegularExpressions;

namespace NetSolve.Tests.Cli;

/// <summary>Every line the command line shows people is written in src/NetSolve.Cli/Messages.cs, not in a command.</summary>
public sealed partial class MessagesInOnePlaceTests
{
    [Fact]
    public void No_command_line_source_file_but_messages_writes_an_error_or_report_text_of_its_own()
    {
        string folder = Path.Combine(RepositoryRoot(), "src", "NetSolve.Cli");
        var hits = Directory.EnumerateFiles(folder, "*.cs", SearchOption.AllDirectories)
            .Where(path => Path.GetFileName(path) != "Messages.cs" && !path.Contains($"{Path.DirectorySeparatorChar}obj{Path.DirectorySeparatorChar}", StringComparison.Ordinal))
            .SelectMany(path => File.ReadLines(path).Select((line, index) => (path, line, index)))
            .Where(hit => OwnText().IsMatch(hit.line))
            .Select(hit => FormattableString.Invariant($"{Path.GetRelativePath(folder, hit.path)}:{hit.index + 1}: {hit.line.Trim()}"))
            .ToList();

        Assert.Empty(hits);
    }

    // A string literal handed to the places a message leaves by: exceptions the user sees, parse errors, stderr lines.
    [GeneratedRegex("""(InputException|UsageException|AddError|Report)\(\$?"|"netsolve: """)]
    private static partial Regex OwnText();

    private static string RepositoryRoot()
    {
        var directory = new DirectoryInfo(AppContext.BaseDirectory);
        while (directory is not null && !File.Exists(Path.Combine(directory.FullName, "NetSolve.sln")))
        {
            directory = directory.Parent;
        }

        return directory?.FullName ?? throw new InvalidOperationException("NetSolve.sln not found above the test output folder");
    }
}
