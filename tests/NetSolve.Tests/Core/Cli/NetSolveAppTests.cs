using System.Globalization;
using System.Text.Json;
using NetSolve.Tests.Support;
using static NetSolve.Tests.Support.CliRun;
using static NetSolve.Tests.Support.TestFiles;

namespace NetSolve.Tests.Core.Cli;

[Collection(CultureSensitiveCollection.Name)]
public partial class NetSolveAppTests
{
    private static readonly string Harbourside = Network("harbourside");

    private static void AssertNoStackTrace(string stderr)
    {
        Assert.DoesNotContain("Exception", stderr, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", stderr, StringComparison.Ordinal);
    }

    // Source: the network file contract, exit codes: 0 solved, 1 invalid input, 2 wrong usage.
    [Fact]
    public void Solving_a_valid_network_exits_0_with_the_table_on_stdout()
    {
        var (exitCode, output, error) = Run("solve", Harbourside);

        Assert.Equal(0, exitCode);
        Assert.Contains("emergency", output, StringComparison.Ordinal);
        // The formulas use every key of the file, so nothing is reported as ignored; the one line is the return-loop
        // warning (emergency -> lab -> emergency), which goes to stderr and leaves the table alone.
        Assert.DoesNotContain("ignored", error, StringComparison.Ordinal);
        string warning = Assert.Single(error.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.Contains("warning: unit 'emergency': patients come back to this unit", warning, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("check")]
    [InlineData("solve")]
    public void An_invalid_file_exits_1_with_one_located_line_per_problem_on_stderr(string command)
    {
        string path = TestData("Invalid", "missing-units.yaml");
        var (exitCode, output, error) = Run(command, path);

        Assert.Equal(1, exitCode);
        Assert.Equal(string.Empty, output);
        Assert.Equal(
            [$"{path}:1:1: missing 'units': a network file defines at least one unit", $"{path}:3:3: arrivals: unknown unit 'clinic'"],
            error.Split('\n', StringSplitOptions.RemoveEmptyEntries));
    }

    [Theory]
    [InlineData("Invalid", "unclosed-bracket.yaml")]
    [InlineData("Invalid", "empty-file.yaml")]
    [InlineData("Invalid", "top-level-list.yaml")]
    [InlineData("Invalid", "no-such-file.yaml")]
    [InlineData("", "")]
    public void Unreadable_input_exits_1_with_one_line_and_no_stack_trace(string folder, string file)
    {
        string path = folder.Length == 0 ? TestDataFolder("Invalid") : TestData(folder, file);
        var (exitCode, output, error) = Run("solve", path);

        Assert.Equal(1, exitCode);
        Assert.Equal(string.Empty, output);
        Assert.Single(error.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.StartsWith(path, error, StringComparison.Ordinal);
        AssertNoStackTrace(error);
    }

    [Theory]
    [InlineData("frobnicate")]
    [InlineData("solve", "--colour")]
    [InlineData("solve", "--format", "xml")]
    [InlineData("solve", "--strain", "1.5")]
    [InlineData("solve", "--strain", "high")]
    [InlineData("solve")]
    public void Wrong_usage_exits_2_without_a_stack_trace(params string[] args)
    {
        string[] withFile = args.Length > 1 || args[0] != "solve" ? [.. args, Harbourside] : args;
        var (exitCode, output, error) = Run(withFile);

        Assert.Equal(2, exitCode);
        Assert.Equal(string.Empty, output);
        Assert.NotEqual(string.Empty, error, StringComparer.Ordinal);
        AssertNoStackTrace(error);
    }

    [Theory]
    [InlineData("--strain", "1.5", "'1.5'")]
    [InlineData("--strain", "high", "'high'")]
    [InlineData("--format", "xml", "xml")]
    public void A_bad_option_value_is_named_on_stderr(string option, string value, string named)
    {
        var (exitCode, _, error) = Run("solve", Harbourside, option, value);

        Assert.Equal(2, exitCode);
        Assert.Contains(named, error, StringComparison.Ordinal);
    }

    // Exact by hand: --strain 0.7 flags imaging (72.7%) as strained; the number is read the same under de-DE.
    [Fact]
    public void The_strain_option_is_read_in_invariant_culture()
    {
        var culture = CultureInfo.CurrentCulture;
        try
        {
            CultureInfo.CurrentCulture = new CultureInfo("de-DE");
            var (exitCode, output, error) = Run("solve", Harbourside, "--strain", "0.7", "--format", "csv");

            Assert.True(exitCode == 0, error);
            Assert.Contains(",strained,", output.Split('\n')[2], StringComparison.Ordinal);
        }
        finally
        {
            CultureInfo.CurrentCulture = culture;
        }
    }

    [Theory]
    [InlineData]
    [InlineData("check")]
    [InlineData("solve")]
    public void Help_works_on_every_command(params string[] command)
    {
        var (exitCode, output, error) = Run([.. command, "--help"]);

        Assert.Equal(0, exitCode);
        Assert.Contains("Usage:", output, StringComparison.Ordinal);
        Assert.Equal(string.Empty, error);
    }

    [Fact]
    public void Check_reports_a_valid_file_and_its_warnings_and_exits_0()
    {
        string path = TestData("Warnings", "unreached-unit.yaml");
        var (exitCode, output, error) = Run("check", path);

        Assert.Equal(0, exitCode);
        Assert.Equal($"{path}: valid: 4 units, 1 arrival stream, 2 routes\n", output);
        Assert.Equal(3, error.Split('\n', StringSplitOptions.RemoveEmptyEntries).Length);
        Assert.Contains($"{path}:5:3: warning: unit 'archive': no patient reaches this unit", error, StringComparison.Ordinal);
    }

    // Exact by hand (Cosmetatos' ratio, docs/methods.md): M/M/2 with λ = 3/h and 30 min service has a = 1.5,
    // B(2, 1.5) = 1.125/3.625, C = B/(1 − 0.75(1 − B)) = 9/14 and Wq = C/(2·2 − 3) = 9/14 h; with service_cv 0.5
    // and Poisson arrivals the wait is scaled by R = 0.25 + 0.75·R_D, R_D = ½(1 + 0.25(√14 − 2)/24) at ρ = 0.75.
    // No warning: the formulas use it.
    [Fact]
    public void A_service_cv_other_than_one_is_used_by_the_formulas_without_a_warning()
    {
        string path = Path.Combine(Path.GetTempPath(), FormattableString.Invariant($"netsolve-cv-{Environment.ProcessId}.yaml"));
        File.WriteAllText(path, "units:\n  clinic:\n    servers: 2\n    service: 30min\n    service_cv: 0.5\narrivals:\n  clinic: 3/h\n");
        try
        {
            var (exitCode, output, error) = Run("solve", path, "--format", "json");

            Assert.Equal(0, exitCode);
            Assert.Equal(string.Empty, error);
            var clinic = JsonDocument.Parse(output).RootElement.GetProperty("units")[0];
            double ratio = 0.25 + (0.75 * 0.5 * (1.0 + (0.25 * (Math.Sqrt(14.0) - 2.0) / 24.0)));
            Assert.Equal(9.0 / 14.0 * ratio, clinic.GetProperty("mean_wait").GetDouble(), 1e-12);
            Assert.Equal(0.25, clinic.GetProperty("service_scv").GetDouble(), 1e-12);
            Assert.Equal("Cosmetatos (G/G/c)", clinic.GetProperty("method").GetString());
        }
        finally
        {
            File.Delete(path);
        }
    }

    // Source: the network file contract, "JSON output": exactly these fields, units in file order.
    [Fact]
    public void Json_output_is_one_document_with_exactly_the_contract_fields()
    {
        // The contract's example numbers are the Jackson network's: imaging's service_cv 0.6 is left out here.
        string path = Path.Combine(Path.GetTempPath(), FormattableString.Invariant($"netsolve-jackson-{Environment.ProcessId}.yaml"));
        File.WriteAllLines(path, File.ReadAllLines(Harbourside).Where(line => !line.TrimStart().StartsWith("service_cv:", StringComparison.Ordinal)));
        var (exitCode, output, _) = Run("solve", path, "--format", "json");
        File.Delete(path);

        Assert.Equal(0, exitCode);
        using var json = JsonDocument.Parse(output);
        var root = json.RootElement;
        Assert.Equal(["network", "time_unit", "stable", "units", "totals"], root.EnumerateObject().Select(p => p.Name).ToArray());
        Assert.Equal(["external_arrival_rate", "throughput", "mean_in_system", "mean_time_in_system", "turned_away_rate", "diverted_rate"],
            root.GetProperty("totals").EnumerateObject().Select(p => p.Name).ToArray());
        Assert.Equal(["emergency", "imaging", "lab", "ward", "discharge_lounge"],
            root.GetProperty("units").EnumerateArray().Select(u => u.GetProperty("id").GetString()!).ToArray());
        foreach (var unit in root.GetProperty("units").EnumerateArray())
        {
            Assert.Equal(
                ["id", "label", "servers", "arrival_rate", "visits_per_patient", "offered_load", "utilisation", "p_wait", "mean_queue",
                    "mean_wait", "mean_in_unit", "mean_time_in_unit", "headroom", "status", "method", "arrival_scv", "service_scv",
                    "p_full", "turned_away_rate", "diverted_rate"],
                unit.EnumerateObject().Select(p => p.Name).ToArray());
        }

        // Source: the network file contract's example output.
        var emergency = root.GetProperty("units")[0];
        Assert.Equal("Harbourside Community Hospital, acute pathway", root.GetProperty("network").GetString());
        Assert.Equal("hour", root.GetProperty("time_unit").GetString());
        Assert.Equal(18.699187, emergency.GetProperty("arrival_rate").GetDouble(), 5e-7);
        Assert.Equal(0.003167, emergency.GetProperty("mean_wait").GetDouble(), 5e-7);
        Assert.Equal(12.25, root.GetProperty("totals").GetProperty("external_arrival_rate").GetDouble(), 1e-12);
        Assert.Equal(296.753604, root.GetProperty("totals").GetProperty("mean_in_system").GetDouble(), 5e-7);
        Assert.Equal(24.224784, root.GetProperty("totals").GetProperty("mean_time_in_system").GetDouble(), 5e-7);
        var lounge = root.GetProperty("units")[4];
        Assert.Equal(JsonValueKind.Null, lounge.GetProperty("servers").ValueKind);
        Assert.Equal(JsonValueKind.Null, lounge.GetProperty("headroom").ValueKind);
        Assert.Equal("bottleneck", root.GetProperty("units")[3].GetProperty("status").GetString());
    }

    // Exact by hand: M/M/1 with lambda = 3/h and service 15 min: W = 1/(4 - 3) h = 60 min, Wq = 45 min,
    // rates per minute 0.05. Times and rates are reported in the file's time unit.
    [Fact]
    public void Json_reports_times_and_rates_in_the_files_time_unit()
    {
        string path = Path.Combine(Path.GetTempPath(), FormattableString.Invariant($"netsolve-minutes-{Environment.ProcessId}.yaml"));
        File.WriteAllText(path, "time_unit: minute\nunits:\n  desk:\n    servers: 1\n    service: 15\narrivals:\n  desk: 3/h\n");
        try
        {
            var (exitCode, output, _) = Run("solve", path, "--format", "json");

            Assert.Equal(0, exitCode);
            using var json = JsonDocument.Parse(output);
            var desk = json.RootElement.GetProperty("units")[0];
            Assert.Equal("minute", json.RootElement.GetProperty("time_unit").GetString());
            Assert.Equal(0.05, desk.GetProperty("arrival_rate").GetDouble(), 1e-12);
            Assert.Equal(60.0, desk.GetProperty("mean_time_in_unit").GetDouble(), 1e-9);
            Assert.Equal(45.0, desk.GetProperty("mean_wait").GetDouble(), 1e-9);
            Assert.Equal(0.05, json.RootElement.GetProperty("totals").GetProperty("throughput").GetDouble(), 1e-12);
            Assert.Equal(60.0, json.RootElement.GetProperty("totals").GetProperty("mean_time_in_system").GetDouble(), 1e-9);
        }
        finally
        {
            File.Delete(path);
        }
    }

    // Source: the network file contract: an unstable unit is a result (exit 0), p_wait 1, its waits null, totals null.
    [Fact]
    public void An_unstable_network_exits_0_and_says_so_in_json_without_NaN()
    {
        string path = Path.Combine(Path.GetTempPath(), FormattableString.Invariant($"netsolve-unstable-{Environment.ProcessId}.yaml"));
        File.WriteAllText(path, "units:\n  clinic:\n    servers: 2\n    service: 1h\narrivals:\n  clinic: 3/h\n");
        try
        {
            var (exitCode, output, _) = Run("solve", path, "--format", "json");

            Assert.Equal(0, exitCode);
            Assert.DoesNotContain("NaN", output, StringComparison.Ordinal);
            Assert.DoesNotContain("Infinity", output, StringComparison.Ordinal);
            using var json = JsonDocument.Parse(output);
            var clinic = json.RootElement.GetProperty("units")[0];
            Assert.False(json.RootElement.GetProperty("stable").GetBoolean());
            Assert.Equal("unstable", clinic.GetProperty("status").GetString());
            Assert.Equal(1.0, clinic.GetProperty("p_wait").GetDouble());
            Assert.Equal(JsonValueKind.Null, clinic.GetProperty("mean_wait").ValueKind);
            Assert.Equal(JsonValueKind.Null, json.RootElement.GetProperty("totals").GetProperty("throughput").ValueKind);
            Assert.Equal(JsonValueKind.Null, json.RootElement.GetProperty("totals").GetProperty("mean_in_system").ValueKind);
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void Csv_output_has_the_contract_header_and_one_row_per_unit()
    {
        var (exitCode, output, _) = Run("solve", Harbourside, "--format", "csv");
        var lines = output.Split('\n', StringSplitOptions.RemoveEmptyEntries);

        Assert.Equal(0, exitCode);
        Assert.Equal("id,label,servers,arrival_rate,visits_per_patient,offered_load,utilisation,p_wait,mean_queue,mean_wait,mean_in_unit,mean_time_in_unit,headroom,status,method,arrival_scv,service_scv,p_full,turned_away_rate,diverted_rate", lines[0]);
        Assert.Equal(6, lines.Length);
        Assert.StartsWith("imaging,Imaging (CT and X-ray),3,", lines[2], StringComparison.Ordinal);
        Assert.StartsWith("discharge_lounge,discharge_lounge,unlimited,", lines[5], StringComparison.Ordinal);
        Assert.Contains(",bottleneck,", lines[4], StringComparison.Ordinal);
    }

    // Common practice: golden output, reviewed by eye; NETSOLVE_APPROVE=1 rewrites it for review in the diff.
    [Fact]
    public void The_harbourside_table_matches_the_golden_file()
    {
        var (exitCode, output, _) = Run("solve", Harbourside);

        Assert.Equal(0, exitCode);
        AssertGolden("harbourside.table.expected.txt", output);
    }

    [Fact]
    public void The_harbourside_table_is_the_same_under_a_German_culture()
    {
        var culture = CultureInfo.CurrentCulture;
        var uiCulture = CultureInfo.CurrentUICulture;
        try
        {
            CultureInfo.CurrentCulture = new CultureInfo("de-DE");
            CultureInfo.CurrentUICulture = new CultureInfo("de-DE");
            var (exitCode, output, _) = Run("solve", Harbourside);
            var (_, csv, _) = Run("solve", Harbourside, "--format", "csv");

            Assert.Equal(0, exitCode);
            AssertGolden("harbourside.table.expected.txt", output);
            // Source: the network file contract: emergency arrival_rate 18.699187, written with a decimal point.
            Assert.Contains(",18.699", csv, StringComparison.Ordinal);
            Assert.DoesNotContain("18,699", csv, StringComparison.Ordinal);
        }
        finally
        {
            CultureInfo.CurrentCulture = culture;
            CultureInfo.CurrentUICulture = uiCulture;
        }
    }

    private static void AssertGolden(string name, string actual) =>
        Approval.Verify(Path.Combine(SourceTree.Root, "tests", "NetSolve.Tests", "Core", "Cli", name), actual);
}
