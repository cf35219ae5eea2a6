using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Targets;

public sealed class StaffTargetsTests
{
    private static NetworkSolution Ashcombe() => NetworkSolver.Solve(NetworkReader.ReadFile(TestFiles.Network("ashcombe-targets")).Network!);

    private static Network WithServers(Network network, string id, int servers) => network with
    {
        Units = [.. network.Units.Select(unit => unit.Id == id
            ? unit with { Servers = Servers.Of(servers), Capacity = unit.Capacity + (servers - unit.Servers.Count) }
            : unit)],
    };

    [Fact]
    public void Staffing_meets_every_units_own_targets_and_one_server_fewer_anywhere_breaks_one()
    {
        // Source: brute force by the solver itself: the staffed network solved again meets every target, and taking
        // one added server away from any unit misses one (so the search added no server too many).
        var plan = StaffingSearch.MeetTargets(Ashcombe(), new StaffingTargets(), null, null);

        Assert.True(plan.IsFeasible);
        Assert.All(plan.After!.Units, unit => Assert.Empty(unit.TargetsBreached));
        Assert.All(plan.After.Units, unit => Assert.True(unit.IsStable));
        var changed = plan.Units.Where(unit => unit.Added > 0).ToList();
        Assert.Equal(["emergency", "critical_care", "assessment_ward"], changed.Select(unit => unit.UnitId), StringComparer.Ordinal);
        foreach (var unit in changed)
        {
            var fewer = NetworkSolver.Solve(WithServers(plan.After.Network, unit.UnitId, unit.RequiredServers!.Value - 1));
            Assert.NotEmpty(fewer.Units.Single(result => result.Unit.Id == unit.UnitId).TargetsBreached);
        }
    }

    [Fact]
    public void Only_the_chosen_units_are_changed()
    {
        var plan = StaffingSearch.MeetTargets(Ashcombe(), new StaffingTargets(), null, new HashSet<string>(["critical_care"], StringComparer.Ordinal));

        Assert.All(plan.Units.Where(unit => unit.UnitId != "critical_care"), unit => Assert.Equal(0, unit.Added));
        Assert.True(plan.Units.Single(unit => unit.UnitId == "critical_care").Added > 0);
        Assert.Empty(plan.After!.Units.Single(unit => unit.Unit.Id == "critical_care").TargetsBreached);
        Assert.NotEmpty(plan.After.Units.Single(unit => unit.Unit.Id == "emergency").TargetsBreached);
    }

    [Fact]
    public void A_target_for_every_unit_and_a_units_own_both_hold_so_the_stricter_wins()
    {
        // Exact by hand: critical care's own 1 h against 30 min for all units: 30 min must be met.
        var unit = new Unit("icu", "icu", Servers.Of(6), 48.0) { Targets = new UnitTargets(MaxMeanWaitHours: 1.0) };

        Assert.Equal(0.5, new StaffingTargets(MaxMeanWaitHours: 0.5).For(unit).MaxMeanWaitHours);
        Assert.Equal(1.0, new StaffingTargets(MaxMeanWaitHours: 2.0).For(unit).MaxMeanWaitHours);
    }

    [Fact]
    public void Staff_reads_the_files_targets_and_limits_its_changes_with_only()
    {
        var (code, output, _) = CliRun.Run("staff", TestFiles.Network("ashcombe-targets"), "--only", "critical_care,imaging", "--format", "csv");

        Assert.Equal(0, code);
        var rows = output.Split('\n', StringSplitOptions.RemoveEmptyEntries).Skip(1).ToList();
        Assert.Contains(rows, row => row.StartsWith("emergency,12,12,0,", StringComparison.Ordinal));
    }

    [Fact]
    public void Staff_without_any_target_is_a_usage_error()
    {
        var (code, _, error) = CliRun.Run("staff", TestFiles.Network("kestrel-general"));

        Assert.Equal(2, code);
        Assert.Contains("'targets' section", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Only_naming_a_unit_the_network_lacks_is_invalid_input()
    {
        var (code, _, error) = CliRun.Run("staff", TestFiles.Network("ashcombe-targets"), "--only", "critcal_care");

        Assert.Equal(1, code);
        Assert.Contains("did you mean 'critical_care'?", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Budget_with_cost_is_accepted_and_spends_at_most_the_budget()
    {
        var (code, output, error) = CliRun.Run("staff", TestFiles.Network("kestrel-general"), "--budget", "10", "--cost", "critical_care=3", "--cost", "emergency=1.5");

        Assert.True(code == 0, error);
        Assert.Contains("cost of the servers placed 10.00 of a budget of 10", output, StringComparison.Ordinal);
    }
}
