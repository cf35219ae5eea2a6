using NetSolve.Diagnostics;

namespace NetSolve.Cli;

/// <summary>Where a command writes: stdout for results, stderr for diagnostics and progress. Injectable for tests.</summary>
/// <param name="Out">Results.</param>
/// <param name="Error">Errors, warnings, progress.</param>
/// <param name="IsTerminal">True when stderr is an interactive terminal (progress bars, colour).</param>
internal sealed record CliContext(TextWriter Out, TextWriter Error, bool IsTerminal = false)
{
    /// <summary>
    /// Writes one line to stderr (or several, one per problem), with anything the terminal could act on escaped: the
    /// last guard for a message that quotes input without <see cref="Messages"/> (a parser's own wording).
    /// </summary>
    public void Report(string line) => Error.Write(TerminalText.Lines(line) + "\n");
}
