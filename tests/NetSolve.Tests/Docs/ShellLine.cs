namespace NetSolve.Tests.Docs;

/// <summary>A documented shell line split into its commands, with its trailing comment (where the markers live).</summary>
/// <param name="Commands">The commands separated by <c>;</c> or <c>&amp;&amp;</c>, in order.</param>
/// <param name="Comment">The text from an unquoted <c>#</c> to the end of the line, or empty.</param>
internal sealed record ShellLine(IReadOnlyList<ShellCommand> Commands, string Comment);
