namespace NetSolve.Tests.Docs;

/// <summary>One word of a documented shell line, its quotes removed.</summary>
/// <param name="Text">The word as the shell would hand it to the program.</param>
/// <param name="IsPattern">True when an unquoted <c>*</c> or <c>?</c> makes it a file name pattern the shell expands.</param>
internal sealed record ShellWord(string Text, bool IsPattern);
