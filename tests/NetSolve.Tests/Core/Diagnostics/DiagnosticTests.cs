using NetSolve.Diagnostics;

namespace NetSolve.Tests.Core.Diagnostics;

public sealed class DiagnosticTests
{
    private static readonly SourceLocation Place = new("net.yaml", 6, 14);

    // Source: the network file contract, "Rules the parser enforces": a warning is one line,
    // FILE:LINE:COL: warning: unit 'ID': message.
    [Fact]
    public void A_warning_worded_when_read_prints_the_same_line_as_one_worded_at_once()
    {
        var deferred = Diagnostic.Warning(DiagnosticCodes.BareNumber, Place, "imaging", () => "service '25' has no unit of time");
        var eager = Diagnostic.Warning(DiagnosticCodes.BareNumber, Place, "imaging", "service '25' has no unit of time");

        Assert.Equal("net.yaml:6:14: warning: unit 'imaging': service '25' has no unit of time", deferred.ToString());
        Assert.Equal(eager, deferred);
        Assert.Equal(eager.GetHashCode(), deferred.GetHashCode());
    }

    [Fact]
    public void A_deferred_message_is_built_once_and_only_when_read()
    {
        int built = 0;
        var warning = Diagnostic.Warning(DiagnosticCodes.BareNumber, Place, "imaging", () =>
        {
            built++;
            return "service '25' has no unit of time";
        });

        Assert.Equal(0, built);
        Assert.Equal("service '25' has no unit of time", warning.Message);
        _ = warning.ToString();
        Assert.Equal(1, built);
    }

    [Fact]
    public void Findings_that_say_different_things_are_not_equal()
    {
        var warning = Diagnostic.Warning(DiagnosticCodes.BareNumber, Place, "imaging", () => "service '25' has no unit of time");

        Assert.NotEqual(warning, warning with { Message = "service '26' has no unit of time" });
        Assert.NotEqual(warning, warning with { Location = Place with { Line = 7 } });
        Assert.NotEqual(warning, Diagnostic.Error(DiagnosticCodes.BareNumber, Place, "imaging", "service '25' has no unit of time"));
    }
}
