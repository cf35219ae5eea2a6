using System.Text;
using System.Text.RegularExpressions;
using NetSolve.Diagnostics;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>
/// The contract for any input, however hostile: exit 0, 1 or 2; on 1 and 2 stderr is plain lines, one per problem,
/// with no exception or stack trace; no NaN or Infinity in stdout or a written file; no raw control or direction
/// override characters in what a terminal or spreadsheet shows; an output file absent, untouched or complete.
/// </summary>
internal static partial class CliInvariant
{
    /// <summary>Follows the usage errors (as the program writes it).</summary>
    public const string UsageHint = "Run 'netsolve --help' for usage.";

    /// <summary>Starts every line the program writes about itself.</summary>
    private const string ProgramPrefix = "netsolve: ";

    /// <summary>Every way <paramref name="result"/> breaks the contract (empty when it holds).</summary>
    /// <param name="result">What the run gave.</param>
    /// <param name="arguments">The command line, to tell a label the planner wrote from a value the program made.</param>
    /// <param name="inputText">All input files as text, for the same reason.</param>
    public static IReadOnlyList<FuzzFinding> Check(CliResult result, IReadOnlyList<string> arguments, string inputText)
    {
        var findings = new List<FuzzFinding>();
        if (result.ExitCode is not (0 or 1 or 2))
        {
            findings.Add(new FuzzFinding(FuzzFailureKind.Crash, string.Create(System.Globalization.CultureInfo.InvariantCulture, $"exit {result.ExitCode}: {FirstLine(result.Error)}")));
        }

        CheckErrorShape(result, findings);
        CheckLocated(result, arguments, findings);
        string given = string.Join('\n', arguments) + "\n" + inputText;
        CheckFinite("stdout", result.Out, given, findings);
        CheckText("stdout", result.Out, given, findings);
        CheckText("stderr", result.Error, given, findings);
        if (IsCsv(arguments))
        {
            CheckCsv(result.Out, findings);
        }

        return findings;
    }

    /// <summary>The findings about a written output file: absent, the old bytes, or complete for its format; and no stray files beside it.</summary>
    /// <param name="exitCode">The run's exit code: a run that succeeded must have written the file.</param>
    /// <param name="outputPath">The file the run was asked to write, if any.</param>
    /// <param name="oldOutput">What the file held before the run, if anything.</param>
    /// <param name="strayFiles">Files in the run's folder that are neither inputs nor the output.</param>
    /// <param name="given">The command line and input files as text.</param>
    /// <param name="isText">True when the file is text whatever its extension (<c>fit</c> writes a network file under any name).</param>
    public static IReadOnlyList<FuzzFinding> CheckOutput(int exitCode, string? outputPath, byte[]? oldOutput, IEnumerable<string> strayFiles, string given, bool isText = false)
    {
        var findings = new List<FuzzFinding>();
        foreach (string stray in strayFiles)
        {
            findings.Add(new FuzzFinding(FuzzFailureKind.PartialWrite, "file left behind: " + Path.GetFileName(stray)));
        }

        if (outputPath is null || !File.Exists(outputPath))
        {
            if (outputPath is not null && exitCode == 0)
            {
                findings.Add(new FuzzFinding(FuzzFailureKind.PartialWrite, "exit 0 but no output file"));
            }

            return findings;
        }

        byte[] bytes = File.ReadAllBytes(outputPath);
        if (oldOutput is not null && bytes.AsSpan().SequenceEqual(oldOutput))
        {
            return findings;
        }

        string? problem = OutputFormats.Incomplete(isText ? outputPath + ".txt" : outputPath, bytes);
        if (problem is not null)
        {
            findings.Add(new FuzzFinding(FuzzFailureKind.PartialWrite, problem));
        }

        if (isText || !OutputFormats.IsBinary(outputPath))
        {
            CheckFinite(Path.GetExtension(outputPath) + " file", Encoding.UTF8.GetString(bytes), given, findings);
        }

        return findings;
    }

    private static void CheckErrorShape(CliResult result, List<FuzzFinding> findings)
    {
        string[] lines = result.Error.TrimEnd('\n').Split('\n');
        if (result.ExitCode is 1 or 2 && result.Error.Length == 0)
        {
            findings.Add(new FuzzFinding(FuzzFailureKind.ErrorShape, "exit code without a message"));
        }

        foreach (string line in result.Error.Length == 0 ? [] : lines)
        {
            if (line.StartsWith("   at ", StringComparison.Ordinal) || line.Contains("Exception", StringComparison.Ordinal))
            {
                findings.Add(new FuzzFinding(FuzzFailureKind.ErrorShape, "stack trace or exception: " + Shorten(line)));
                return;
            }

            if (line.Trim().Length == 0)
            {
                findings.Add(new FuzzFinding(FuzzFailureKind.ErrorShape, "empty or blank line in stderr"));
                return;
            }
        }
    }

    /// <summary>
    /// On exit 1 or 2, every stderr line must say where its problem is: a file with line and column
    /// (<c>FILE:LINE:COL: ...</c>), a whole file (<c>FILE: ...</c>, a path), an option (<c>netsolve: --steps: ...</c>, <c>--set EXPR: ...</c>),
    /// a command's own question (<c>netsolve: staff: ...</c>) or a token of the command line it quotes; warnings and the
    /// usage hint may stand beside them.
    /// </summary>
    private static void CheckLocated(CliResult result, IReadOnlyList<string> arguments, List<FuzzFinding> findings)
    {
        if (result.ExitCode is not (1 or 2) || result.Error.Length == 0)
        {
            return;
        }

        foreach (string line in result.Error.TrimEnd('\n').Split('\n'))
        {
            if (!IsLocated(line, arguments))
            {
                findings.Add(new FuzzFinding(FuzzFailureKind.ErrorShape, "stderr line says neither file, line and column nor option: " + Shorten(line)));
                return;
            }
        }
    }

    /// <summary>True when <paramref name="line"/> is one located problem, a warning or the usage hint (see <see cref="CheckLocated"/>).</summary>
    public static bool IsLocated(string line, IReadOnlyList<string> arguments)
    {
        if (string.Equals(line, UsageHint, StringComparison.Ordinal) || FileLineColumn().IsMatch(line) || OptionFirst().IsMatch(line))
        {
            return true;
        }

        string[] shown = [.. arguments.Where(argument => argument.Length > 0).Select(TerminalText.Quote)];
        int colon = line.IndexOf(": ", StringComparison.Ordinal);
        string head = colon < 0 ? line : line[..colon];
        // An empty path, typed as '', is shown as '' (the only way to point at it).
        bool emptyPath = string.Equals(head, "''", StringComparison.Ordinal) && arguments.Any(argument => argument.Length == 0);
        if (colon > 0 && (head.Contains('/', StringComparison.Ordinal) || shown.Contains(head, StringComparer.Ordinal) || emptyPath))
        {
            return true;
        }

        if (!line.StartsWith(ProgramPrefix, StringComparison.Ordinal))
        {
            return false;
        }

        string rest = line[ProgramPrefix.Length..];
        string command = arguments.Count > 0 ? arguments[0] : string.Empty;
        return rest.StartsWith('-')
            || rest.StartsWith("warning: ", StringComparison.Ordinal)
            || (command.Length > 0 && (rest.StartsWith(command + ": ", StringComparison.Ordinal) || rest.StartsWith(command + " ", StringComparison.Ordinal)))
            || shown.Any(token => rest.Contains("'" + token + "'", StringComparison.Ordinal));
    }

    private static void CheckFinite(string where, string text, string given, List<FuzzFinding> findings)
    {
        foreach (Match match in NotFinite().Matches(text))
        {
            if (!given.Contains(match.Value, StringComparison.Ordinal))
            {
                findings.Add(new FuzzFinding(FuzzFailureKind.NotFinite, where + ": " + match.Value + " in " + Shorten(LineAround(text, match.Index))));
                return;
            }
        }
    }

    private static void CheckText(string where, string text, string given, List<FuzzFinding> findings)
    {
        foreach (Match match in UnsafeCharacter().Matches(text))
        {
            findings.Add(new FuzzFinding(FuzzFailureKind.UnsafeText, string.Create(System.Globalization.CultureInfo.InvariantCulture,
                $"{where}: raw U+{(int)match.Value[0]:X4}{(given.Contains(match.Value, StringComparison.Ordinal) ? " from the input" : string.Empty)}")));
            return;
        }
    }

    private static void CheckCsv(string text, List<FuzzFinding> findings)
    {
        foreach (string line in text.Split('\n'))
        {
            foreach (string cell in line.Split(','))
            {
                string value = cell.TrimStart('"');
                if (value.Length > 0 && (value[0] is '=' or '+' or '@' or '\t' or '\r' || (value[0] == '-' && value.Length > 1 && !char.IsAsciiDigit(value[1]))))
                {
                    findings.Add(new FuzzFinding(FuzzFailureKind.UnsafeText, "csv: a cell starts with '" + Shorten(value[..1]) + "' (formula injection)"));
                    return;
                }
            }
        }
    }

    private static bool IsCsv(IReadOnlyList<string> arguments)
    {
        int at = arguments.ToList().FindLastIndex(argument => argument is "--format" or "-f");
        return at >= 0 && at + 1 < arguments.Count && string.Equals(arguments[at + 1], "csv", StringComparison.Ordinal);
    }

    private static string FirstLine(string text) => Shorten(text.Split('\n')[0]);

    private static string LineAround(string text, int index)
    {
        int start = text.LastIndexOf('\n', Math.Max(0, index - 1)) + 1;
        int end = text.IndexOf('\n', index);
        return text[start..(end < 0 ? text.Length : end)];
    }

    /// <summary>At most 160 characters, with control characters shown as <c>?</c>, so a finding is one readable line.</summary>
    public static string Shorten(string text)
    {
        var clean = new string([.. text.Select(c => char.IsControl(c) ? '?' : c)]).Trim();
        return clean.Length > 160 ? clean[..160] + "..." : clean;
    }

    [GeneratedRegex(@"^.+?:[0-9]+:[0-9]+: ", RegexOptions.CultureInvariant)]
    private static partial Regex FileLineColumn();

    [GeneratedRegex(@"^--[a-z]", RegexOptions.CultureInvariant)]
    private static partial Regex OptionFirst();

    [GeneratedRegex(@"(?<![A-Za-z])(NaN|-?Infinity|∞)(?![A-Za-z])", RegexOptions.CultureInvariant | RegexOptions.ExplicitCapture)]
    private static partial Regex NotFinite();

    [GeneratedRegex(@"[\x00-\x08\x0B\x0C\x0E-\x1F\x7F\u202A-\u202E\u2066-\u2069]", RegexOptions.CultureInvariant)]
    private static partial Regex UnsafeCharacter();
}
