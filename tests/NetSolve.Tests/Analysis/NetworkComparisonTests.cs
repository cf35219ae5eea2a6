using NetSolve.Analysis;
using NetSolve.Solving;
using NetSolve.Tests.Scenarios;

namespace NetSolve.Tests.Analysis;

public sealed class NetworkComparisonTests
{
    [Fact]
    public void Comparing_a_network_with_itself_shows_no_change()
    {
        foreach (string file in new[] { "harbourside.yaml", "kestrel-general.yaml", "fenwick-winter-surge.yaml", "millbrook-clinic.yaml" })
        {
            var solution = NetworkSolver.Solve(SmallNetworks.Example(file));
            var again = NetworkSolver.Solve(SmallNetworks.Example(file));
            var scenario = NetworkComparison.Compare("base", solution, [("same", again)]).Scenarios.Single();
            Assert.Empty(scenario.StatusChanges);
            Assert.All(scenario.Units, unit =>
            {
                Assert.True(unit.Utilisation.IsUnchanged);
                Assert.True(unit.MeanWaitHours.IsUnchanged);
                Assert.True(unit.MeanTimeInUnitHours.IsUnchanged);
                Assert.True(unit.Servers.IsUnchanged);
            });
            Assert.True(scenario.MeanTimeInSystemHours.IsUnchanged);
        }
    }

    [Fact]
    public void Changes_are_scenario_minus_base_absolute_and_relative()
    {
        // Exact by hand: c = 1, S = 1 h, λ = 0.5/h: Wq = ρ/(μ − λ) = 1 h. With two servers Wq = 1/15 h (C = 0.1, cμ − λ = 1.5).
        var before = NetworkSolver.Solve(SmallNetworks.Build([("clinic", 1, 1.0)], [("clinic", 0.5)]));
        var after = NetworkSolver.Solve(SmallNetworks.Build([("clinic", 2, 1.0)], [("clinic", 0.5)]));
        var unit = NetworkComparison.Compare("base", before, [("two", after)]).Scenarios[0].Units[0];
        Assert.Equal(1.0 / 15.0 - 1.0, unit.MeanWaitHours.Absolute!.Value, 1e-12);
        Assert.Equal((1.0 / 15.0) - 1.0, unit.MeanWaitHours.Relative!.Value, 1e-12); // before is 1 h
        Assert.Equal(-0.25, unit.Utilisation.Absolute!.Value, 1e-12);
        Assert.Equal(1.0, unit.Servers.Absolute);
    }

    [Fact]
    public void Added_and_closed_units_appear_with_one_side_empty_and_the_new_bottleneck_is_named()
    {
        var network = SmallNetworks.Example("harbourside.yaml");
        var scenario = NetSolve.Scenarios.NetworkEditor.Apply(network,
            [
                new NetSolve.Scenarios.CloseUnit(default, "discharge_lounge", null),
                new NetSolve.Scenarios.SetServers(default, "ward", NetSolve.Model.Servers.Of(400)),
            ], default).Network!;
        var result = NetworkComparison.Compare("base", NetworkSolver.Solve(network), [("beds", NetworkSolver.Solve(scenario))]);
        var compared = result.Scenarios[0];
        var lounge = compared.Units.Single(u => u.UnitId == "discharge_lounge");
        Assert.Null(lounge.After);
        Assert.True(lounge.StatusChanged);
        // With 400 beds the ward's headroom (400/(72·λ_ward)) passes imaging's 1.375, which becomes the bottleneck.
        Assert.Equal(["ward"], result.BaseBottlenecks);
        Assert.Equal(["imaging"], compared.Bottlenecks);
    }

    [Fact]
    public void A_what_if_comparison_matches_solving_the_changed_network()
    {
        var network = SmallNetworks.Example("harbourside.yaml");
        var changed = OverrideTests.Apply(network, "servers.ward=320");
        var result = NetworkComparison.Compare("base", NetworkSolver.Solve(network), [("beds", NetworkSolver.Solve(changed))]);
        var ward = result.Scenarios[0].Units.Single(u => u.UnitId == "ward");
        Assert.Equal(300.0, ward.Servers.Before);
        Assert.Equal(320.0, ward.Servers.After);
        Assert.Equal(NetworkSolver.Solve(changed).Units[3].MeanWaitHours, ward.MeanWaitHours.After);
    }
}
