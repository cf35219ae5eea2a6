using NetSolve.Scenarios;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Journeys;

public sealed class JourneyScenarioTests
{
    [Fact]
    public void A_changed_network_keeps_its_journeys_and_a_closed_unit_leaves_them()
    {
        var network = TestNetworks.Example("kestrel-general.yaml");

        var changed = NetworkEditor.Apply(network, [new CloseUnit(default, "imaging", "lab")], default).Network!;

        var journey = Assert.Single(changed.Journeys);
        Assert.Equal(["emergency", "lab"], journey.UnitIds);
        Assert.Equal([4.0, 12.0], journey.OverHours);
    }
}
