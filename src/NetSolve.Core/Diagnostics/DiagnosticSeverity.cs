namespace NetSolve.Diagnostics;

/// <summary>Whether a diagnostic stops the solve.</summary>
public enum DiagnosticSeverity
{
    /// <summary>Shown on stderr; the solve goes on.</summary>
    Warning,

    /// <summary>The input is invalid; nothing is solved (exit code 1).</summary>
    Error,
}
