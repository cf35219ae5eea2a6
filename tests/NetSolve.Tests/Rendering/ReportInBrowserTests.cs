using System.Globalization;
using Microsoft.Playwright;
using NetSolve.Rendering.Report;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Tests.Rendering;

/// <summary>Opens the report in Debian's chromium, headless, through Playwright; .ci/run installs chromium.</summary>
public partial class ReportInBrowserTests
{
    private const string Chromium = "/usr/bin/chromium";

    /// <summary>A4 is 210 mm wide (ISO 216); less 15 mm margins, 180 mm at CSS's 96 px per inch is 680 px.</summary>
    private const int A4PrintableWidthPx = 680;

    private static readonly string[] LaunchArgs =
    [
        "--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
        "--disable-background-networking", "--disable-component-update", "--disable-sync",
    ];

    [Fact]
    public async Task The_report_shows_map_table_and_charts_and_makes_no_network_request()
    {
        Assert.True(File.Exists(Chromium), $"{Chromium} is missing: .ci/run installs Debian's chromium package");
        var baseline = RenderingFixtures.Example("kestrel-general");
        var fewerTheatres = baseline with { Units = [.. baseline.Units.Select(u => u.Id == "theatres" ? u with { Servers = NetSolve.Model.Servers.Of(7) } : u)] };
        string html = HtmlReport.Write(NetworkSolver.Solve(baseline), [new ReportScenario("one theatre closed", NetworkSolver.Solve(fewerTheatres))]);
        string page = Path.Combine(RenderingFixtures.OutputFolder(), "browser-report.html");
        File.WriteAllText(page, html);
        string pageUrl = new Uri(page).AbsoluteUri;

        // The same page with a short simulation of the larkspur example (it has an arrival profile): the time-of-day
        // chart and table and the formula-against-simulation table are added.
        var larkspur = RenderingFixtures.Example("larkspur-simulation");
        var simulation = Simulator.Run(larkspur, new SimulationOptions { Seed = 5, Replications = 2, WarmupHours = 7 * 24, DurationHours = 60 * 24 }, cancellation: TestContext.Current.CancellationToken);
        string simulatedPage = Path.Combine(RenderingFixtures.OutputFolder(), "browser-simulated-report.html");
        File.WriteAllText(simulatedPage, HtmlReport.Write(NetworkSolver.Solve(larkspur), [], simulation));
        string simulatedUrl = new Uri(simulatedPage).AbsoluteUri;
        string[] pages = [pageUrl, simulatedUrl];

        string profile = Directory.CreateTempSubdirectory("netsolve-chromium-").FullName;
        try
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

            var requests = new List<string>();
            await context.RouteAsync("**/*", async route =>
            {
                lock (requests)
                {
                    requests.Add(route.Request.Url);
                }

                await (pages.Contains(route.Request.Url) ? route.ContinueAsync() : route.AbortAsync());
            });
            var tab = context.Pages.Count > 0 ? context.Pages[0] : await context.NewPageAsync();
            tab.Request += (_, request) =>
            {
                lock (requests)
                {
                    requests.Add(request.Url);
                }
            };

            await tab.GotoAsync(pageUrl, new PageGotoOptions { WaitUntil = WaitUntilState.Load });

            await tab.Locator("#map-figure svg.bottleneck-map").That(minWidth: 300);
            await tab.Locator("#unit-table").That(minWidth: 300);
            await tab.Locator("#growth-figure svg").That(minWidth: 300);
            await tab.Locator("#scenario-table").That(minWidth: 300);
            Assert.Equal(9, await tab.Locator("#unit-table tbody tr").CountAsync());
            Assert.Equal(9, await tab.Locator("#map-figure g.unit").CountAsync());
            Assert.True(await tab.Locator("#growth-figure svg path").CountAsync() > 9);

            await tab.ScreenshotAsync(new PageScreenshotOptions
            {
                Path = Path.Combine(RenderingFixtures.OutputFolder(), "report-chromium.png"),
                FullPage = true,
            });

            await AssertFitsA4Print(tab);

            var simulated = await context.NewPageAsync();
            simulated.Request += (_, request) =>
            {
                lock (requests)
                {
                    requests.Add(request.Url);
                }
            };
            await simulated.GotoAsync(simulatedUrl, new PageGotoOptions { WaitUntil = WaitUntilState.Load });
            await simulated.Locator("#time-of-day-figure svg").That(minWidth: 300);
            await simulated.Locator("#time-of-day-table").That(minWidth: 300);
            await simulated.Locator("#comparison-table").That(minWidth: 300);
            Assert.Equal(24, await simulated.Locator("#time-of-day-table tbody tr").CountAsync());
            Assert.Equal(larkspur.Units.Length, await simulated.Locator("#comparison-table tbody tr").CountAsync());
            await simulated.Locator("#time-of-day").ScreenshotAsync(new LocatorScreenshotOptions
            {
                Path = Path.Combine(RenderingFixtures.OutputFolder(), "report-time-of-day-chromium.png"),
            });
            await AssertFitsA4Print(simulated);

            lock (requests)
            {
                Assert.All(requests, url => Assert.Contains(url, pages, StringComparer.Ordinal));
            }
        }
        finally
        {
            Directory.Delete(profile, recursive: true);
        }
    }

    /// <summary>Printed on A4 (and so on Letter, which is wider), nothing runs off the side of the page.</summary>
    private static async Task AssertFitsA4Print(IPage tab)
    {
        await tab.SetViewportSizeAsync(A4PrintableWidthPx, 1000);
        await tab.EmulateMediaAsync(new PageEmulateMediaOptions { Media = Media.Print });
        int scrollWidth = await tab.EvaluateAsync<int>("document.documentElement.scrollWidth");
        string wide = await tab.EvaluateAsync<string>(
            "Array.from(document.querySelectorAll('body *')).filter(e => e.getBoundingClientRect().right > " + A4PrintableWidthPx.ToString(CultureInfo.InvariantCulture) + ").slice(0, 5).map(e => e.tagName + '#' + e.id + '.' + e.className + ' ' + Math.round(e.getBoundingClientRect().right)).join('; ')");
        Assert.True(scrollWidth <= A4PrintableWidthPx, FormattableString.Invariant($"printed page is {scrollWidth} px wide: {wide}"));
    }
}
