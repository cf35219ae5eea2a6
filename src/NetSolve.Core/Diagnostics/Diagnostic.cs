namespace NetSolve.Diagnostics;

/// <summary>One finding about an input file, located and worded for the planner.</summary>
/// <param name="Severity">Error or warning.</param>
/// <param name="Code">A stable code: NS01xx reading, NS02xx rules, NS03xx solving.</param>
/// <param name="Location">Where in the file.</param>
/// <param name="Subject">The unit the finding is about (<c>unit 'ed'</c>, <c>units 'a', 'b'</c>), or null.</param>
/// <param name="Message">What is wrong, in one line.</param>
public sealed record Diagnostic(DiagnosticSeverity Severity, string Code, SourceLocation Location, string? Subject, string Message)
{
    private readonly Func<string>? _buildMessage;
    private string? _message = Message;

    /// <summary>A finding whose message is worded only when first asked for (see <see cref="Warning(string, SourceLocation, string?, Func{string})"/>).</summary>
    private Diagnostic(DiagnosticSeverity severity, string code, SourceLocation location, string? subject, Func<string> buildMessage)
        : this(severity, code, location, subject, (string)null!) => _buildMessage = buildMessage;

    /// <summary>What is wrong, in one line.</summary>
    /// <remarks>Built at most once, on first use, for a finding made with a deferred message; idempotent, so thread-safe.</remarks>
    public string Message
    {
        get => _message ??= _buildMessage!();
        init => _message = value;
    }

    /// <summary>An error about a unit (or none).</summary>
    public static Diagnostic Error(string code, SourceLocation location, string? unitId, string message) =>
        new(DiagnosticSeverity.Error, code, location, unitId is null ? null : $"unit '{unitId}'", message);

    /// <summary>A warning about a unit (or none).</summary>
    public static Diagnostic Warning(string code, SourceLocation location, string? unitId, string message) =>
        new(DiagnosticSeverity.Warning, code, location, unitId is null ? null : $"unit '{unitId}'", message);

    /// <summary>
    /// A warning about a unit (or none) whose message is built only when read: a generated file can carry tens of
    /// thousands of one warning, of which the command line prints the first few and counts the rest.
    /// </summary>
    internal static Diagnostic Warning(string code, SourceLocation location, string? unitId, Func<string> buildMessage) =>
        new(DiagnosticSeverity.Warning, code, location, unitId is null ? null : $"unit '{unitId}'", buildMessage);

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

    /// <summary>Equal when every property is: a deferred message compares by its text.</summary>
    public bool Equals(Diagnostic? other) => other is not null && Severity == other.Severity
        && string.Equals(Code, other.Code, StringComparison.Ordinal) && Location == other.Location
        && string.Equals(Subject, other.Subject, StringComparison.Ordinal) && string.Equals(Message, other.Message, StringComparison.Ordinal);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Severity, Code, Location, Subject, Message);
}
