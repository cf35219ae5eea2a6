using System.Xml.Linq;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Roster;

public sealed class StaffByHourChartCommandTests
{
    private static string[] ByHour(params string[] more) =>
        ["staff", TestFiles.Network("wrenfield-emergency-roster"), "--by-hour", "--max-wait", "10min", "--no-check", .. more];

    [Fact]
    public void The_chart_is_written_beside_the_unchanged_table()
    {
        var folder = Directory.CreateTempSubdirectory("netsolve-roster-chart-");
        try
        {
            string svg = Path.Combine(folder.FullName, "roster.svg"), png = Path.Combine(folder.FullName, "roster.PNG");

            var plain = CliRun.Run(ByHour());
            var withSvg = CliRun.Run(ByHour("--chart", svg));
            var withPng = CliRun.Run(ByHour("--chart", png));

            Assert.Equal(0, withSvg.ExitCode);
            Assert.Equal(0, withPng.ExitCode);
            Assert.Equal(plain.Out, withSvg.Out);
            Assert.Equal(plain.Out, withPng.Out);
            Assert.Equal("svg", XDocument.Load(svg).Root!.Name.LocalName);
            // Source: PNG specification (ISO/IEC 15948), section 5.2, the eight-byte signature.
            Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A }, File.ReadAllBytes(png)[..8]);
            Assert.Equal(["roster.PNG", "roster.svg"], folder.EnumerateFiles().Select(file => file.Name).Order(StringComparer.Ordinal), StringComparer.Ordinal);
        }
        finally
        {
            folder.Delete(recursive: true);
        }
    }

    [Theory]
    [InlineData("roster.pdf", "--chart 'roster.pdf': the file name must end in .svg, .png")]
    [InlineData("roster", "--chart 'roster': the file name must end in .svg, .png")]
    public void A_chart_name_without_svg_or_png_is_a_usage_error(string file, string expected)
    {
        var result = CliRun.Run(ByHour("--chart", file));

        Assert.Equal(2, result.ExitCode);
        Assert.Contains(expected, result.Error, StringComparison.Ordinal);
        Assert.Empty(result.Out);
    }

    [Fact]
    public void A_chart_without_by_hour_is_a_usage_error()
    {
        var result = CliRun.Run("staff", TestFiles.Network("wrenfield-emergency-roster"), "--max-wait", "10min", "--chart", "roster.svg");

        Assert.Equal(2, result.ExitCode);
        Assert.Contains("staff: --chart draws a roster by hour; give it with --by-hour", result.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_chart_in_a_missing_folder_fails_in_one_line_before_anything_is_printed()
    {
        string missing = Path.Combine(Path.GetTempPath(), "netsolve-no-such-folder-" + Guid.NewGuid().ToString("N"), "roster.svg");

        var result = CliRun.Run(ByHour("--chart", missing));

        Assert.Equal(1, result.ExitCode);
        Assert.Empty(result.Out);
        Assert.DoesNotContain("   at ", result.Error, StringComparison.Ordinal);
        Assert.False(File.Exists(missing));
    }
}
