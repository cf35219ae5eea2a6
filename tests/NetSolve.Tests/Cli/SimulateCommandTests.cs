using System.Text.Json;
using NetSolve.Tests.Support;
using static NetSolve.Tests.Support.CliRun;

namespace NetSolve.Tests.Cli;

public sealed class SimulateCommandTests
{
    private static readonly string Example = TestFiles.Network("larkspur-simulation");

    [Fact]
    public void Json_has_the_solve_shape_plus_confidence_percentile_and_run_fields()
    {
        var (code, output, error) = Run("simulate", Example, "--format", "json", "--replications", "3", "--warmup", "7d", "--duration", "28d", "--wait-over", "4h", "--compare");

        Assert.Equal(0, code);
        AssertOnlySlowUnitWarnings(error);
        using var document = JsonDocument.Parse(output);
        var root = document.RootElement;
        Assert.Equal("hour", root.GetProperty("time_unit").GetString());
        Assert.Equal(3, root.GetProperty("simulation").GetProperty("replications_finished").GetInt32());
        var unit = root.GetProperty("units")[0];
        foreach (string field in new[] { "id", "label", "servers", "arrival_rate", "visits_per_patient", "offered_load", "utilisation", "p_wait",
            "mean_queue", "mean_wait", "mean_in_unit", "mean_time_in_unit", "headroom", "status", "utilisation_ci", "mean_wait_ci" })
        {
            Assert.True(unit.TryGetProperty(field, out _), field);
        }

        Assert.Equal(4, unit.GetProperty("time_in_unit_percentiles").EnumerateObject().Count(p => !p.Name.EndsWith("_ci", StringComparison.Ordinal)));
        Assert.Equal(4.0, unit.GetProperty("p_wait_over")[0].GetProperty("wait").GetDouble());
        Assert.Equal(24, unit.GetProperty("mean_queue_by_hour").GetArrayLength());
        Assert.True(unit.GetProperty("compare").GetProperty("mean_wait").TryGetProperty("verdict", out _));
        foreach (string field in new[] { "external_arrival_rate", "throughput", "throughput_ci", "mean_in_system", "mean_time_in_system" })
        {
            Assert.True(root.GetProperty("totals").TryGetProperty(field, out _), field);
        }
    }

    [Fact]
    public void With_compare_the_csv_has_a_row_per_unit_and_metric_with_the_verdicts_of_the_table()
    {
        string[] common = ["simulate", Example, "--replications", "3", "--warmup", "7d", "--duration", "28d", "--seed", "5", "--compare"];

        var csv = Run([.. common, "--format", "csv"]);
        var table = Run(common);

        Assert.Equal(0, csv.ExitCode);
        AssertOnlySlowUnitWarnings(csv.Error);
        var rows = CsvRows.Parse(csv.Out);
        Assert.Equal(["unit", "metric", "formula", "simulated", "simulated_ci", "verdict", "time_unit", "relative_error", "method", "formula_exact", "suspect", "relative_error_ci"], rows[0]);

        // Source: the larkspur file has five units; the comparison judges seven metrics of each, and its one journey
        // six (mean, p50, p90, p95, p99 and the share over 4 h).
        Assert.Equal((5 * 7) + 6, rows.Count - 1);
        Assert.Equal(
            ComparisonTableRows.Parse(table.Out).Select(row => (row.Unit, row.Metric, row.Verdict)),
            rows.Skip(1).Select(row => (row[0], row[1], row[5])));
    }

    [Fact]
    public void With_one_replication_the_comparison_says_no_formula_value_could_be_judged()
    {
        var (code, output, _) = Run("simulate", Example, "--replications", "1", "--warmup", "1d", "--duration", "7d", "--compare");

        Assert.Equal(0, code);
        Assert.Contains("\nno formula value could be judged: one replication gives no interval (use --replications 2 or more)\n", output, StringComparison.Ordinal);
        Assert.DoesNotContain("every formula value lies inside", output, StringComparison.Ordinal);
    }

    [Fact]
    public void The_same_seed_prints_the_same_document_whatever_the_thread_count()
    {
        string[] common = ["simulate", Example, "--format", "csv", "--replications", "4", "--warmup", "3d", "--duration", "14d", "--seed", "31"];

        var one = Run([.. common, "--threads", "1"]);
        var two = Run([.. common, "--threads", "2"]);

        Assert.Equal(0, one.ExitCode);
        Assert.Equal(one.Out, two.Out);
    }

    [Fact]
    public void A_bad_option_value_is_a_usage_error_with_one_line_and_no_output()
    {
        var (code, output, error) = Run("simulate", Example, "--duration", "soon");

        Assert.Equal(2, code);
        Assert.Empty(output);
        Assert.StartsWith("netsolve: --duration: 'soon' is not a positive duration", error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_bad_file_names_file_line_column_and_unit_and_exits_1()
    {
        string path = Path.Combine(Path.GetTempPath(), $"netsolve-simulate-{Guid.NewGuid():N}.yaml");
        File.WriteAllText(path, "units:\n  ward:\n    servers: 2\n    service: 2d\n    capacity: 1\narrivals:\n  ward: 1/d\n");
        try
        {
            var (code, output, error) = Run("simulate", path);

            Assert.Equal(1, code);
            Assert.Empty(output);
            Assert.Equal($"{path}:5:15: unit 'ward': capacity 1 is below servers 2; capacity counts patients in service and waiting\n", error);
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void Simulate_does_not_repeat_the_warnings_meant_for_the_formulas()
    {
        var (code, _, error) = Run("simulate", Example, "--replications", "2", "--warmup", "1d", "--duration", "7d");

        Assert.Equal(0, code);
        Assert.DoesNotContain("ignored by the formulas", error, StringComparison.Ordinal);
    }

    [Fact]
    public void With_an_arrival_profile_the_table_lists_24_hours_for_the_units_with_the_highest_peaks()
    {
        var (code, output, _) = Run("simulate", Example, "--replications", "2", "--warmup", "7d", "--duration", "28d", "--seed", "2");

        Assert.Equal(0, code);
        var lines = output.Split('\n');
        int title = Array.IndexOf(lines, "mean queue by hour of day (patients waiting; hour 00 is 00:00-01:00)");
        Assert.True(title > 0, output);
        string[] header = lines[title + 1].Split(' ', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal("hour", header[0]);

        // Source: the larkspur file: the ward's capacity equals its beds, so nobody waits there; the others have queues.
        Assert.DoesNotContain("ward", header, StringComparer.Ordinal);
        Assert.Equal(["00", "01", "02", "03", "04", "05", "06", "07", "08", "09", "10", "11", "12", "13", "14", "15", "16", "17", "18", "19", "20", "21", "22", "23", "peak"],
            lines[(title + 3)..(title + 28)].Select(line => line.Split(' ')[0]), StringComparer.Ordinal);
        Assert.Equal("1 other unit(s) not shown: their queues peak lower or stay at 0 (every unit is in --format json and csv)", lines[title + 28]);
    }

    [Fact]
    public void Without_an_arrival_profile_the_table_has_no_hourly_section_but_json_and_csv_carry_it()
    {
        string steady = TestFiles.Network("harbourside");
        string[] common = ["simulate", steady, "--replications", "2", "--warmup", "2d", "--duration", "7d"];

        var table = Run(common);
        var json = Run([.. common, "--format", "json"]);
        var csv = Run([.. common, "--format", "csv"]);

        Assert.Equal(0, table.ExitCode);
        Assert.DoesNotContain("mean queue by hour", table.Out, StringComparison.Ordinal);
        using var document = JsonDocument.Parse(json.Out);
        var unit = document.RootElement.GetProperty("units")[0];
        Assert.Equal(24, unit.GetProperty("mean_queue_by_hour").GetArrayLength());
        Assert.Equal(24, unit.GetProperty("mean_queue_by_hour_ci").GetArrayLength());
        string[] header = csv.Out.Split('\n')[0].Split(',');
        // The hours come last but for the three columns of how the run was made, which came later.
        Assert.Equal(Enumerable.Range(0, 24).Select(h => FormattableString.Invariant($"mean_queue_h{h:00}")), header[^27..^3], StringComparer.Ordinal);
        string[] firstRow = csv.Out.Split('\n')[1].Split(',');
        Assert.Equal(header.Length, firstRow.Length);
        Assert.Equal(unit.GetProperty("mean_queue_by_hour")[23].GetDouble(), double.Parse(firstRow[^4], System.Globalization.CultureInfo.InvariantCulture));
    }

    /// <summary>
    /// A short run of the larkspur file is short against its ward's relaxation time, which is worth a warning, and
    /// nothing else is but its consequence that the warm-up check (MSER-5) may see, depending on the draws: the
    /// number in the network still rising after the warm-up.
    /// </summary>
    private static void AssertOnlySlowUnitWarnings(string error) =>
        Assert.All(error.Split('\n', StringSplitOptions.RemoveEmptyEntries), line => Assert.True(
            line.StartsWith("netsolve: warning: unit '", StringComparison.Ordinal)
                || line.StartsWith("netsolve: warning: the number of patients in the network settled only after", StringComparison.Ordinal),
            line));

    /// <summary>One server at utilisation 0.9 with one-day service: Erlang C is exact for it, and it relaxes in about 380 days.</summary>
    private const string SlowSingleServer = "name: Slow single server  # invented\nunits:\n  ward:\n    servers: 1\n    service: 1d\narrivals:\n  ward: 0.9/d\n";

    [Fact]
    public void Slow_units_are_listed_slowest_first_at_most_twenty_and_the_rest_counted_in_one_line()
    {
        // 25 one-server wards at 0.9 with service of 1 to 25 days: each relaxes in about 380 days times its service
        // in days (Abate and Whitt, Queueing Systems 2, 1987, from memory), all long against a 1-day run.
        var text = new System.Text.StringBuilder("name: Many slow wards  # invented\nunits:\n");
        var arrivals = new System.Text.StringBuilder("arrivals:\n");
        for (int w = 1; w <= 25; w++)
        {
            text.Append(System.Globalization.CultureInfo.InvariantCulture, $"  ward{w}:\n    servers: 1\n    service: {w}d\n");
            arrivals.Append(System.Globalization.CultureInfo.InvariantCulture, $"  ward{w}: {0.9 / w:R}/d\n");
        }

        string path = Path.Combine(Path.GetTempPath(), $"netsolve-simulate-{Guid.NewGuid():N}.yaml");
        File.WriteAllText(path, text.Append(arrivals).ToString());
        try
        {
            var run = Run(["simulate", path, "--replications", "2", "--warmup", "0", "--duration", "1d", "--format", "csv"]);

            Assert.Equal(0, run.ExitCode);
            var lines = run.Error.Split('\n', StringSplitOptions.RemoveEmptyEntries);
            var listed = lines.Where(line => line.StartsWith("netsolve: warning: unit '", StringComparison.Ordinal)).ToList();
            Assert.Equal(global::NetSolve.Cli.WarningLog.ShownPerKind, listed.Count);
            Assert.StartsWith("netsolve: warning: unit 'ward25' relaxes", listed[0], StringComparison.Ordinal);
            Assert.Contains("netsolve: warning: 5 more units relax slowly", run.Error, StringComparison.Ordinal);
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void Compare_on_a_deliberately_short_run_of_an_exact_unit_blames_the_run_not_the_formula()
    {
        string path = Path.Combine(Path.GetTempPath(), $"netsolve-simulate-{Guid.NewGuid():N}.yaml");
        File.WriteAllText(path, SlowSingleServer);
        try
        {
            string[] common = ["simulate", path, "--replications", "10", "--warmup", "0", "--duration", "28d", "--compare"];
            var table = Run(common);
            var csv = Run([.. common, "--format", "csv"]);

            Assert.Equal(0, table.ExitCode);
            Assert.Contains("outside where the formula is exact: doubt the run", table.Out, StringComparison.Ordinal);
            Assert.DoesNotContain("outside where the method is an approximation", table.Out, StringComparison.Ordinal);

            // Exact by hand: Erlang C gives a mean wait of ρ/(μ − λ) = 9 days; four weeks from empty cannot reach it.
            var rows = CsvRows.Parse(csv.Out);
            var meanWait = rows.Single(row => row[1] == "mean_wait");
            Assert.Equal(("outside", "true", "run"), (meanWait[5], meanWait[9], meanWait[10]));
            Assert.Contains("netsolve: warning: unit 'ward' relaxes in about 379.7 d", table.Error, StringComparison.Ordinal);
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void Without_run_lengths_the_warm_up_and_run_come_from_the_relaxation_time_and_every_output_says_so()
    {
        string path = Path.Combine(Path.GetTempPath(), $"netsolve-simulate-{Guid.NewGuid():N}.yaml");
        File.WriteAllText(path, SlowSingleServer);
        try
        {
            var json = Run("simulate", path, "--replications", "2", "--format", "json");
            var table = Run("simulate", path, "--replications", "2");
            var csv = Run("simulate", path, "--replications", "2", "--format", "csv");

            Assert.Equal(0, json.ExitCode);
            using var document = JsonDocument.Parse(json.Out);
            var run = document.RootElement.GetProperty("simulation");

            // Exact by hand: 5 relaxation times of 9,113.7 h in whole weeks is 45,696 h; 20 exceed the bound of 3,640 d.
            Assert.Equal(45_696.0, run.GetProperty("warmup").GetDouble());
            Assert.Equal(87_360.0, run.GetProperty("duration").GetDouble());
            Assert.Equal("relaxation_time", run.GetProperty("warmup_from").GetString());
            Assert.Equal(JsonValueKind.Null, run.GetProperty("precision_reached").ValueKind);
            Assert.Contains("of 3,640 d (from relaxation time) each after a warm-up of 1,904 d (from relaxation time)", table.Out, StringComparison.Ordinal);
            var rows = CsvRows.Parse(csv.Out);
            Assert.Equal(["warmup", "duration", "precision_reached"], rows[0][^3..]);
            Assert.Equal(["45696", "87360", ""], rows[1][^3..]);
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void Precision_stops_when_reached_and_says_so_and_says_when_the_bound_on_effort_came_first()
    {
        string path = Path.Combine(Path.GetTempPath(), $"netsolve-simulate-{Guid.NewGuid():N}.yaml");
        File.WriteAllText(path, "name: Quick clinic  # invented\nunits:\n  clinic:\n    servers: 1\n    service: 1h\narrivals:\n  clinic: 0.5/h\n");
        try
        {
            string[] common = ["simulate", path, "--warmup", "1d", "--duration", "28d", "--format", "json"];
            var reached = Run([.. common, "--precision", "5%"]);
            var bounded = Run([.. common, "--precision", "0.01", "--max-replications", "12"]);

            using var first = JsonDocument.Parse(reached.Out);
            using var second = JsonDocument.Parse(bounded.Out);
            Assert.True(first.RootElement.GetProperty("simulation").GetProperty("precision_reached").GetBoolean());
            Assert.Equal(0.05, first.RootElement.GetProperty("simulation").GetProperty("precision").GetDouble());
            Assert.False(second.RootElement.GetProperty("simulation").GetProperty("precision_reached").GetBoolean());
            Assert.Equal(12, second.RootElement.GetProperty("simulation").GetProperty("replications_finished").GetInt32());
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Theory]
    [InlineData("0%")]
    [InlineData("100%")]
    [InlineData("soon")]
    [InlineData("1.5")]
    public void A_precision_that_is_not_a_share_between_0_and_100_percent_is_a_usage_error(string text)
    {
        var (code, output, error) = Run("simulate", Example, "--precision", text);

        Assert.Equal(2, code);
        Assert.Empty(output);
        Assert.StartsWith($"netsolve: --precision: '{text}' is not a share above 0% and below 100%", error, StringComparison.Ordinal);
    }
}
