namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>What one input did.</summary>
/// <param name="ExitCode">The exit code, or -1 when the run did not finish or threw out of the program.</param>
/// <param name="Findings">Every broken part of the contract; empty when the input was handled.</param>
/// <param name="PeakWorkingSet">Largest working set of the process during the run, in bytes.</param>
/// <param name="Elapsed">How long the run took, in wall time.</param>
/// <param name="Harness">Wall time around the run: writing its files, checking what it gave, removing its folder.</param>
internal sealed record FuzzOutcome(int ExitCode, IReadOnlyList<FuzzFinding> Findings, long PeakWorkingSet, TimeSpan Elapsed, TimeSpan Harness);
