using System.Security.Cryptography;
using NetSolve.Cli;
using NetSolve.Cli.Commands;
using static NetSolve.Tests.Support.CliRun;
using static NetSolve.Tests.Support.TestFiles;

namespace NetSolve.Tests.Cli;

/// <summary>The report says where it comes from (date, version, input files with their SHA-256) and what each scenario changed.</summary>
public sealed class ReportProvenanceTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "netsolve-provenance-" + Guid.NewGuid().ToString("N"));

    public ReportProvenanceTests() => Directory.CreateDirectory(_folder);

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    private static string Scenario(string name) => Path.Combine(NetworksFolder, "scenarios", name + ".yaml");

    private string Report(params string[] inputs)
    {
        string target = Path.Combine(_folder, "report.html");
        var (code, _, error) = Run(["report", .. inputs, "-o", target]);
        Assert.True(code == 0, error);
        return File.ReadAllText(target);
    }

    [Fact]
    public void The_report_names_every_input_file_with_the_sha256_of_its_bytes()
    {
        string network = Network("harbourside");
        string scenario = Scenario("harbourside-fourth-scanner");

        string html = Report(network, scenario);

        // Source: FIPS 180-4 (SHA-256), computed here by .NET's own implementation from the file's bytes.
        foreach (string file in new[] { network, scenario })
        {
            string sha = Convert.ToHexStringLower(SHA256.HashData(File.ReadAllBytes(file)));
            Assert.Contains(Path.GetFileName(file) + " (SHA-256 <code>" + sha + "</code>)", html, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void The_report_carries_the_date_from_source_date_epoch_and_the_version()
    {
        string html = Report(Network("harbourside"));

        // Exact by hand: the test run fixes SOURCE_DATE_EPOCH at 1768435200 s, 2026-01-15 00:00 UTC (date -u -d @1768435200).
        Assert.Matches("id=\"provenance\">Made on 2026-01-15 with NetSolve [0-9]+\\.[0-9]+\\.[0-9]+ from ", html);
    }

    [Fact]
    public void Each_scenario_has_a_line_naming_its_changes()
    {
        string html = Report(Network("harbourside"), Scenario("harbourside-fourth-scanner"));

        // Exact by hand from networks/scenarios/harbourside-fourth-scanner.yaml: imaging +1 server, lab service x0.8.
        Assert.Contains("<li><strong>Fourth scanner, faster lab</strong> changes: imaging: +1 server; lab: service &#215;0.8</li>", html, StringComparison.Ordinal);
    }

    [Fact]
    public void A_scenario_file_as_the_report_subject_lists_its_changes_under_the_title()
    {
        string html = Report(Scenario("harbourside-fourth-scanner"));

        Assert.Contains("id=\"baseline-changes\">Changes from the base network: imaging: +1 server; lab: service &#215;0.8</p>", html, StringComparison.Ordinal);
    }

    [Fact]
    public void The_scenario_table_names_units_by_their_labels()
    {
        string html = Report(Network("harbourside"), Scenario("harbourside-fourth-scanner"));

        string unitsTable = html[html.IndexOf("id=\"scenario-units\"", StringComparison.Ordinal)..];
        Assert.Contains("<tr><td>Imaging (CT and X-ray)</td>", unitsTable, StringComparison.Ordinal);
        Assert.DoesNotContain("<tr><td>imaging</td>", unitsTable, StringComparison.Ordinal);
    }

    [Fact]
    public void A_source_date_epoch_that_is_not_a_number_is_bad_input_naming_it()
    {
        var problem = Assert.Throws<InputException>(() => ReportProvenanceReader.DateFrom("yesterday", TimeProvider.System));

        Assert.StartsWith("SOURCE_DATE_EPOCH: 'yesterday' is not", problem.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("\n", problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Without_source_date_epoch_the_date_is_the_clocks()
    {
        // Exact by hand: 1 000 000 000 s after 1970-01-01 UTC is 2001-09-09 01:46:40 UTC.
        var clock = new FixedClock(DateTimeOffset.FromUnixTimeSeconds(1_000_000_000));

        Assert.Equal(new DateOnly(2001, 9, 9), ReportProvenanceReader.DateFrom(null, clock));
        Assert.Equal(new DateOnly(2026, 1, 15), ReportProvenanceReader.DateFrom("1768435200", clock));
    }

    private sealed class FixedClock(DateTimeOffset now) : TimeProvider
    {
        public override DateTimeOffset GetUtcNow() => now;
    }
}
