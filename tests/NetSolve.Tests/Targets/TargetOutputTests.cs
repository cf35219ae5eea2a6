using System.Text.Json;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Targets;

public sealed class TargetOutputTests
{
    private static readonly string Ashcombe = TestFiles.Network("ashcombe-targets");

    [Fact]
    public void The_table_marks_critical_care_whose_status_is_ok_but_whose_wait_misses_its_target()
    {
        var (code, output, _) = CliRun.Run("solve", Ashcombe);

        Assert.Equal(0, code);
        string row = output.Split('\n').Single(line => line.StartsWith("critical_care", StringComparison.Ordinal));
        Assert.Contains("ok", row, StringComparison.Ordinal);
        Assert.Contains("x mean_wait", row, StringComparison.Ordinal);
        Assert.Contains("targets missed: emergency (mean_wait), critical_care (mean_wait), assessment_ward (turned_away)", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Json_lists_the_breached_targets_of_each_unit_as_an_array()
    {
        var (code, output, _) = CliRun.Run("solve", Ashcombe, "--format", "json");

        Assert.Equal(0, code);
        var units = JsonDocument.Parse(output).RootElement.GetProperty("units");
        string[] Breached(int i) => [.. units[i].GetProperty("targets_breached").EnumerateArray().Select(e => e.GetString()!)];
        Assert.Equal(["mean_wait"], Breached(0));
        Assert.Empty(Breached(1));
        Assert.Equal(["mean_wait"], Breached(2));
        Assert.Equal(["turned_away"], Breached(3));
    }

    [Fact]
    public void Csv_names_the_breached_target_in_its_own_column()
    {
        var (_, output, _) = CliRun.Run("solve", Ashcombe, "--format", "csv");
        var lines = output.Split('\n');
        int column = Array.IndexOf(lines[0].Split(','), "targets_breached");

        Assert.True(column > 0);
        Assert.Equal("met", lines[2].Split(',')[column]);
    }

    [Fact]
    public void Without_targets_the_outputs_keep_their_columns()
    {
        var (_, json, _) = CliRun.Run("solve", TestFiles.Network("kestrel-general"), "--format", "json");
        var (_, table, _) = CliRun.Run("solve", TestFiles.Network("kestrel-general"));

        Assert.DoesNotContain("targets", json, StringComparison.Ordinal);
        Assert.DoesNotContain("targets", table, StringComparison.Ordinal);
    }

    [Fact]
    public void A_command_line_target_marks_a_unit_of_a_network_without_targets()
    {
        // Source: the kestrel-general table in README.md: critical_care waits 1.978 h on average.
        var (code, output, _) = CliRun.Run("solve", TestFiles.Network("kestrel-general"), "--target", "critical_care: mean_wait <= 1h");

        Assert.Equal(0, code);
        Assert.Contains("targets missed: critical_care (mean_wait)", output, StringComparison.Ordinal);
    }

    [Fact]
    public void A_command_line_target_can_relax_the_files()
    {
        var (_, output, _) = CliRun.Run("solve", Ashcombe, "--target", "critical_care: mean_wait <= 1d");

        Assert.DoesNotContain("critical_care (mean_wait)", output, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("emergency: mean_wiat <= 1h", "did you mean 'mean_wait'?")]
    [InlineData("emergency: mean_wait <= soon", "'soon', which is not a duration")]
    [InlineData("wait_over <= 5%", "needs the wait after wait_over")]
    [InlineData("turned_away <= 150%", "'150%', which is not a share")]
    [InlineData("emergency mean_wait 1h", "is not UNIT: KEY <= VALUE")]
    public void A_malformed_target_is_a_usage_error_naming_the_option(string target, string expected)
    {
        var (code, _, error) = CliRun.Run("solve", Ashcombe, "--target", target);

        Assert.Equal(2, code);
        Assert.StartsWith("netsolve: --target: ", error, StringComparison.Ordinal);
        Assert.Contains(expected, error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_target_for_an_unknown_unit_is_invalid_input_with_a_suggestion()
    {
        var (code, _, error) = CliRun.Run("solve", Ashcombe, "--target", "imagng: mean_wait <= 1h");

        Assert.Equal(1, code);
        Assert.Contains("unknown unit 'imagng'; did you mean 'imaging'?", error, StringComparison.Ordinal);
    }

    [Fact]
    public void The_map_marks_the_box_of_a_unit_that_misses_a_target_and_explains_the_mark_in_the_legend()
    {
        string folder = Directory.CreateTempSubdirectory("netsolve-targets-").FullName;
        string svg = Path.Combine(folder, "map.svg");
        var (code, _, _) = CliRun.Run("map", Ashcombe, "-o", svg);
        string text = File.ReadAllText(svg);

        Assert.Equal(0, code);
        Assert.Contains("data-unit=\"critical_care\" data-status=\"ok\" data-targets-missed=\"mean_wait\"", text.Replace("\n", " ", StringComparison.Ordinal), StringComparison.Ordinal);
        Assert.Contains("x missed: mean_wait", text, StringComparison.Ordinal);
        Assert.Contains("x missed: a unit target not met", text, StringComparison.Ordinal);
        Assert.DoesNotContain("data-unit=\"imaging\" data-status=\"ok\" data-targets-missed", text, StringComparison.Ordinal);
    }

    [Fact]
    public void The_reports_finding_names_the_units_that_miss_their_targets()
    {
        string folder = Directory.CreateTempSubdirectory("netsolve-targets-").FullName;
        string html = Path.Combine(folder, "report.html");
        var (code, _, _) = CliRun.Run("report", Ashcombe, "-o", html);
        string text = File.ReadAllText(html);

        Assert.Equal(0, code);
        Assert.Contains("Emergency department (mean_wait), Critical care (mean_wait) and Assessment ward (turned_away) miss their targets.", text, StringComparison.Ordinal);
        Assert.Contains(">Targets</th>", text, StringComparison.Ordinal);
    }
}
