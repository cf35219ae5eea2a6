using System.Globalization;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Staffing;
using NetSolve.Solving;
using NetSolve.Tests.Analysis;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Presentation.Staffing;

public sealed class StaffingOutputTests
{
    [Fact]
    public void The_registry_ids_are_the_json_fields_in_the_order_written()
    {
        var plan = Plan(new StaffingTargets(MaxMeanWaitHours: 0.5, WaitTail: new WaitTailTarget(0.25, 0.2)));

        using var json = Written.Json(output => StaffingOutput.WriteJson(plan, output));
        var root = json.RootElement;

        Assert.Equal(["network", "time_unit", "targets", "feasible", .. Written.MachineIds(StaffingTotalsColumns.All), "units"], Written.FieldNames(root));
        Assert.Equal(Written.MachineIds(StaffingTargetColumns.All), Written.FieldNames(root.GetProperty("targets")));
        Assert.All(root.GetProperty("units").EnumerateArray(), unit => Assert.Equal(Written.MachineIds(StaffingColumns.Json), Written.FieldNames(unit)));
    }

    [Fact]
    public void The_csv_header_is_the_registry_ids_and_the_contract_header()
    {
        var plan = Plan(new StaffingTargets(MaxMeanWaitHours: 0.5));

        string csv = Written.Text(output => StaffingOutput.WriteCsv(plan, output));

        Assert.Equal(StaffingOutput.TargetsCsvHeader, string.Join(',', Written.MachineIds(StaffingColumns.Csv)));
        Assert.Equal(StaffingOutput.TargetsCsvHeader, csv.Split('\n')[0]);
    }

    [Fact]
    public void The_table_shows_each_wait_with_its_own_unit_and_no_unit_in_the_header()
    {
        // Exact by hand: desk is M/M/1 with λ = 0.5/h, S = 1 h, so Wq = ρ/(μ − λ) = 1 h; with 2 servers
        // Wq = C/(cμ − λ) = 0.1/1.5 h = 4 min (as in StaffingSearchTests). A 0.5 h target reads 30 min.
        var plan = Plan(new StaffingTargets(MaxMeanWaitHours: 0.5));

        string table = Written.Text(output => StaffingOutput.WriteTable(plan, output));

        Assert.Contains("every unit is stable, mean wait <= 30.00 min  (rates per hour)", table, StringComparison.Ordinal);
        Assert.Contains("  wait now  ", table, StringComparison.Ordinal);
        Assert.DoesNotContain("(h)", table, StringComparison.Ordinal);
        Assert.Equal(["desk", "1", "2", "1", "1.000", "50.0%", "25.0%", "1.000", "h", "4.000", "min", "-"], Written.Cells(table, "desk"));
    }

    [Fact]
    public void The_table_shows_a_tiny_wait_without_an_exponent()
    {
        // Exact by hand: bay has c = 10, a = 1: Erlang B = (1/10!) / Σ_{k≤10} 1/k! = 1.0138e-7, C = B / (1 − 0.1(1 − B))
        // = 1.1264e-7, Wq = C / (cμ − λ) = 1.2516e-8 h = 7.5e-7 min, below the people's smallest time (0.001 min).
        var plan = Plan(new StaffingTargets(MaxMeanWaitHours: 0.5));

        string table = Written.Text(output => StaffingOutput.WriteTable(plan, output));

        Assert.Equal(["bay", "10", "10", "0", "0", "10.0%", "10.0%", "<", "0.001", "min", "<", "0.001", "min", "-"], Written.Cells(table, "bay"));
        Assert.DoesNotMatch(@"\dE[-+]?\d", table);
    }

    [Fact]
    public void A_unit_without_a_limit_needs_unlimited_servers_for_people_and_none_for_programs()
    {
        var plan = Plan(new StaffingTargets(MaxMeanWaitHours: 0.5));

        string table = Written.Text(output => StaffingOutput.WriteTable(plan, output));
        var csv = CsvRows.Parse(Written.Text(output => StaffingOutput.WriteCsv(plan, output)));
        using var json = Written.Json(output => StaffingOutput.WriteJson(plan, output));

        Assert.Equal(["lounge", "unlimited", "unlimited"], Written.Cells(table, "lounge")[..3]);
        Assert.Equal(["lounge", "unlimited", string.Empty], csv[3][..3]);
        Assert.Equal(System.Text.Json.JsonValueKind.Null, json.RootElement.GetProperty("units")[2].GetProperty("required").ValueKind);
    }

    [Fact]
    public void Csv_and_json_keep_the_file_time_unit_at_full_precision()
    {
        // Exact by hand: desk's wait with 2 servers is 1/15 h (see above); the file is in hours.
        var plan = Plan(new StaffingTargets(MaxMeanWaitHours: 0.5));

        var csv = CsvRows.Parse(Written.Text(output => StaffingOutput.WriteCsv(plan, output)));
        using var json = Written.Json(output => StaffingOutput.WriteJson(plan, output));

        Assert.Equal(1.0 / 15.0, double.Parse(csv[1][9], CultureInfo.InvariantCulture), 1e-12);
        Assert.Equal("hour", csv[1][12]);
        Assert.Equal(1.0 / 15.0, json.RootElement.GetProperty("units")[0].GetProperty("mean_wait_after").GetDouble(), 1e-12);
        Assert.Equal(0.5, json.RootElement.GetProperty("targets").GetProperty("max_mean_wait").GetDouble());
    }

    [Fact]
    public void The_described_targets_show_times_in_the_unit_that_reads_best()
    {
        var targets = new StaffingTargets(0.85, 0.5, 72.0, new WaitTailTarget(4.0, 0.05));

        Assert.Equal("stable, utilisation <= 85.0%, mean wait <= 30.00 min, mean time in unit <= 3.000 d, P(wait > 4.000 h) <= 5.0%", StaffingOutput.Describe(targets, TimeUnit.Minute));
    }

    /// <summary>A desk that needs a second server for a half-hour wait, a lightly loaded bay, and a lounge without a limit.</summary>
    internal static StaffingPlan Plan(StaffingTargets targets) =>
        StaffingSearch.MeetTargets(NetworkSolver.Solve(Network()), targets);

    internal static Network Network() => SmallNetworks.Build(
        [("desk", 1, 1.0), ("bay", 10, 1.0), ("lounge", 0, 2.0)],
        [("desk", 0.5), ("bay", 1.0)],
        [("desk", "lounge", 1.0)]);
}
