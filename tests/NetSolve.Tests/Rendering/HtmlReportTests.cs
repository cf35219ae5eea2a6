using NetSolve.Tests.Support;
using System.Text.RegularExpressions;
using System.Xml.Linq;
using NetSolve.Rendering.Report;
using NetSolve.Solving;

namespace NetSolve.Tests.Rendering;

public partial class HtmlReportTests
{
    private static readonly string[] AssumptionWords = ["Steady state", "Poisson arrivals", "exponential service", "Independent routing", "First come, first served"];

    private static readonly string[] NamespaceNames = ["http://www.w3.org/2000/svg", "http://www.w3.org/1999/xlink"];

    private static string Report(string example, params ReportScenario[] scenarios)
    {
        string html = HtmlReport.Write(RenderingFixtures.Solved(example), scenarios);
        File.WriteAllText(Path.Combine(RenderingFixtures.OutputFolder(), example + "-report.html"), html);
        return html;
    }

    [Fact]
    public void The_finding_names_the_unit_that_saturates_first_and_its_headroom()
    {
        string html = Report("harbourside");

        // Source: contract example, the ward is the bottleneck with headroom 1.142.
        Assert.Equal("Medical ward saturates first: it reaches full utilisation when demand grows by a factor of 1.142 (+14.2%).", FindingOf(html));
    }

    [Fact]
    public void The_finding_says_when_a_unit_is_already_over_capacity()
    {
        // Source: by hand from the fenwick example: the medical ward receives 150/d x 8% + (150/d x 18% + 4/d) x 40%
        // = 24.4/d, offering 24.4 x 7.5 d = 183 erlangs to 170 beds: utilisation 1.0765.
        Assert.Matches("^Medical ward \\(107\\.6% busy\\) is over capacity at today's demand: its queue grows without limit\\.$", FindingOf(Report("fenwick-winter-surge")));
    }

    [Fact]
    public void The_page_is_self_contained_with_no_scripts_fonts_links_or_remote_references()
    {
        string html = Report("kestrel-general");

        Assert.DoesNotContain("<script", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("<link", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("@import", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("@font-face", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotMatch("url\\([^#]", html);
        Assert.DoesNotContain("src=", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("href=", html, StringComparison.OrdinalIgnoreCase);

        // Namespace names are identifiers, never fetched; any other http(s) text would be a reference.
        var addresses = AddressRegex().Matches(html).Select(m => m.Value).Distinct(StringComparer.Ordinal).ToList();
        Assert.All(addresses, a => Assert.Contains(a, NamespaceNames, StringComparer.Ordinal));
        Assert.Contains("default-src 'none'", html, StringComparison.Ordinal);
    }

    [Fact]
    public void The_page_has_the_map_the_unit_table_the_chart_the_assumptions_and_the_caution()
    {
        var solution = RenderingFixtures.Solved("harbourside");
        string html = Report("harbourside");

        Assert.Contains("<svg", html[html.IndexOf("id=\"map\"", StringComparison.Ordinal)..], StringComparison.Ordinal);
        foreach (var unit in solution.Units)
        {
            Assert.Contains($"<tr data-unit=\"{unit.Unit.Id}\">", html, StringComparison.Ordinal);
        }

        int growth = html.IndexOf("id=\"growth-figure\"", StringComparison.Ordinal);
        Assert.True(growth > 0);
        Assert.Contains("<svg", html[growth..], StringComparison.Ordinal);
        foreach (string word in AssumptionWords)
        {
            Assert.Contains(word, html, StringComparison.Ordinal);
        }

        Assert.Contains("planning estimates under stated assumptions; decisions follow local clinical governance and safe-staffing rules", html, StringComparison.Ordinal);
    }

    [Fact]
    public void The_unit_table_shows_the_contract_numbers_as_the_solve_table_does()
    {
        string html = HtmlReport.Write(NetworkSolver.Solve(TestNetworks.JacksonExample("harbourside.yaml")), []);
        var row = Regex.Match(html, "<tr data-unit=\"emergency\">.*?</tr>").Value;

        // Source: contract example (the Jackson network: no service_cv) for emergency: 32 servers, arrival_rate 18.699187, utilisation 0.681741,
        // p_wait 0.027645, mean_wait 0.003167 h = 0.19002 min, mean_time_in_unit 1.169834 h, headroom 1.466832.
        Assert.Equal(
            ["Emergency department", "\u25CB ok", "32", "18.70", "68.2%", "0.028", "0.1900 min", "1.170 h", "1.467"],
            CellRegex().Matches(row).Select(m => System.Net.WebUtility.HtmlDecode(m.Groups[1].Value)).ToArray());
    }

    [Fact]
    public void The_print_stylesheet_sets_page_margins_that_fit_A4_and_Letter()
    {
        string html = Report("harbourside");

        // Source: ISO 216 A4 is 210 x 297 mm; US Letter is 8.5 x 11 in = 215.9 x 279.4 mm. With 15 mm margins the
        // printable area of A4 (180 mm wide) fits inside Letter's (185.9 mm), so one layout serves both.
        Assert.Contains("@page { margin: 15mm; }", html, StringComparison.Ordinal);
        Assert.Contains("@media print", html, StringComparison.Ordinal);
        Assert.DoesNotContain("size: A4", html, StringComparison.Ordinal);
    }

    [Fact]
    public void In_print_the_map_section_is_kept_on_one_page_and_the_map_held_to_the_height_limit()
    {
        string html = Report("harbourside");
        string print = html[html.IndexOf("@media print", StringComparison.Ordinal)..];

        Assert.Contains("#map { break-inside: avoid-page; }", print, StringComparison.Ordinal);
        Assert.Contains("#map-figure svg { max-height: 190mm; }", print, StringComparison.Ordinal);
        Assert.DoesNotContain("break-inside: auto", html, StringComparison.Ordinal);
        Assert.Matches("<svg viewBox=\"0 0 [0-9.]+ [0-9.]+\"[^>]* class=\"bottleneck-map\"", html);
    }

    [Fact]
    public void A_map_that_prints_legibly_on_one_page_has_no_print_note()
    {
        // By hand: the harbourside map (479 x 856) shown at most 599 px wide is reduced to the 190 mm (718 px) limit,
        // a scale of 718 / 856 = 0.84: its 12-unit text prints at 12 x 0.84 x 72/96 = 7.5 pt, above 6 pt.
        Assert.DoesNotContain("id=\"map-print-note\"", Report("harbourside"), StringComparison.Ordinal);
    }

    [Fact]
    public void A_tall_map_has_a_print_note_above_it_giving_the_size_its_text_prints_at()
    {
        var solution = RenderingFixtures.Generated(40, 1);
        string html = HtmlReport.Write(solution);
        string svg = html[html.IndexOf("<svg", html.IndexOf("id=\"map-figure\"", StringComparison.Ordinal), StringComparison.Ordinal)..];
        var map = SvgMap.Parse(svg[..(svg.IndexOf("</svg>", StringComparison.Ordinal) + 6)]);

        // The map at A4 width, or at most 125% of its own: its height at that scale runs past the height limit, so
        // the height sets the scale, and its smallest text (12 units) prints at 12 x (limit / height) px x 72/96 pt.
        double limitPx = 190.0 / 25.4 * 96.0;
        double widthPx = Math.Min(180.0 / 25.4 * 96.0, Math.Ceiling(map.Width * 1.25));
        Assert.True(map.Height * widthPx / map.Width > limitPx);
        double printedPt = map.FontSizes.Min() * (limitPx / map.Height) * 72.0 / 96.0;
        Assert.True(printedPt < 6.0);

        var note = Regex.Match(html, "<p class=\"map-print-note\" id=\"map-print-note\">(.*?)</p>");
        Assert.True(note.Success);
        Assert.Contains(printedPt.ToString("0.0", System.Globalization.CultureInfo.InvariantCulture) + " pt", note.Groups[1].Value, StringComparison.Ordinal);
        Assert.Contains("Open the report's HTML file on a screen", System.Net.WebUtility.HtmlDecode(note.Groups[1].Value), StringComparison.Ordinal);
        int section = html.IndexOf("id=\"map\"", StringComparison.Ordinal);
        Assert.InRange(note.Index, section, html.IndexOf("class=\"map-frame\"", StringComparison.Ordinal));
    }

    [Fact]
    public void Scenarios_are_compared_side_by_side_with_the_baseline()
    {
        var baseline = RenderingFixtures.Example("harbourside");
        var moreBeds = baseline with { Units = [.. baseline.Units.Select(u => u.Id == "ward" ? u with { Servers = NetSolve.Model.Servers.Of(330) } : u)] };
        string html = Report("harbourside", new ReportScenario("thirty more ward beds", NetworkSolver.Solve(moreBeds)));

        int section = html.IndexOf("id=\"scenarios\"", StringComparison.Ordinal);
        Assert.True(section > 0);
        string scenarios = html[section..];
        Assert.Contains("<td>Baseline: Harbourside Community Hospital, acute pathway</td>", scenarios, StringComparison.Ordinal);
        Assert.Contains("<td>thirty more ward beds</td>", scenarios, StringComparison.Ordinal);

        // 330 beds at the contract's ward load (300 / 1.142 = 262.7 erlangs) give headroom 330 / 262.7 = 1.256, so
        // the ward is no longer first to saturate: imaging (headroom 1 / 0.727 = 1.375) is not either; emergency is
        // 1.467; the lab 1 / 0.623 = 1.605. The ward stays the smallest, at 1.256.
        Assert.Matches("<td>thirty more ward beds</td><td>yes</td><td>Medical ward</td><td>1.25[0-9]</td>", scenarios);
    }

    [Fact]
    public void No_scenario_section_without_scenarios_and_the_output_is_repeatable()
    {
        string first = Report("kestrel-general");
        Assert.DoesNotContain("id=\"scenarios\"", first, StringComparison.Ordinal);
        Assert.Equal(first, Report("kestrel-general"));
    }

    [Fact]
    public void The_report_is_well_formed_enough_to_parse_as_xml()
    {
        // The page is HTML5; writing it as well-formed markup as well keeps every tag closed and every & escaped.
        string html = Report("harbourside");
        string body = html[html.IndexOf("<body>", StringComparison.Ordinal)..(html.IndexOf("</body>", StringComparison.Ordinal) + 7)];
        var parsed = XElement.Parse(body.Replace("&nbsp;", "&#160;", StringComparison.Ordinal));
        Assert.Equal("body", parsed.Name.LocalName);
    }

    private static string FindingOf(string html) =>
        System.Net.WebUtility.HtmlDecode(Regex.Match(html, "<p class=\"finding\" id=\"finding\"><strong>Finding:</strong> (.*?)</p>").Groups[1].Value);

    [GeneratedRegex("https?://[^\"'\\s)<>]+")]
    private static partial Regex AddressRegex();

    [GeneratedRegex("<td[^>]*>(.*?)</td>")]
    private static partial Regex CellRegex();
}
