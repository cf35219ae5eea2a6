using System.Globalization;
using System.Text.RegularExpressions;

namespace NetSolve.Tests.Docs;

/// <summary>
/// Finds the <c>netsolve</c> command lines of a Markdown document: the lines of fenced code blocks (no language,
/// <c>sh</c>, <c>bash</c> or <c>shell</c>) and of indented code whose commands begin with <c>netsolve</c> or
/// <c>./netsolve</c>, and inline code that is a whole <c>netsolve</c> command on a bundled file (<c>networks/</c>).
/// A line ending in a backslash continues on the next. A trailing <c># exits N</c> says the line shows an error
/// on purpose and must exit with N; <c># long</c> says it is a long simulation, run with a short cap.
/// </summary>
internal static partial class DocumentedCommandReader
{
    private const string NotRun = "uses a shell feature the test does not run: ";

    private static readonly string[] ShellLanguages = ["", "sh", "bash", "shell"];

    /// <summary>Every command line of the document at <paramref name="document"/> (relative to <paramref name="root"/>), in order.</summary>
    public static IReadOnlyList<DocumentedCommand> Read(string root, string document)
    {
        string[] lines = File.ReadAllLines(Path.Combine(root, document));
        var found = new List<DocumentedCommand>();
        string? fence = null;
        bool isShellFence = false;
        for (int index = 0; index < lines.Length; index++)
        {
            string trimmed = lines[index].TrimStart();
            int lineNumber = index + 1;
            if (fence is null && (trimmed.StartsWith("```", StringComparison.Ordinal) || trimmed.StartsWith("~~~", StringComparison.Ordinal)))
            {
                fence = trimmed[..3];
                isShellFence = ShellLanguages.Contains(trimmed.TrimStart('`', '~').Trim(), StringComparer.Ordinal);
            }
            else if (fence is not null && trimmed.StartsWith(fence, StringComparison.Ordinal))
            {
                fence = null;
            }
            else if ((fence is not null && isShellFence) || (fence is null && lines[index].StartsWith("    ", StringComparison.Ordinal)))
            {
                string text = trimmed;
                while (text.EndsWith('\\') && index + 1 < lines.Length)
                {
                    index++;
                    text = string.Concat(text.AsSpan(0, text.Length - 1), " ", lines[index].Trim());
                }

                found.AddRange(FromLine(root, document, lineNumber, text.Trim(), fence is null));
            }
            else if (fence is null)
            {
                found.AddRange(InlineCommand().Matches(lines[index]).SelectMany(match => FromLine(root, document, lineNumber, match.Groups["command"].Value, mustStartWithCommand: true)));
            }
        }

        return found;
    }

    private static List<DocumentedCommand> FromLine(string root, string document, int lineNumber, string text, bool mustStartWithCommand)
    {
        if (!MentionsCommand().IsMatch(text) || (mustStartWithCommand && !StartsWithCommand().IsMatch(text)))
        {
            return [];
        }

        ShellLine line;
        try
        {
            line = ShellLineParser.Parse(text, root);
        }
        catch (FormatException problem)
        {
            return [new DocumentedCommand(document, lineNumber, text, [], null, 0, false, string.Concat(NotRun, problem.Message))];
        }

        Match exits = ExitsMarker().Match(line.Comment);
        int expectedExitCode = exits.Success ? int.Parse(exits.Groups["code"].Value, CultureInfo.InvariantCulture) : 0;
        bool isLong = LongMarker().IsMatch(line.Comment);
        return line.Commands
            .Where(command => command.Words[0].Text is "netsolve" or "./netsolve")
            .Select(command => new DocumentedCommand(
                document,
                lineNumber,
                text,
                command.Words.Skip(1).ToList(),
                command.StdoutFile,
                expectedExitCode,
                isLong,
                command.Problem is null ? null : string.Concat(NotRun, command.Problem)))
            .ToList();
    }

    // A netsolve command somewhere on the line: at its start or after ';', '&&' or '|'.
    [GeneratedRegex(@"(^|[;&|]\s*)(\./)?netsolve(\s|$)")]
    private static partial Regex MentionsCommand();

    [GeneratedRegex(@"^(\./)?netsolve\s")]
    private static partial Regex StartsWithCommand();

    [GeneratedRegex(@"(?<!`)`(?<command>(\./)?netsolve [^`]*networks/[^`]*)`(?!`)")]
    private static partial Regex InlineCommand();

    [GeneratedRegex(@"^#\s*exits\s+(?<code>\d+)\b")]
    private static partial Regex ExitsMarker();

    [GeneratedRegex(@"^#\s*long\b")]
    private static partial Regex LongMarker();
}
