using NetSolve.Cli;
using NetSolve.Diagnostics;

namespace NetSolve.Tests.Cli;

/// <summary>A file with thousands of the same warning shows a few of them and one line for the rest.</summary>
public sealed class WarningLogTests
{
    [Fact]
    public void Warnings_of_one_kind_past_the_first_twenty_are_summed_up_in_one_line()
    {
        using var error = new StringWriter();
        var log = new WarningLog(new CliContext(TextWriter.Null, error));
        var warnings = Enumerable.Range(1, 25)
            .Select(line => Diagnostic.Warning(DiagnosticCodes.BareNumber, new SourceLocation("big.yaml", line, 3), "u" + line.ToString(System.Globalization.CultureInfo.InvariantCulture), "bare"))
            .Append(Diagnostic.Warning(DiagnosticCodes.UnknownKey, new SourceLocation("big.yaml", 30, 3), null, "other"))
            .ToList();

        log.ReportAll(warnings, "big.yaml");

        string[] lines = error.ToString().TrimEnd('\n').Split('\n');
        Assert.Equal(WarningLog.ShownPerKind + 2, lines.Length);
        Assert.Equal("big.yaml:30:3: warning: other", lines[^2]);
        Assert.Equal($"big.yaml: warning: 5 more warnings of a kind shown above (code {DiagnosticCodes.BareNumber}) are not listed; 20 of each kind are", lines[^1]);
    }
}
