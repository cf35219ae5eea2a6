namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>One way a run broke the contract for bad input.</summary>
/// <param name="Kind">The class of failure: what the summary counts and what a minimised input must still show.</param>
/// <param name="Detail">What was seen, one line, for the report.</param>
internal sealed record FuzzFinding(FuzzFailureKind Kind, string Detail);
