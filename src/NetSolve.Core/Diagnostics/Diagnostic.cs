namespace NetSolve.Diagnostics;

/// <summary>One finding about an input file, located and worded for the planner.</summary>
/// <param name="Severity">Error or warning.</param>
/// <param name="Code">A stable code: NS01xx reading, NS02xx rules, NS03xx solving.</param>
/// <param name="Location">Where in the file.</param>
/// <param name="Subject">The unit the finding is about (<c>unit 'ed'</c>, <c>units 'a', 'b'</c>), or null.</param>
/// <param name="Message">What is wrong, in one line.</param>
public sealed record Diagnostic(DiagnosticSeverity Severity, string Code, SourceLocation Location, string? Subject, string Message)
{
    /// <summary>An error about a unit (or none).</summary>
    public static Diagnostic Error(string code, SourceLocation location, string? unitId, string message) =>
        new(DiagnosticSeverity.Error, code, location, unitId is null ? null : $"unit '{unitId}'", message);

    /// <summary>A warning about a unit (or none).</summary>
    public static Diagnostic Warning(string code, SourceLocation location, string? unitId, string message) =>
        new(DiagnosticSeverity.Warning, code, location, unitId is null ? null : $"unit '{unitId}'", message);

    /// <summary>True for an error.</summary>
    public bool IsError => Severity == DiagnosticSeverity.Error;

    /// <summary>
    /// The contract's one-line form: <c>FILE:LINE:COL: unit 'ID': message</c>; warnings put <c>warning: </c>
    /// after the location. Values quoted from the input (a label with ESC, a right-to-left override, a line feed)
    /// are escaped (<see cref="TerminalText.Quote"/>), so the line stays one line and the terminal shows them as text.
    /// </summary>
    public override string ToString()
    {
        string severity = IsError ? string.Empty : "warning: ";
        string subject = Subject is null ? string.Empty : Subject + ": ";
        return TerminalText.Quote($"{Location}: {severity}{subject}{Message}");
    }
}
