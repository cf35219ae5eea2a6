using System.Globalization;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Journeys;

public sealed class JourneyCsvTests
{
    private static readonly string Kestrel = TestFiles.Network("kestrel-general");

    [Fact]
    public void Solve_csv_ends_with_a_journey_row_whose_figures_are_those_of_the_json()
    {
        var (code, output, _) = CliRun.Run("solve", Kestrel, "--format", "csv");

        Assert.Equal(0, code);
        var lines = output.TrimEnd('\n').Split('\n');
        var header = lines[0].Split(',');
        Assert.EndsWith(",kind,patients,journey_rate,journey_mean_time,journey_p50,journey_p90,journey_p95,journey_p99,journey_over_4h,journey_over_12h", lines[0], StringComparison.Ordinal);
        var journey = lines[^1].Split(',');
        Assert.Equal(header.Length, journey.Length);
        Assert.Equal("emergency_stay", journey[0]);
        Assert.Equal("journey", journey[Array.IndexOf(header, "kind")]);
        Assert.Equal("all", journey[Array.IndexOf(header, "patients")]);
        Assert.Equal(string.Empty, journey[Array.IndexOf(header, "utilisation")]);
        Assert.Equal("unit", lines[1].Split(',')[Array.IndexOf(header, "kind")]);
        double share = double.Parse(journey[Array.IndexOf(header, "journey_over_4h")], CultureInfo.InvariantCulture);
        Assert.InRange(share, 0.40, 0.46); // the 42.9% the table and JSON give, docs/network-file.md, "Journeys"
    }

    [Fact]
    public void Simulate_csv_gives_the_journey_row_each_figure_with_its_half_width()
    {
        var (code, output, _) = CliRun.Run("simulate", Kestrel, "--format", "csv", "--replications", "2", "--duration", "7d", "--warmup", "2d");

        Assert.Equal(0, code);
        var lines = output.TrimEnd('\n').Split('\n');
        Assert.EndsWith(",journey_over_4h,journey_over_4h_ci,journey_over_4h_upper_bound,journey_over_12h,journey_over_12h_ci,journey_over_12h_upper_bound", lines[0], StringComparison.Ordinal);
        Assert.Contains(",kind,patients,journey_rate,journey_rate_ci,journey_mean_time,journey_mean_time_ci,", lines[0], StringComparison.Ordinal);
        Assert.StartsWith("emergency_stay,", lines[^1], StringComparison.Ordinal);
        Assert.Equal(lines[0].Split(',').Length, lines[^1].Split(',').Length); // the journey's label holds no comma, so fields split plainly
    }

    [Fact]
    public void A_csv_without_journeys_has_no_kind_column()
    {
        var (code, output, _) = CliRun.Run("solve", TestFiles.Network("harbourside"), "--format", "csv");

        Assert.Equal(0, code);
        Assert.DoesNotContain("kind", output.Split('\n')[0], StringComparison.Ordinal);
    }

    [Fact]
    public void A_journey_label_that_starts_a_formula_is_neutralised_in_the_csv()
    {
        var (code, output, _) = SolveFile("units:\n  triage: { servers: 2, service: 20min }\narrivals:\n  triage: 3\njourneys:\n  stay: { label: \"=1+2\", units: [triage], over: [1h] }\n", "--format", "csv");

        Assert.Equal(0, code);
        Assert.DoesNotContain(",=1+2,", output, StringComparison.Ordinal);
        Assert.Contains("'=1+2", output, StringComparison.Ordinal);
    }

    [Fact]
    public void A_bare_number_in_a_journey_over_list_is_a_warning_at_the_value()
    {
        var (code, _, error) = SolveFile("time_unit: minute\nunits:\n  triage: { servers: 2, service: 20min }\narrivals:\n  triage: 3/h\njourneys:\n  stay: { units: [triage], over: [1h, 240] }\n");

        Assert.Equal(0, code);
        Assert.Contains(":7:39: warning: journey 'stay': over '240' has no unit of time, so it was read as 240 minutes (the file's time_unit is minute); write e.g. 240min or 240h to say which", error, StringComparison.Ordinal);
        Assert.DoesNotContain("'1h'", error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_group_route_to_an_unknown_unit_names_the_group()
    {
        var (code, _, error) = SolveFile("units:\n  a: { servers: 2, service: 20min }\narrivals:\n  a: 1\ngroups:\n  walk_in:\n    arrivals:\n      a: 1\n    routes:\n      a:\n        zz: 50%\n");

        Assert.Equal(1, code);
        Assert.Contains(":11:9: group 'walk_in': routes.a: unknown unit 'zz'", error, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", error, StringComparison.Ordinal);
    }

    /// <summary>Runs <c>solve</c> on <paramref name="yaml"/> written to a file of its own, deleted afterwards.</summary>
    private static CliResult SolveFile(string yaml, params string[] options)
    {
        string file = Path.Combine(Path.GetTempPath(), "netsolve-journey-csv-" + Guid.NewGuid().ToString("N") + ".yaml");
        File.WriteAllText(file, yaml);
        try
        {
            return CliRun.Run(["solve", file, .. options]);
        }
        finally
        {
            File.Delete(file);
        }
    }
}
