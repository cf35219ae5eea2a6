using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;
using Microsoft.Playwright;
using NetSolve.Rendering.Report;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Rendering;

/// <summary>A tall bottleneck map printed from chromium: one page of A4 or Letter, whole, and unchanged on screen.</summary>
public partial class ReportInBrowserTests
{
    /// <summary>Units in the tall networks: an 80-unit hospital laid out top to bottom is several A4 pages tall at A4 width (40 no longer is once returns no longer stretch the layers).</summary>
    private const int TallUnitCount = 80;

    /// <summary>The report draws the map at most this many times its own size (HtmlReport's limit).</summary>
    private const double MaxMapEnlargement = 1.25;

    /// <summary>Screen pixels a measured size may differ from a computed one by: layout rounds to device pixels.</summary>
    private const double LayoutTolerancePx = 1.0;

    /// <summary>What the map section's computed break-inside may be for it to stay on one page.</summary>
    private static readonly string[] KeptTogether = ["avoid", "avoid-page"];

    /// <summary>Service times of the chain's units, in minutes, in turn.</summary>
    private static readonly int[] ChainServiceMinutes = [15, 20, 26];

    /// <summary>The printable areas of A4 and Letter with the report's 15 mm margins, in CSS px, and the paper to print on.</summary>
    /// <remarks>
    /// Source: ISO 216, A4 is 210 x 297 mm; US Letter is 8.5 x 11 in = 215.9 x 279.4 mm. Less 2 x 15 mm, A4 prints
    /// 180 x 267 mm and Letter 185.9 x 249.4 mm; at CSS's 96 px per 25.4 mm inch, 680 x 1009 px and 702 x 942 px
    /// (rounded down, so a box that fits these fits the page).
    /// </remarks>
    private static readonly (string Paper, int WidthPx, int HeightPx)[] PrintableAreas = [("A4", 680, 1009), ("Letter", 702, 942)];

    [Theory]
    [InlineData("chain")]
    [InlineData("hospital")]
    public async Task A_tall_map_prints_whole_on_one_page_of_A4_or_Letter_and_says_it_is_printed_reduced(string shape)
    {
        Assert.True(File.Exists(Chromium), $"{Chromium} is missing: .ci/run installs Debian's chromium package");
        string folder = Directory.CreateTempSubdirectory("netsolve-print-").FullName;
        try
        {
            string report = Path.Combine(folder, "report.html");
            if (shape == "chain")
            {
                // Through the command line, as a planner would run it.
                string network = Path.Combine(folder, "chain.yaml");
                File.WriteAllText(network, ChainYaml(TallUnitCount));
                var (code, _, error) = CliRun.Run("report", network, "-o", report);
                Assert.True(code == 0, string.Create(CultureInfo.InvariantCulture, $"netsolve report exited {code}: {error}"));
            }
            else
            {
                File.WriteAllText(report, HtmlReport.Write(RenderingFixtures.Generated(TallUnitCount, seed: 1)));
            }

            File.Copy(report, Path.Combine(RenderingFixtures.OutputFolder(), $"tall-{shape}-report.html"), overwrite: true);
            await AssertTallMapPrintsOnOnePage(new Uri(report).AbsoluteUri, Path.Combine(folder, "profile"), shape);
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    private static async Task AssertTallMapPrintsOnOnePage(string url, string profile, string shape)
    {
        using var playwright = await Playwright.CreateAsync();
        await using var context = await playwright.Chromium.LaunchPersistentContextAsync(profile, new BrowserTypeLaunchPersistentContextOptions
        {
            ExecutablePath = Chromium,
            Headless = true,
            Args = LaunchArgs,
            ViewportSize = new ViewportSize { Width = 1100, Height = 900 },
            Offline = true,
        });
        var tab = context.Pages.Count > 0 ? context.Pages[0] : await context.NewPageAsync();
        await tab.GotoAsync(url, new PageGotoOptions { WaitUntil = WaitUntilState.Load });
        var map = tab.Locator("#map-figure svg.bottleneck-map");
        var note = tab.Locator("#map-print-note");
        var (mapWidth, mapHeight) = await ViewBoxSize(map);
        double widestPx = Math.Ceiling(mapWidth * MaxMapEnlargement);
        double atPageWidthPx = mapHeight * Math.Min(A4PrintableWidthPx, widestPx) / mapWidth;
        Assert.True(atPageWidthPx > 2 * PrintableAreas[0].HeightPx, string.Create(CultureInfo.InvariantCulture, $"the {shape} map is {atPageWidthPx:0} px tall at A4 width: less than two pages"));

        // On screen, as before: as wide as its column up to 125% of its own width, in proportion, no note.
        var screen = (await map.BoundingBoxAsync())!;
        double columnWidth = (await tab.Locator("#map-figure").BoundingBoxAsync())!.Width;
        Assert.Equal(Math.Min(columnWidth, widestPx), screen.Width, LayoutTolerancePx);
        Assert.Equal(screen.Width * mapHeight / mapWidth, screen.Height, LayoutTolerancePx);
        Assert.False(await note.IsVisibleAsync(), "the print note shows on screen");

        foreach (var (paper, widthPx, heightPx) in PrintableAreas)
        {
            await tab.SetViewportSizeAsync(widthPx, heightPx);
            await tab.EmulateMediaAsync(new PageEmulateMediaOptions { Media = Media.Print });

            // The whole section (heading, note, map, caption) fits the printable height and may not break.
            var section = (await tab.Locator("#map").BoundingBoxAsync())!;
            Assert.True(section.Height <= heightPx, string.Create(CultureInfo.InvariantCulture, $"{paper}: the map section is {section.Height:0} px tall, the page {heightPx} px"));
            Assert.Contains(await tab.Locator("#map").EvaluateAsync<string>("e => getComputedStyle(e).breakInside"), (IEnumerable<string>)KeptTogether, StringComparer.Ordinal);

            // Scaled alike across and down, the whole view box drawn inside the map's box (nothing clipped) and the page.
            var drawn = await map.EvaluateAsync<PrintedDrawing>(
                """
                svg => {
                  const m = svg.getScreenCTM(), v = svg.viewBox.baseVal, box = svg.getBoundingClientRect();
                  return { ScaleAcross: m.a, ScaleDown: m.d, Skew: Math.abs(m.b) + Math.abs(m.c),
                           Left: m.e + v.x * m.a, Top: m.f + v.y * m.d, Right: m.e + (v.x + v.width) * m.a, Bottom: m.f + (v.y + v.height) * m.d,
                           BoxLeft: box.left, BoxTop: box.top, BoxRight: box.right, BoxBottom: box.bottom };
                }
                """);
            Assert.Equal(drawn.ScaleAcross, drawn.ScaleDown, 1e-9);
            Assert.Equal(0.0, drawn.Skew);
            Assert.True(drawn.Left >= drawn.BoxLeft - LayoutTolerancePx && drawn.Right <= drawn.BoxRight + LayoutTolerancePx, $"{paper}: the map is clipped left or right");
            Assert.True(drawn.Top >= drawn.BoxTop - LayoutTolerancePx && drawn.Bottom <= drawn.BoxBottom + LayoutTolerancePx, $"{paper}: the map is clipped at top or bottom");
            Assert.True(drawn.Left >= -LayoutTolerancePx && drawn.Right <= widthPx + LayoutTolerancePx, $"{paper}: the map runs off the page");

            // Fitted, its smallest text is far below 6 pt: the printout says so beside the map.
            Assert.True(await note.IsVisibleAsync(), $"{paper}: no print note beside the reduced map");
            await tab.Locator("#map").ScreenshotAsync(new LocatorScreenshotOptions
            {
                Path = Path.Combine(RenderingFixtures.OutputFolder(), $"tall-{shape}-map-{paper}-print.png"),
            });
        }

        // Printed for real, with print media as emulated above: the map section alone fills exactly one page.
        await tab.EvaluateAsync("() => { for (const e of [...document.body.children]) { if (e.id !== 'map') e.remove(); } }");
        foreach (var (paper, _, _) in PrintableAreas)
        {
            byte[] pdf = await tab.PdfAsync(new PagePdfOptions { Format = paper, PrintBackground = true });
            await File.WriteAllBytesAsync(Path.Combine(RenderingFixtures.OutputFolder(), $"tall-{shape}-map-{paper}.pdf"), pdf);
            Assert.Equal(1, PdfPageCount(pdf));
        }
    }

    private static async Task<(double Width, double Height)> ViewBoxSize(ILocator map)
    {
        var size = await map.EvaluateAsync<double[]>("svg => [svg.viewBox.baseVal.width, svg.viewBox.baseVal.height]");
        Assert.True(size[0] > 0 && size[1] > 0, "the map has no view box, so it cannot scale");
        return (size[0], size[1]);
    }

    /// <summary>Pages in a PDF written by chromium: its page objects, which it writes uncompressed (ISO 32000-1, 7.7.3.3).</summary>
    private static int PdfPageCount(byte[] pdf) => PageObjectRegex().Count(Encoding.Latin1.GetString(pdf));

    /// <summary>A chain of units, each passing every patient to the next: laid out top to bottom, one unit a row.</summary>
    private static string ChainYaml(int units)
    {
        var yaml = new StringBuilder(string.Create(CultureInfo.InvariantCulture, $"name: {units}-step pathway\ntime_unit: hour\n\nunits:\n"));
        for (int i = 1; i <= units; i++)
        {
            // Exact by hand: 4 patients an hour for 15, 20 or 26 minutes on 2 servers keep them 50%, 66.7% or 86.7% busy.
            int minutes = ChainServiceMinutes[i % ChainServiceMinutes.Length];
            yaml.Append(CultureInfo.InvariantCulture, $"  step{i:00}:\n    label: Pathway step {i}\n    servers: 2\n    service: {minutes}min\n");
        }

        yaml.Append("\narrivals:\n  step01: 4/h\n\nroutes:\n");
        for (int i = 1; i < units; i++)
        {
            yaml.Append(CultureInfo.InvariantCulture, $"  step{i:00}:\n    step{i + 1:00}: 100%\n");
        }

        return yaml.ToString();
    }

    /// <summary>Where the map's view box lands in the page, from the map's screen transform, beside the map's own box.</summary>
    /// <remarks>Filled in by Playwright, which needs a parameterless constructor and settable properties.</remarks>
    private sealed class PrintedDrawing
    {
        public double ScaleAcross { get; init; }

        public double ScaleDown { get; init; }

        public double Skew { get; init; }

        public double Left { get; init; }

        public double Top { get; init; }

        public double Right { get; init; }

        public double Bottom { get; init; }

        public double BoxLeft { get; init; }

        public double BoxTop { get; init; }

        public double BoxRight { get; init; }

        public double BoxBottom { get; init; }
    }

    [GeneratedRegex(@"/Type\s*/Page(?![a-zA-Z])")]
    private static partial Regex PageObjectRegex();
}
