using System.Text.RegularExpressions;
using NetSolve.Model;
using NetSolve.Presentation;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Presentation.Solution;
using NetSolve.Rendering.Map;
using NetSolve.Rendering.Report;
using NetSolve.Solving;

namespace NetSolve.Tests.Rendering;

/// <summary>The map and the report show every value exactly as the solve table does: one registry, one number style.</summary>
public partial class SameTextAsTheTablesTests
{
    /// <summary>The metrics a unit's row of the report shows; the status is compared by its word.</summary>
    private static readonly string[] ReportMetrics =
        ["label", "status", "servers", "arrival_rate", "utilisation", "p_wait", "mean_wait", "mean_time_in_unit", "headroom"];

    public static TheoryData<string> KestrelUnits => new(RenderingFixtures.Example("kestrel-general").Units.Select(unit => unit.Id));

    [Theory]
    [MemberData(nameof(KestrelUnits))]
    public void Each_map_box_shows_servers_utilisation_wait_and_status_as_the_solve_table_does(string id)
    {
        var solution = RenderingFixtures.Solved("kestrel-general");
        var unit = solution.Units.Single(u => u.Unit.Id == id);
        var box = SvgMap.Parse(SvgMapWriter.WriteString(MapLayoutBuilder.Build(solution))).Unit(id);
        var texts = box.Texts.Select(t => t.Text).ToList();
        string row = SolveTableRow(solution, id);

        string servers = TableText(UnitColumns.Servers, solution, unit);
        Assert.Contains(servers, row, StringComparison.Ordinal);
        Assert.Contains(servers + (unit.Unit.Servers.Count == 1 ? " server" : " servers"), texts, StringComparer.Ordinal);
        Assert.Contains(HarbourLightsPalette.For(unit.Status).Glyph + " " + StatusWords.Name(unit.Status), texts, StringComparer.Ordinal);
        Assert.EndsWith(StatusWords.Name(unit.Status), row, StringComparison.Ordinal);
        if (unit.Unit.Servers.IsUnlimited)
        {
            // A unit with unlimited servers never waits: the box says so in words and shows no utilisation.
            Assert.Contains("no wait", texts, StringComparer.Ordinal);
            return;
        }

        foreach (var (column, prefix, suffix) in new[] { (UnitColumns.Utilisation, string.Empty, " busy"), (UnitColumns.MeanWait, "wait ", string.Empty) })
        {
            string shown = TableText(column, solution, unit);
            Assert.Contains(shown, row, StringComparison.Ordinal);
            Assert.Contains(prefix + shown + suffix, texts, StringComparer.Ordinal);
        }
    }

    [Theory]
    [MemberData(nameof(KestrelUnits))]
    public void Each_report_row_shows_every_metric_as_the_solve_table_does(string id)
    {
        var solution = RenderingFixtures.Solved("kestrel-general");
        var unit = solution.Units.Single(u => u.Unit.Id == id);
        var cells = ReportRow(HtmlReport.Write(solution), id);
        string row = SolveTableRow(solution, id);

        Assert.Equal(ReportMetrics, cells.Keys.ToArray());
        Assert.Equal(unit.Unit.Label, cells["label"]);
        Assert.Equal(HarbourLightsPalette.For(unit.Status).Glyph + " " + StatusWords.Name(unit.Status), cells["status"]);
        foreach (var column in UnitColumns.All.Where(c => cells.ContainsKey(c.Id) && c.Id is not "label" and not "status"))
        {
            string shown = TableText(column, solution, unit);
            Assert.Contains(shown, row, StringComparison.Ordinal);
            Assert.Equal(shown, cells[column.Id]);
        }
    }

    [Fact]
    public void A_unit_with_1200_servers_shows_1_200_on_the_map_in_the_dot_and_in_the_report_as_in_the_table()
    {
        var network = RenderingFixtures.Example("kestrel-general");
        network = network with { Units = [.. network.Units.Select(u => u.Id == "surgical_ward" ? u with { Servers = Servers.Of(1200) } : u)] };
        var solution = NetworkSolver.Solve(network);
        var layout = MapLayoutBuilder.Build(solution);

        // Source: PeopleFormat groups numbers from 1,000 by thousands, in tables, report and map alike.
        Assert.Contains("1,200", SolveTableRow(solution, "surgical_ward"), StringComparison.Ordinal);
        Assert.Contains("1,200 servers", SvgMap.Parse(SvgMapWriter.WriteString(layout)).Unit("surgical_ward").Texts.Select(t => t.Text), StringComparer.Ordinal);
        Assert.Contains("1,200 servers", DotMapWriter.Write(layout), StringComparison.Ordinal);
        Assert.Equal("1,200", ReportRow(HtmlReport.Write(solution), "surgical_ward")["servers"]);
    }

    [Fact]
    public void A_tiny_wait_shows_without_an_exponent_on_the_map_and_in_the_report()
    {
        // An invented clinic with 50 rooms at 10% load (5 erlangs): Erlang C is of the order of 5^50/50! e^-5, about 1e-32,
        // so the mean wait is far below anything to plan with.
        var network = NetSolve.Tests.Simulation.TestNetworks.Single(NetSolve.Tests.Simulation.TestNetworks.Unit("clinic", 50, 0.5), 10.0);
        var solution = NetworkSolver.Solve(network);
        Assert.True(solution.Units[0].MeanWaitHours < 1e-12);

        // Source: PeopleFormat, times below 0.001 min are written as "< 0.001 min", never as 1E-40.
        Assert.Contains("wait < 0.001 min", SvgMap.Parse(SvgMapWriter.WriteString(MapLayoutBuilder.Build(solution))).Unit("clinic").Texts.Select(t => t.Text), StringComparer.Ordinal);
        Assert.Equal("< 0.001 min", ReportRow(HtmlReport.Write(solution), "clinic")["mean_wait"]);
    }

    /// <summary>What the solve table shows for <paramref name="column"/> of <paramref name="unit"/>: the registry's cell in PeopleFormat.</summary>
    private static string TableText(Column<UnitResult> column, NetworkSolution solution, UnitResult unit) =>
        PeopleFormat.Cell(column.Read(unit), solution.Network.TimeUnit);

    /// <summary>The line of the solve table (for people) that starts with the unit's id.</summary>
    private static string SolveTableRow(NetworkSolution solution, string id)
    {
        using var table = new StringWriter();
        SolutionTableWriter.Write(solution, table);
        return table.ToString().Split('\n').Single(line => line.StartsWith(id + " ", StringComparison.Ordinal)).TrimEnd();
    }

    /// <summary>The unit table's cells of one unit, by the contract id in their <c>data-metric</c>, in page order.</summary>
    private static Dictionary<string, string> ReportRow(string html, string id)
    {
        int table = html.IndexOf("<table id=\"unit-table\">", StringComparison.Ordinal);
        var row = new Regex($"<tr data-unit=\"{id}\">(.*?)</tr>").Match(html, table);
        Assert.True(row.Success, $"no row for {id}");
        return CellRegex().Matches(row.Value).ToDictionary(m => m.Groups[1].Value, m => System.Net.WebUtility.HtmlDecode(m.Groups[2].Value), StringComparer.Ordinal);
    }

    [GeneratedRegex("<td data-metric=\"([^\"]+)\"[^>]*>(.*?)</td>")]
    private static partial Regex CellRegex();
}
