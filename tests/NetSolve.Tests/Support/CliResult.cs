namespace NetSolve.Tests.Support;

/// <summary>What one run of the command line gave: its exit code, stdout and stderr.</summary>
/// <param name="ExitCode">The process exit code the program would return (0 done, 1 bad input, 2 wrong usage).</param>
/// <param name="Out">Everything written to stdout.</param>
/// <param name="Error">Everything written to stderr.</param>
internal sealed record CliResult(int ExitCode, string Out, string Error);
