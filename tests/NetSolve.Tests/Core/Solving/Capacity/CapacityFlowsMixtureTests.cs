using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Capacity;

public sealed class CapacityFlowsMixtureTests
{
    // Exact by hand: a loss unit of 2 beds offered 1/h of 1 h stays and 1/h of 3 h stays has a mean stay of 2 h, so
    // a = 4 erlangs and B(2, 4) = (4²/2)/(1 + 4 + 8) = 8/13 (Erlang loss, insensitive to the mixture's shape). With the
    // unit's own 1 h mean it would be B(2, 2) = 2/5.
    [Fact]
    public void A_loss_unit_blocks_by_the_mean_stay_of_the_groups_offered_to_it()
    {
        var unit = new Unit("short_stay", "short stay", Servers.Of(2), 1.0) { Capacity = 2 };
        var group = new PatientGroup("frail", "frail", [new Arrival("short_stay", 1.0)])
        {
            Services = [new GroupService("short_stay", ServiceDistribution.Exponential(3.0))],
        };
        var network = new Network("Mixture test", TimeUnit.Hour, [unit], [new Arrival("short_stay", 1.0)], []) { Groups = [group] };

        var row = CapacityFlows.Solve(network).Units[0];

        Assert.Equal(8.0 / 13.0, row.FullProbability, 1e-12);
        Assert.Equal(2.0, row.MeanServiceHours, 1e-12);
        Assert.Equal(8.0 / 13.0, NetworkSolver.Solve(network).Units[0].PFull, 1e-12);
    }

    // Exact by hand: mixing 1 h and 3 h exponential stays in equal shares gives E[S] = 2, E[S²] = (2 + 18)/2 = 10, so
    // cs² = 10/4 − 1 = 1.5; a unit with waiting places then uses the two-moment M/G/c/K method.
    [Fact]
    public void A_unit_with_waiting_places_takes_the_mixture_variability()
    {
        var unit = new Unit("assessment", "assessment", Servers.Of(2), 1.0) { Capacity = 4 };
        var group = new PatientGroup("frail", "frail", [new Arrival("assessment", 0.4)])
        {
            Services = [new GroupService("assessment", ServiceDistribution.Exponential(3.0))],
        };
        var network = new Network("Mixture test", TimeUnit.Hour, [unit], [new Arrival("assessment", 0.4)], []) { Groups = [group] };
        var expected = FiniteCapacityFormulas.Solve(2, 4, 0.8, 2.0, 1.5, null);

        var row = CapacityFlows.Solve(network).Units[0];

        Assert.Equal(1.5, row.ServiceScv, 1e-12);
        Assert.Equal(expected.FullProbability, row.FullProbability, 1e-12);
        Assert.Equal(FiniteCapacityFormulas.TwoMomentMethod, row.Metrics!.Method);
    }
}
