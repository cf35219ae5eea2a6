using System.Globalization;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Docs;

/// <summary>
/// Runs a document's commands in order, in this process, as a planner would from the repository root: files the
/// commands read come from the repository (or from an earlier command of the same document), files they write
/// (<c>-o</c>, <c>--output</c>, <c>&gt;</c>) go to a temporary folder that stands in for the root, so the tree is
/// never written to.
/// </summary>
internal static class DocumentedCommandRunner
{
    /// <summary>What a <c># long</c> command runs with instead of its full length: a week, two replications.</summary>
    public static IReadOnlyList<string> LongRunCap { get; } = ["--duration", "7d", "--replications", "2"];

    /// <summary>Runs every command and returns one line per command that failed, naming its document, line and text.</summary>
    public static IReadOnlyList<string> RunAll(string root, IReadOnlyList<DocumentedCommand> commands)
    {
        string work = Directory.CreateTempSubdirectory("netsolve-docs-").FullName;
        try
        {
            return commands.Select(command => RunOne(root, work, command)).OfType<string>().ToList();
        }
        finally
        {
            Directory.Delete(work, recursive: true);
        }
    }

    private static string? RunOne(string root, string work, DocumentedCommand command)
    {
        string where = string.Create(CultureInfo.InvariantCulture, $"{command.Document}:{command.Line}: `{command.Text}`");
        if (command.Problem is not null)
        {
            return string.Concat(where, " ", command.Problem);
        }

        CliResult result;
        try
        {
            var arguments = new PathRewriter(root, work).Arguments(command.Arguments);
            if (command.IsLong)
            {
                arguments.AddRange(LongRunCap);
            }

            result = CliRun.Run([.. arguments]);
            if (command.StdoutFile is not null)
            {
                File.WriteAllText(new PathRewriter(root, work).Output(command.StdoutFile), result.Out);
            }
        }
        catch (FormatException problem)
        {
            return string.Concat(where, " ", problem.Message);
        }

        if (result.ExitCode == command.ExpectedExitCode)
        {
            return null;
        }

        string firstError = result.Error.Split('\n', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries).FirstOrDefault() ?? "(nothing on stderr)";
        return string.Create(CultureInfo.InvariantCulture, $"{where} exited {result.ExitCode}, expected {command.ExpectedExitCode}: {firstError}");
    }
}
