using NetSolve.Tests.Support;
using static NetSolve.Tests.Hardening.HardeningRun;

namespace NetSolve.Tests.Hardening;

/// <summary><c>--set</c> factors and growth factors outside their range are one line each, never an infinity in the results.</summary>
public sealed class NumbersInSetTests
{
    private static readonly string Millbrook = TestFiles.Network("millbrook-clinic");

    [Fact]
    public void A_subnormal_factor_on_a_service_time_is_refused_with_the_factor_range()
    {
        string[] lines = Refused(1, "solve", Millbrook, "-f", "json", "--set", "service.reception*=1e-320");

        Assert.Equal(["--set service.reception*=1e-320: service: '1e-320' is too small for a factor (from 1e-9 to 1e9)"], lines);
    }

    [Fact]
    public void A_subnormal_factor_on_all_arrivals_is_refused_with_the_factor_range()
    {
        string[] lines = Refused(1, "solve", Millbrook, "-f", "csv", "--set", "arrivals*=1e-320");

        Assert.Equal(["--set arrivals*=1e-320: arrivals: '1e-320' is too small for a factor (0, or from 1e-9 to 1e9)"], lines);
    }

    [Fact]
    public void Factors_that_together_push_a_rate_beyond_its_range_are_refused_at_the_second()
    {
        string[] lines = Refused(1, "solve", Millbrook, "--set", "arrivals*=1e5", "--set", "arrivals*=1e5");

        Assert.Single(lines);
        Assert.StartsWith("--set arrivals*=1e5: unit 'reception': arrival rate: 900000/h times 100000 is too large", lines[0], StringComparison.Ordinal);
        Assert.Contains("is too large for a rate (0, or from 1e-9/h to 1e9/h)", lines[0], StringComparison.Ordinal);
    }

    [Fact]
    public void Growth_to_1e308_is_a_usage_error_naming_the_bound()
    {
        string[] lines = Refused(2, "growth", Millbrook, "--to", "1e308", "-f", "json");

        Assert.Equal(["netsolve: --to: '1e308' is not a growth factor above 0 and at most 1000 (1 is today's demand)"], lines);
    }
}
