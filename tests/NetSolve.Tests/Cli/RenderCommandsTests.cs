using System.Xml.Linq;
using NetSolve.Tests.Rendering;
using static NetSolve.Tests.Support.CliRun;
using static NetSolve.Tests.Support.TestFiles;

namespace NetSolve.Tests.Cli;

public sealed class RenderCommandsTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "netsolve-render-" + Guid.NewGuid().ToString("N"));

    public RenderCommandsTests() => Directory.CreateDirectory(_folder);

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    [Theory]
    [InlineData("map.svg")]
    [InlineData("map.png")]
    [InlineData("map.dot")]
    public void Map_writes_the_format_its_file_name_asks_for_and_leaves_no_temporary_file(string name)
    {
        string target = Path.Combine(_folder, name);
        var (code, output, error) = Run("map", Network("kestrel-general"), "-o", target);

        Assert.Equal(0, code);
        Assert.Equal(string.Empty, error);
        Assert.Equal($"map of 9 units written to {target}\n", output);
        byte[] bytes = File.ReadAllBytes(target);
        switch (Path.GetExtension(name))
        {
            case ".svg":
                Assert.Equal("svg", XDocument.Parse(System.Text.Encoding.UTF8.GetString(bytes)).Root!.Name.LocalName);
                break;
            case ".png":
                // Source: PNG specification, section 5.2: the eight-byte signature.
                Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A }, bytes[..8]);
                break;
            default:
                Assert.StartsWith("digraph ", System.Text.Encoding.UTF8.GetString(bytes), StringComparison.Ordinal);
                break;
        }

        Assert.Equal([target], Directory.GetFiles(_folder));
    }

    [Fact]
    public void Report_compares_extra_network_files_with_the_first()
    {
        string target = Path.Combine(_folder, "report.html");
        var (code, output, _) = Run("report", Network("harbourside"), Network("kestrel-general"), "-o", target);

        Assert.Equal(0, code);
        Assert.Equal($"report written to {target}\n", output);
        string html = File.ReadAllText(target);
        Assert.Contains("id=\"scenarios\"", html, StringComparison.Ordinal);
        Assert.Contains("<td>kestrel-general</td>", html, StringComparison.Ordinal);
    }

    [Fact]
    public void Report_takes_scenario_files_and_names_them_as_the_scenario_does()
    {
        string target = Path.Combine(_folder, "report.html");
        string scenario = Scenario("harbourside-winter-beds");
        var (code, _, _) = Run("report", Network("harbourside"), scenario, "-o", target);

        Assert.Equal(0, code);
        string html = File.ReadAllText(target);
        int section = html.IndexOf("id=\"scenario-table\"", StringComparison.Ordinal);
        Assert.True(section > 0);
        Assert.Equal(2, System.Text.RegularExpressions.Regex.Count(html[section..html.IndexOf("</table>", section, StringComparison.Ordinal)], "<tr><td>"));
    }

    [Fact]
    public void A_missing_network_file_is_one_line_on_stderr_exit_1_and_no_file_written()
    {
        string target = Path.Combine(_folder, "report.html");
        string missing = Path.Combine(_folder, "nowhere.yaml");
        var (code, output, error) = Run("report", missing, "-o", target);

        Assert.Equal(1, code);
        Assert.Equal(string.Empty, output);
        Assert.Single(error.TrimEnd('\n').Split('\n'));
        Assert.Contains(missing, error, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", error, StringComparison.Ordinal);
        Assert.Empty(Directory.GetFiles(_folder));
    }

    [Fact]
    public void A_bad_scenario_file_stops_the_report_before_anything_is_written()
    {
        string target = Path.Combine(_folder, "report.html");
        string bad = Path.Combine(_folder, "bad.yaml");
        File.WriteAllText(bad, "units:\n  ward:\n    servers: 0\n    service: 3d\narrivals:\n  ward: 1/d\n");
        var (code, _, error) = Run("report", Network("kestrel-general"), bad, "-o", target);

        Assert.Equal(1, code);
        Assert.Single(error.TrimEnd('\n').Split('\n'));
        Assert.StartsWith(bad + ":3:", error, StringComparison.Ordinal);
        Assert.False(File.Exists(target));
    }

    [Fact]
    public void An_output_folder_that_does_not_exist_is_one_line_and_exit_1()
    {
        string target = Path.Combine(_folder, "no-such-folder", "map.svg");
        var (code, _, error) = Run("map", Network("kestrel-general"), "-o", target);

        Assert.Equal(1, code);
        Assert.Single(error.TrimEnd('\n').Split('\n'));
        Assert.StartsWith(target + ": cannot write", error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("map", "map.jpg")]
    [InlineData("report", "report.pdf")]
    public void An_output_name_with_the_wrong_extension_is_a_usage_error(string command, string name)
    {
        var (code, _, error) = Run(command, Network("harbourside"), "-o", Path.Combine(_folder, name));

        // Contract: exit 2 for wrong usage (a bad option value).
        Assert.Equal(2, code);
        Assert.Contains("the file name must end in", error, StringComparison.Ordinal);
        Assert.Empty(Directory.GetFiles(_folder));
    }

    [Fact]
    public void The_map_command_draws_left_to_right_on_request()
    {
        string down = Path.Combine(_folder, "down.svg");
        string right = Path.Combine(_folder, "right.svg");
        Assert.Equal(0, Run("map", Network("kestrel-general"), "-o", down).ExitCode);
        Assert.Equal(0, Run("map", Network("kestrel-general"), "-o", right, "--direction", "right").ExitCode);

        var tall = SvgMap.Parse(File.ReadAllText(down));
        var wide = SvgMap.Parse(File.ReadAllText(right));
        Assert.True(tall.Height > tall.Width);
        Assert.True(wide.Width > wide.Height);
    }

    [Fact]
    public void Report_with_simulate_adds_the_time_of_day_and_comparison_sections_and_without_it_does_not()
    {
        string plain = Path.Combine(_folder, "plain.html");
        string simulated = Path.Combine(_folder, "simulated.html");
        string example = Network("larkspur-simulation");

        var without = Run("report", example, "-o", plain);
        var with = Run("report", example, "-o", simulated, "--simulate", "--seed", "3", "--replications", "2", "--warmup", "7d", "--duration", "60d");

        Assert.Equal(0, without.ExitCode);
        Assert.Equal(0, with.ExitCode);
        Assert.Equal($"report written to {simulated}\n", with.Out);
        string plainHtml = File.ReadAllText(plain);
        string simulatedHtml = File.ReadAllText(simulated);
        Assert.DoesNotContain("id=\"time-of-day\"", plainHtml, StringComparison.Ordinal);
        Assert.DoesNotContain("id=\"formula-vs-simulation\"", plainHtml, StringComparison.Ordinal);
        Assert.Contains("<figure id=\"time-of-day-figure\">", simulatedHtml, StringComparison.Ordinal);
        Assert.Contains("<table id=\"time-of-day-table\">", simulatedHtml, StringComparison.Ordinal);
        Assert.Contains("<table id=\"comparison-table\">", simulatedHtml, StringComparison.Ordinal);
        Assert.Contains("Simulated: 2 of 2 replications of 60.00 d each, after a warm-up of 7.000 d, seed 3.", simulatedHtml, StringComparison.Ordinal);

        // Everything before the new sections is the plain report, unchanged.
        int cut = simulatedHtml.IndexOf("<section id=\"time-of-day\">", StringComparison.Ordinal);
        Assert.StartsWith(simulatedHtml[..cut], plainHtml, StringComparison.Ordinal);
    }

    [Fact]
    public void Report_with_simulate_gives_the_same_bytes_for_the_same_seed()
    {
        string first = Path.Combine(_folder, "first.html");
        string second = Path.Combine(_folder, "second.html");
        string[] common = ["report", Network("larkspur-simulation"), "--simulate", "--seed", "9", "-r", "2", "--warmup", "1d", "--duration", "14d"];

        Assert.Equal(0, Run([.. common, "-o", first]).ExitCode);
        Assert.Equal(0, Run([.. common, "-o", second]).ExitCode);
        Assert.Equal(File.ReadAllText(first), File.ReadAllText(second));
    }

    [Theory]
    [InlineData("--seed", "4")]
    [InlineData("--replications", "3")]
    [InlineData("--duration", "30d")]
    [InlineData("--warmup", "2d")]
    public void A_simulation_option_without_simulate_is_a_usage_error(string option, string value)
    {
        var (code, output, error) = Run("report", Network("harbourside"), "-o", Path.Combine(_folder, "report.html"), option, value);

        // Contract: exit 2 for wrong usage.
        Assert.Equal(2, code);
        Assert.Empty(output);
        Assert.StartsWith($"netsolve: {option} applies only with --simulate\n", error, StringComparison.Ordinal);
        Assert.Empty(Directory.GetFiles(_folder));
    }

    [Fact]
    public void A_report_simulation_shorter_than_a_day_is_a_usage_error_and_writes_nothing()
    {
        var (code, output, error) = Run("report", Network("harbourside"), "-o", Path.Combine(_folder, "report.html"), "--simulate", "--duration", "12h");

        Assert.Equal(2, code);
        Assert.Empty(output);
        // A length with its unit is checked before the file is read: one line naming the option, then the usage hint.
        Assert.Equal("netsolve: --duration: '12h' is shorter than a day; the time-of-day section needs every hour measured\n"
            + "Run 'netsolve --help' for usage.\n", error);
        Assert.Empty(Directory.GetFiles(_folder));
    }
}
