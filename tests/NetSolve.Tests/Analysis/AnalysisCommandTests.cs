using System.Text.Json;
using NetSolve.Presentation;
using NetSolve.Presentation.Growth;
using NetSolve.Tests.Support;
using static NetSolve.Tests.Support.CliRun;
using static NetSolve.Tests.Support.TestFiles;

namespace NetSolve.Tests.Analysis;

[Collection(CultureSensitiveCollection.Name)]
public sealed class AnalysisCommandTests
{
    [Fact]
    public void Comparing_a_file_with_itself_reports_no_status_change_and_an_unchanged_bottleneck()
    {
        var (code, output, _) = Run("compare", Network("harbourside"), Network("harbourside"));
        Assert.Equal(0, code);
        Assert.Contains("status changes: none", output, StringComparison.Ordinal);
        Assert.Contains("bottleneck: ward (unchanged)", output, StringComparison.Ordinal);
        Assert.Contains(Caution.Text, output, StringComparison.Ordinal);
    }

    [Fact]
    public void Compare_json_gives_zero_change_for_every_unit_against_itself()
    {
        var (code, output, _) = Run("compare", Network("kestrel-general"), Network("kestrel-general"), "--format", "json");
        Assert.Equal(0, code);
        using var document = JsonDocument.Parse(output);
        foreach (var unit in document.RootElement.GetProperty("scenarios")[0].GetProperty("units").EnumerateArray())
        {
            Assert.Equal(0.0, unit.GetProperty("utilisation").GetProperty("change").GetDouble());
            Assert.False(unit.GetProperty("status_changed").GetBoolean());
        }
    }

    [Fact]
    public void Growth_json_states_the_time_unit_and_twenty_steps()
    {
        var (code, output, _) = Run("growth", Network("millbrook-clinic"), "--format", "json");
        Assert.Equal(0, code);
        using var document = JsonDocument.Parse(output);
        Assert.Equal("minute", document.RootElement.GetProperty("time_unit").GetString());
        Assert.Equal(20, document.RootElement.GetProperty("steps").GetArrayLength());
        // Exact by hand: clinician load is 9/h · 1.25 visits · 12 min = 2.25 erlangs on 3: headroom 4/3.
        Assert.Equal(4.0 / 3.0, document.RootElement.GetProperty("first_unstable").GetProperty("factor").GetDouble(), 1e-12);
    }

    [Fact]
    public void Growth_csv_has_one_row_per_factor_and_unit()
    {
        var (code, output, _) = Run("growth", Network("millbrook-clinic"), "--format", "csv", "--steps", "4");
        Assert.Equal(0, code);
        var lines = output.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(GrowthOutput.CsvHeader, lines[0]);
        Assert.Equal(1 + (4 * 3), lines.Length);
    }

    [Fact]
    public void Growth_table_carries_the_caution_and_each_wait_with_its_unit()
    {
        var (code, output, _) = Run("growth", Network("harbourside"), "--stream", "emergency");
        Assert.Equal(0, code);
        Assert.Contains("rates per hour", output, StringComparison.Ordinal);
        Assert.Contains("Mean wait by growth factor", output, StringComparison.Ordinal);
        Assert.Contains(" min\n", output, StringComparison.Ordinal); // each wait carries its own unit now, not the header
        Assert.Contains(Caution.Text, output, StringComparison.Ordinal);
    }

    [Fact]
    public void An_unknown_stream_is_one_line_with_a_suggestion_and_exit_1()
    {
        var (code, output, error) = Run("growth", Network("harbourside"), "--stream", "emergancy");
        Assert.Equal(1, code);
        Assert.Empty(output);
        Assert.EndsWith("netsolve: --stream emergancy: unknown unit 'emergancy'; did you mean 'emergency'?\n", error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_bad_override_on_solve_is_one_line_and_exit_1_with_nothing_on_stdout()
    {
        var (code, output, error) = Run("solve", Network("millbrook-clinic"), "--set", "servers.xrya=2");
        Assert.Equal(1, code);
        Assert.Empty(output);
        Assert.Equal("--set servers.xrya=2: unknown unit 'xrya'; did you mean 'xray'?\n", error);
    }

    [Fact]
    public void Solve_with_an_override_shows_the_changed_servers()
    {
        var (code, output, _) = Run("solve", Network("millbrook-clinic"), "--set", "servers.clinician=4", "--format", "json");
        Assert.Equal(0, code);
        using var document = JsonDocument.Parse(output);
        Assert.Equal(4, document.RootElement.GetProperty("units")[1].GetProperty("servers").GetInt32());
    }

    [Fact]
    public void Staff_meets_a_utilisation_target_and_prints_the_caution()
    {
        var (code, output, _) = Run("staff", Network("millbrook-clinic"), "--max-util", "0.7", "--format", "json");
        Assert.Equal(0, code);
        using var document = JsonDocument.Parse(output);
        // Exact by hand: clinician a = 2.25 → ⌈2.25/0.7⌉ = 4 (+1); reception a = 0.45, x-ray a = 0.375: no change.
        Assert.Equal(1, document.RootElement.GetProperty("total_added").GetInt32());
        var (_, table, _) = Run("staff", Network("millbrook-clinic"), "--max-util", "0.7");
        Assert.Contains(Caution.Text, table, StringComparison.Ordinal);
    }

    [Fact]
    public void Staff_with_an_impossible_target_names_each_unit_and_why()
    {
        var (code, output, error) = Run("staff", Network("millbrook-clinic"), "--max-time", "5min");
        Assert.Equal(1, code);
        Assert.Empty(output);
        Assert.Equal(
            "netsolve: staff: unit 'clinician' cannot meet the targets: the mean service time alone is 12 min, so a mean time in unit of 5 min cannot be met by adding servers; shorten the service instead\n"
            + "netsolve: staff: unit 'xray' cannot meet the targets: the mean service time alone is 10 min, so a mean time in unit of 5 min cannot be met by adding servers; shorten the service instead\n",
            error);
    }

    [Fact]
    public void Staff_with_a_zero_utilisation_target_names_the_busy_units()
    {
        var (code, _, error) = Run("staff", Network("millbrook-clinic"), "--max-util", "0");
        Assert.Equal(1, code);
        Assert.Equal(3, error.Split('\n', StringSplitOptions.RemoveEmptyEntries).Length);
        Assert.Contains("netsolve: staff: unit 'reception' cannot meet the targets: a maximum utilisation of 0 cannot be met while patients arrive\n", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Staff_budget_places_every_server()
    {
        var (code, output, _) = Run("staff", Network("harbourside"), "--budget", "5", "--format", "json");
        Assert.Equal(0, code);
        using var document = JsonDocument.Parse(output);
        Assert.Equal(5, document.RootElement.GetProperty("placed").GetInt32());
    }

    [Fact]
    public void Pathway_reports_the_chance_of_reaching_the_ward()
    {
        var (code, output, _) = Run("pathway", Network("harbourside"), "--from", "emergency", "--to", "ward", "--format", "json");
        Assert.Equal(0, code);
        using var document = JsonDocument.Parse(output);
        var ward = document.RootElement.GetProperty("from").GetProperty("units").EnumerateArray().Single(u => u.GetProperty("id").GetString() == "ward");
        Assert.Equal(0.155 / 0.615, ward.GetProperty("visit_probability").GetDouble(), 1e-12); // see PathwayAnalysisTests
    }

    [Fact]
    public void Compare_without_scenarios_or_overrides_is_a_usage_error()
    {
        var (code, _, error) = Run("compare", Network("harbourside"));
        Assert.Equal(2, code);
        Assert.Equal("netsolve: compare: give at least one SCENARIO file, or --set changes, to compare with the base\nRun 'netsolve --help' for usage.\n", error);
    }

    [Fact]
    public void Growth_output_ignores_the_current_culture()
    {
        var culture = System.Globalization.CultureInfo.CurrentCulture;
        try
        {
            var (_, invariant, _) = Run("growth", Network("harbourside"), "--format", "csv", "--steps", "3");
            System.Globalization.CultureInfo.CurrentCulture = new System.Globalization.CultureInfo("de-DE");
            var (_, german, _) = Run("growth", Network("harbourside"), "--format", "csv", "--steps", "3");
            var (_, table, _) = Run("growth", Network("harbourside"));
            Assert.Equal(invariant, german);
            Assert.Contains("x1.000", table, StringComparison.Ordinal);
        }
        finally
        {
            System.Globalization.CultureInfo.CurrentCulture = culture;
        }
    }
}
