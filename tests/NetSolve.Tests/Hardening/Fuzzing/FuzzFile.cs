namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>One file an input needs, written under the input's own temporary folder before the run.</summary>
/// <param name="RelativePath">Path under the temporary folder, with forward slashes.</param>
/// <param name="Content">The exact bytes: mutations may make them invalid UTF-8 on purpose.</param>
internal sealed record FuzzFile(string RelativePath, byte[] Content);
