using NetSolve.Tests.Hardening.Corpus;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening;

/// <summary>The estimate of a simulation's work bounds <c>simulate</c> and <c>report --simulate</c> alike.</summary>
public sealed class WorkBoundTests
{
    private static readonly string Harbourside = TestFiles.Network("harbourside");

    [Fact]
    public void A_report_whose_simulation_is_too_much_work_is_refused_before_it_starts()
    {
        var result = CorpusCase.RunWriting(
            path => ["report", Harbourside, "--output", path, "--simulate", "--replications", "10000", "--duration", "3650d"], "report.html");

        Assert.Equal(2, result.ExitCode);
        Assert.Contains("--allow-long", result.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Allow_long_in_a_report_needs_simulate() =>
        Assert.Contains("--allow-long applies only with --simulate",
            CorpusCase.RunWriting(path => ["report", Harbourside, "--output", path, "--allow-long"], "report.html").Error, StringComparison.Ordinal);
}
