using System.Text.Json;
using NetSolve.Model;
using NetSolve.Presentation.Solution;
using NetSolve.Solving;
using NetSolve.Tests.Core.Solving.Groups;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Presentation;

/// <summary>The patient groups in the output of <c>solve</c>: the JSON <c>groups</c> array and the table for people.</summary>
public class GroupOutputTests
{
    private const double Tolerance = 1e-9;

    public static TheoryData<string> ExampleFiles() => TestNetworks.ExampleFiles();

    // Exact by hand: one group holding all the arrivals and following the network's routes is the network itself
    // (groups' arrivals are Poisson, so the top-level streams are made Poisson too); every unit object is the same.
    [Theory]
    [MemberData(nameof(ExampleFiles))]
    public void One_group_holding_every_arrival_gives_the_same_units_as_the_arrivals_at_top_level(string file)
    {
        var example = TestNetworks.Example(file);
        var topLevel = example with { Groups = [], Arrivals = [.. example.Arrivals.Select(arrival => arrival with { Cv = 1.0 })] };
        var inGroup = GroupResultsTests.OnlyGroupArrivals(topLevel);

        using var expected = Json(NetworkSolver.Solve(topLevel));
        using var actual = Json(NetworkSolver.Solve(inGroup));

        var expectedUnits = expected.RootElement.GetProperty("units").EnumerateArray().Select(unit => unit.GetRawText()).ToList();
        var actualUnits = actual.RootElement.GetProperty("units").EnumerateArray().Select(unit => unit.GetRawText()).ToList();
        Assert.Equal(expectedUnits, actualUnits);
        Assert.False(expected.RootElement.TryGetProperty("groups", out _));
        Assert.Equal("all", Assert.Single(actual.RootElement.GetProperty("groups").EnumerateArray()).GetProperty("id").GetString());
    }

    // Source: docs/network-file.md, "Patient groups in the output": no groups, no "groups" key and no group table.
    [Theory]
    [MemberData(nameof(ExampleFiles))]
    public void A_network_without_groups_has_no_groups_key_and_no_group_table(string file)
    {
        var solution = NetworkSolver.Solve(TestNetworks.Example(file) with { Groups = [] });

        using var json = Json(solution);

        Assert.False(json.RootElement.TryGetProperty("groups", out _));
        Assert.DoesNotContain("Patient groups", Written.Text(output => SolutionTableWriter.Write(solution, output)), StringComparison.Ordinal);
    }

    // Exact by hand (GroupResultsTests): the day group's time in network is 14/3 h, its patients 7/3, visits 1, 0, 1;
    // the fields in the order of docs/network-file.md.
    [Fact]
    public void The_groups_array_gives_each_groups_fields_and_its_visits_to_every_unit()
    {
        var solution = NetworkSolver.Solve(TestNetworks.Parse(GroupResultsTests.TwoGroups));

        using var json = Json(solution);

        var groups = json.RootElement.GetProperty("groups").EnumerateArray().ToList();
        Assert.Equal(2, groups.Count);
        var day = groups[1];
        Assert.Equal(
            ["id", "label", "external_arrival_rate", "throughput", "mean_time_in_network", "mean_in_network", "visits"],
            Written.FieldNames(day));
        Assert.Equal("day", day.GetProperty("id").GetString());
        Assert.Equal("Day cases", day.GetProperty("label").GetString());
        Assert.Equal(0.5, day.GetProperty("external_arrival_rate").GetDouble(), Tolerance);
        Assert.Equal(0.5, day.GetProperty("throughput").GetDouble(), Tolerance);
        Assert.Equal(14.0 / 3.0, day.GetProperty("mean_time_in_network").GetDouble(), Tolerance);
        Assert.Equal(7.0 / 3.0, day.GetProperty("mean_in_network").GetDouble(), Tolerance);
        Assert.Equal(["a", "b", "c"], Written.FieldNames(day.GetProperty("visits")));
        Assert.Equal([1.0, 0.0, 1.0], day.GetProperty("visits").EnumerateObject().Select(visit => visit.Value.GetDouble()));
    }

    // Exact by hand: in a file in minutes the day group's 14/3 h is 280 min and its 0.5/h is 1/120 per minute.
    [Fact]
    public void Group_times_and_rates_are_in_the_files_time_unit()
    {
        var network = TestNetworks.Parse(GroupResultsTests.TwoGroups) with { TimeUnit = TimeUnit.Minute };

        using var json = Json(NetworkSolver.Solve(network));

        var day = json.RootElement.GetProperty("groups")[1];
        Assert.Equal(280.0, day.GetProperty("mean_time_in_network").GetDouble(), Tolerance);
        Assert.Equal(1.0 / 120.0, day.GetProperty("external_arrival_rate").GetDouble(), Tolerance);
    }

    // Exact by hand: the day row shows 0.5/h twice, 4.667 h (14/3) and 2.333 patients (7/3); the default row 1/h, 3 h and
    // 3 patients (a whole count is shown without decimals).
    [Fact]
    public void The_table_for_people_lists_the_groups_under_the_units()
    {
        var solution = NetworkSolver.Solve(TestNetworks.Parse(GroupResultsTests.TwoGroups));

        string table = Written.Text(output => SolutionTableWriter.Write(solution, output));

        Assert.True(table.IndexOf("Patient groups", StringComparison.Ordinal) > table.IndexOf("\nc ", StringComparison.Ordinal));
        Assert.Equal(["day", "0.5000", "0.5000", "4.667", "h", "2.333"], Written.Cells(table, "day"));
        Assert.Equal(["default", "1.000", "1.000", "3.000", "h", "3"], Written.Cells(table, "default"));
    }

    // Source: docs/network-file.md, "Patient groups in the output": the field table lists every field of a group.
    [Fact]
    public void Every_group_field_is_documented_in_the_contract()
    {
        string text = File.ReadAllText(Path.Combine(RepositoryRoot(), "docs", "network-file.md"));
        int start = text.IndexOf("| group field | meaning |", StringComparison.Ordinal);
        Assert.True(start >= 0, "the groups' field table was not found");
        var documented = text[start..].Split('\n').Skip(2).TakeWhile(line => line.StartsWith('|'))
            .Select(line => line.Split('|', StringSplitOptions.TrimEntries)[1]).ToList();

        Assert.Equal([.. GroupColumns.All.Select(column => column.Id), GroupColumns.VisitsId], documented);
    }

    private static string RepositoryRoot()
    {
        var directory = new DirectoryInfo(AppContext.BaseDirectory);
        while (directory is not null && !File.Exists(Path.Combine(directory.FullName, "NetSolve.sln")))
        {
            directory = directory.Parent;
        }

        return directory?.FullName ?? throw new InvalidOperationException("NetSolve.sln not found above the test output folder");
    }

    private static JsonDocument Json(NetworkSolution solution) => Written.Json(output => SolutionJsonWriter.Write(solution, output));
}
