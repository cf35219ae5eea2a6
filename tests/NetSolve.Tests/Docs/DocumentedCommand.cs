namespace NetSolve.Tests.Docs;

/// <summary>A <c>netsolve</c> command line written in a document, ready to run.</summary>
/// <param name="Document">The document, relative to the repository root (<c>docs/scenarios.md</c>).</param>
/// <param name="Line">The 1-based line the command starts on.</param>
/// <param name="Text">The line as written, for the failure message.</param>
/// <param name="Arguments">The words after <c>netsolve</c>.</param>
/// <param name="StdoutFile">Where the line redirects stdout with <c>&gt;</c>, or null.</param>
/// <param name="ExpectedExitCode">0, or the code a <c># exits N</c> marker promises.</param>
/// <param name="IsLong">True when a <c># long</c> marker asks for the short run cap.</param>
/// <param name="Problem">Why the line cannot be run as written (a shell feature outside the subset), or null.</param>
internal sealed record DocumentedCommand(
    string Document,
    int Line,
    string Text,
    IReadOnlyList<ShellWord> Arguments,
    string? StdoutFile,
    int ExpectedExitCode,
    bool IsLong,
    string? Problem);
