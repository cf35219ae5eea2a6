namespace NetSolve.Tests.Docs;

/// <summary>One simple command of a documented shell line: its words and where its stdout goes.</summary>
/// <param name="Words">The program and its arguments; for a pipeline, only the first command's.</param>
/// <param name="StdoutFile">The file named after <c>&gt;</c>, or null when stdout is not redirected.</param>
/// <param name="Problem">Why the command cannot be run as written (a variable other than <c>$PWD</c>), or null.</param>
internal sealed record ShellCommand(IReadOnlyList<ShellWord> Words, string? StdoutFile, string? Problem);
