using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening.Corpus;

/// <summary>
/// Numbers that used to reach the output as NaN or Infinity (JSON exit 70, CSV "Infinity", a 300-digit utilisation,
/// "arrivals grow by Infinity%"): each is now refused with one located line or solved with finite numbers, in every format.
/// </summary>
public sealed class NumberCorpusTests
{
    private static readonly string Harbourside = TestFiles.Network("harbourside");

    [Theory]
    [InlineData("service-denormal.yaml", "table")]
    [InlineData("service-denormal.yaml", "json")]
    [InlineData("service-denormal.yaml", "csv")]
    [InlineData("route-denormal.yaml", "table")]
    [InlineData("route-denormal.yaml", "json")]
    [InlineData("route-denormal.yaml", "csv")]
    [InlineData("huge-arrivals-and-service.yaml", "table")]
    [InlineData("huge-arrivals-and-service.yaml", "json")]
    [InlineData("huge-arrivals-and-service.yaml", "csv")]
    [InlineData("service-samples-near-max.yaml", "table")]
    [InlineData("service-samples-near-max.yaml", "json")]
    [InlineData("service-samples-near-max.yaml", "csv")]
    [InlineData("nan-service.yaml", "json")]
    public void An_extreme_number_in_the_file_is_refused_or_solved_finite(string file, string format) =>
        CorpusCase.Run(["solve", CorpusCase.File(file), "--format", format]);

    [Fact]
    public void A_time_varying_chain_at_the_rounding_floor_settles_instead_of_running_every_cycle()
    {
        // A cycle of the chain is a stochastic map, which never moves two distributions apart in total variation
        // (a contraction in the L1 norm; e.g. Seneta, Non-negative Matrices and Markov Chains, 2nd ed., 1981, §3.1,
        // from memory), so a change under the tolerance that stops shrinking is rounding: the chain has settled.
        var result = CorpusCase.Run(["solve", CorpusCase.File("chain-at-rounding-floor.yaml"), "--format", "csv"]);

        Assert.Equal(0, result.ExitCode);
        Assert.DoesNotContain("did not settle", result.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Service_samples_near_the_largest_double_do_not_break_a_short_simulation() =>
        CorpusCase.Run(["simulate", CorpusCase.File("service-samples-near-max.yaml"), "--replications", "2", "--warmup", "1h", "--duration", "4h", "--format", "json"]);

    [Theory]
    [InlineData("service.lab*=1e-320", "json")]
    [InlineData("service.lab*=1e-320", "csv")]
    [InlineData("arrivals*=1e-320", "json")]
    [InlineData("arrivals*=1e-320", "csv")]
    [InlineData("arrivals*=1e-320", "table")]
    public void A_what_if_change_by_a_denormal_factor_is_refused_or_solved_finite(string change, string format) =>
        CorpusCase.Run(["solve", Harbourside, "--set", change, "--format", format]);

    [Theory]
    [InlineData("json")]
    [InlineData("csv")]
    [InlineData("table")]
    public void Growth_to_the_largest_double_is_refused_or_finite(string format) =>
        CorpusCase.Run(["growth", Harbourside, "--to", "1e308", "--format", format]);
}
