using System.Globalization;
using System.Text;
using NetSolve.Presentation;
using NetSolve.Rendering.Map;
using NetSolve.Tests.Rendering;
using static NetSolve.Tests.Support.CliRun;

namespace NetSolve.Tests.Cli;

/// <summary>Networks larger than a map is drawn for (<see cref="MapLayoutBuilder.MaxUnits"/>): <c>map</c> refuses at once, <c>report</c> leaves the map out.</summary>
public sealed class LargeMapTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "netsolve-large-map-" + Guid.NewGuid().ToString("N"));

    public LargeMapTests() => Directory.CreateDirectory(_folder);

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    [Fact]
    public void Map_refuses_a_network_larger_than_it_draws_with_a_suggestion_and_writes_nothing()
    {
        string network = Chain(MapLayoutBuilder.MaxUnits + 1);
        string target = Path.Combine(_folder, "map.svg");
        var (code, output, error) = Run("map", network, "-o", target);

        Assert.Equal(1, code);
        Assert.Equal(string.Empty, output);
        Assert.Equal(
            string.Create(CultureInfo.InvariantCulture, $"netsolve: the network has {MapLayoutBuilder.MaxUnits + 1} units and a map is drawn for at most {MapLayoutBuilder.MaxUnits}, because a larger map is too big to open or print legibly: map one part of the network at a time (a file with one hospital's units), or use 'report', whose unit table lists every unit\n"),
            error);
        Assert.False(File.Exists(target));
    }

    [Fact]
    public void Map_still_draws_a_network_of_exactly_the_largest_size()
    {
        string target = Path.Combine(_folder, "map.dot");
        var (code, _, _) = Run("map", Chain(MapLayoutBuilder.MaxUnits), "-o", target);

        Assert.Equal(0, code);
        Assert.True(File.Exists(target));
    }

    [Fact]
    public void Report_on_a_network_larger_than_a_map_is_drawn_for_says_so_and_keeps_every_unit_in_its_table()
    {
        int units = MapLayoutBuilder.MaxUnits + 1;
        string target = Path.Combine(_folder, "report.html");
        var (code, _, _) = Run("report", Chain(units), "-o", target);

        Assert.Equal(0, code);
        string html = File.ReadAllText(target);
        Assert.Contains(string.Create(CultureInfo.InvariantCulture, $"The network has {units} units; a map is drawn for at most {MapLayoutBuilder.MaxUnits}, so it is left out here."), html, StringComparison.Ordinal);
        Assert.DoesNotContain("id=\"map-figure\"", html, StringComparison.Ordinal);
        Assert.Contains("w" + (units - 1).ToString("D4", CultureInfo.InvariantCulture), html, StringComparison.Ordinal);
    }

    [Fact]
    public void Report_on_a_network_above_the_layered_layouts_limit_draws_the_large_map()
    {
        int units = MapLayoutBuilder.MaxLayeredUnits + 50;
        string target = Path.Combine(_folder, "report.html");
        var (code, _, _) = Run("report", Chain(units), "-o", target);

        Assert.Equal(0, code);
        string html = File.ReadAllText(target);
        Assert.Contains("id=\"map-figure\"", html, StringComparison.Ordinal);
        Assert.Equal(units, html.Split("<g class=\"unit status-").Length - 1);
        // A chain losing a tenth of its patients at every unit: the far end's lines carry under a fifth of the first's.
        Assert.Contains("pale lines carry under a fifth of the largest flow", html, StringComparison.Ordinal);
        // Shrunk to the column, 300 boxes would have unreadable text: on screen the map keeps its size and scrolls.
        Assert.Contains("#map-figure .map-frame { max-width: none !important; max-height: 85vh; overflow: auto;", html, StringComparison.Ordinal);
        // The legend is drawn apart, above the scrolling frame, so it stays in view; the frame holds the graph alone.
        int legend = html.IndexOf("id=\"map-legend\"", StringComparison.Ordinal);
        int frame = html.IndexOf("class=\"map-frame\"", StringComparison.Ordinal);
        Assert.InRange(legend, html.IndexOf("id=\"map-figure\"", StringComparison.Ordinal), frame);
        Assert.Equal(4, html[legend..frame].Split("class=\"legend-status\"").Length - 1);
        Assert.DoesNotContain("class=\"legend", html[frame..], StringComparison.Ordinal);
    }

    // About 1 s each in Debug for SVG and DOT, 2.5 s for the PNG now that it is painted without the SVG's parse.
    [Theory]
    [InlineData(".svg")]
    [InlineData(".dot")]
    [InlineData(".png")]
    public void Map_draws_a_generated_network_of_1000_units(string extension) => Draw1000(extension);

    private void Draw1000(string extension)
    {
        string network = Path.Combine(_folder, "generated-1000.yaml");
        using (var writer = new StreamWriter(network))
        {
            NetworkYamlWriter.Write(GeneratedHospital.Create(1000, seed: 1), writer);
        }

        string target = Path.Combine(_folder, "map" + extension);
        var (code, output, _) = Run("map", network, "-o", target);

        Assert.Equal(0, code);
        Assert.Equal(string.Create(CultureInfo.InvariantCulture, $"map of 1000 units written to {target}\n"), output);
        if (extension == ".svg")
        {
            Assert.Equal(1000, File.ReadAllText(target).Split("data-unit=\"").Length - 1);
        }
    }

    /// <summary>A network file of <paramref name="units"/> units in a line, patients arriving at the first.</summary>
    private string Chain(int units)
    {
        var yaml = new StringBuilder("name: Long corridor of invented wards\ntime_unit: hour\n\nunits:\n");
        for (int i = 0; i < units; i++)
        {
            yaml.Append(CultureInfo.InvariantCulture, $"  w{i:D4}:\n    servers: 2\n    service: 1h\n");
        }

        yaml.Append("\narrivals:\n  w0000: 1/h\n\nroutes:\n");
        for (int i = 0; i + 1 < units; i++)
        {
            yaml.Append(CultureInfo.InvariantCulture, $"  w{i:D4}:\n    w{i + 1:D4}: 0.9\n");
        }

        string path = Path.Combine(_folder, string.Create(CultureInfo.InvariantCulture, $"chain-{units}.yaml"));
        File.WriteAllText(path, yaml.ToString());
        return path;
    }
}
