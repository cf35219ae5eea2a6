using System.Text.RegularExpressions;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>A group of findings that look alike: the same kind and the same message once numbers, quotes and paths are blurred.</summary>
/// <param name="Kind">The kind of failure.</param>
/// <param name="Signature">The blurred message.</param>
internal sealed partial record FailureClass(FuzzFailureKind Kind, string Signature)
{
    /// <summary>The class a finding falls in.</summary>
    public static FailureClass Of(FuzzFinding finding)
    {
        string blurred = Quoted().Replace(finding.Detail, "'…'");
        blurred = TempPath().Replace(blurred, "{dir}");
        blurred = Digits().Replace(blurred, "N");
        return new FailureClass(finding.Kind, blurred.Length > 90 ? blurred[..90] : blurred);
    }

    [GeneratedRegex(@"'[^']*'|""[^""]*""", RegexOptions.CultureInvariant)]
    private static partial Regex Quoted();

    [GeneratedRegex(@"\S*netsolve-fuzz-\S*", RegexOptions.CultureInvariant)]
    private static partial Regex TempPath();

    [GeneratedRegex(@"\d+(\.\d+)?([eE][-+]?\d+)?", RegexOptions.CultureInvariant | RegexOptions.ExplicitCapture)]
    private static partial Regex Digits();
}
