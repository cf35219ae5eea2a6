using NetSolve.Tests.Support;
using static NetSolve.Tests.Hardening.HardeningRun;

namespace NetSolve.Tests.Hardening;

/// <summary>
/// Values in a network or scenario file outside their documented range (docs/network-file.md, "Ranges") are a located
/// line saying the range, exit 1, in every format: never an infinity in the results.
/// </summary>
public sealed class NumbersInFilesTests
{
    public static TheoryData<string> Formats => ["table", "json", "csv"];

    [Theory]
    [MemberData(nameof(Formats))]
    public void A_subnormal_service_time_is_a_located_error_saying_the_range(string format)
    {
        string file = MillbrookWith(("service: 3min", "service: 1e-320h"));

        string[] lines = Refused(1, "solve", file, "-f", format);

        Assert.Equal([$"{file}:9:14: unit 'reception': service: '1e-320h' is too short for a duration (from 1e-6 s to 100 years)"], lines);
    }

    [Theory]
    [MemberData(nameof(Formats))]
    public void A_subnormal_route_fraction_is_a_located_error_saying_the_range(string format)
    {
        string file = MillbrookWith(("xray: 20%", "xray: 1e-320"));

        string[] lines = Refused(1, "solve", file, "-f", format);

        Assert.Equal([$"{file}:26:11: unit 'clinician': route to 'xray': '1e-320' is too small for a probability (0, or from 1e-9 to 1)"], lines);
    }

    [Theory]
    [MemberData(nameof(Formats))]
    public void Huge_arrivals_and_a_huge_service_time_are_both_refused_with_their_ranges(string format)
    {
        string file = MillbrookWith(("service: 3min", "service: 1e300h"), ("reception: 9/h", "reception: 1e300/h"));

        string[] lines = Refused(1, "solve", file, "-f", format);

        Assert.Equal(
            [
                $"{file}:9:14: unit 'reception': service: '1e300h' is too long for a duration (from 1e-6 s to 100 years)",
                $"{file}:20:14: unit 'reception': arrival rate: '1e300/h' is too large for a rate (0, or from 1e-9/h to 1e9/h)",
            ],
            lines);
    }

    [Fact]
    public void Service_samples_near_the_largest_double_are_refused_before_their_mean_overflows()
    {
        string file = MillbrookWith(("service: 3min", "service_distribution: empirical\n    service_samples: [1.7e308h, 1.7e308h]"));

        string[] lines = Refused(1, "solve", file, "-f", "json");

        Assert.Equal(2, lines.Length);
        Assert.All(lines, line => Assert.EndsWith("'1.7e308h' is too long for a duration (from 1e-6 s to 100 years)", line, StringComparison.Ordinal));
    }

    [Fact]
    public void A_coefficient_of_variation_far_above_any_service_is_refused_with_its_range()
    {
        string file = MillbrookWith(("service: 3min", "service: 3min\n    service_distribution: lognormal\n    service_cv: 1e200"));

        string[] lines = Refused(1, "solve", file);

        Assert.Single(lines);
        Assert.EndsWith("'1e200' is not a coefficient of variation (from 0 to 100; 1 is exponential, 0 evenly spaced)", lines[0], StringComparison.Ordinal);
    }

    [Fact]
    public void A_scenario_factor_of_x_alone_is_a_located_error_not_a_crash()
    {
        string folder = Directory.CreateTempSubdirectory("netsolve-hardening-").FullName;
        string scenario = Path.Combine(folder, "scenario.yaml");
        File.WriteAllText(scenario, $"scenario: Bad factor\nbase: {TestFiles.Network("harbourside")}\nservice:\n  emergency: x\n");

        string[] lines = Refused(1, "solve", scenario);

        Assert.Single(lines);
        Assert.StartsWith($"{scenario}:4:14: unit 'emergency': service:", lines[0], StringComparison.Ordinal);
        Assert.Contains("is not a factor", lines[0], StringComparison.Ordinal);
    }
}
