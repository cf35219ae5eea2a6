using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Variability;

/// <summary>The Markovian-departures option of the arrival variability (docs/methods.md, "Published refinements tried on the two units not closer").</summary>
public sealed class MarkovianDeparturesTests
{
    // Jackson's network (Poisson arrivals, exponential service, a loop): by Burke's theorem (P. J. Burke, Operations
    // Research 4(6), 1956) the departures of each M/M/c queue in series are Poisson, so every stream has index 1 at
    // every window and every arrival SCV is 1 (up to the truncation of the chains).
    [Fact]
    public void Poisson_arrivals_and_exponential_service_give_1_everywhere()
    {
        ArrivalVariabilityUnit[] units = [Unit(0.6, 1.0) with { ExternalPerHour = 1.0 }, Unit(0.9, 1.0, servers: 3), Unit(0.3, 1.0)];
        ArrivalVariabilityRoute[] routes = [new(0, 1, 0.7), new(1, 2, 0.5), new(2, 0, 0.4), new(1, 0, 0.2)];

        var solution = ArrivalVariability.Solve(units, routes, ArrivalVariabilityMethod.MarkovianDepartures);

        Assert.All(solution.ArrivalScv, scv => Assert.Equal(1.0, scv, 1e-6));
    }

    // A nearly saturated destination looks over a very long window, where a stable queue's departures vary as its
    // arrivals do (Poisson here): ca² → 1, the asymptotic method's value (W. Whitt, Operations Research 30(1), 1982,
    // from memory), where the decomposition keeps 1 + ρ²(cs² − 1) = 1.75 whatever the destination's load.
    [Fact]
    public void A_nearly_saturated_unit_sees_the_arrivals_of_the_queue_before_it()
    {
        ArrivalVariabilityUnit[] units = [Unit(0.5, 4.0) with { ExternalPerHour = 1.0 }, Unit(0.999, 1.0)];

        var decomposition = ArrivalVariability.Solve(units, [new(0, 1, 1.0)], ArrivalVariabilityMethod.Decomposition);
        var markovian = ArrivalVariability.Solve(units, [new(0, 1, 1.0)], ArrivalVariabilityMethod.MarkovianDepartures);

        Assert.Equal(1.75, decomposition.ArrivalScv[1], 1e-12);
        Assert.Equal(1.0, markovian.ArrivalScv[1], 0.01);
        Assert.Equal(decomposition.DepartureScv, markovian.DepartureScv);
    }

    private static ArrivalVariabilityUnit Unit(double utilisation, double serviceScv, int servers = 1) =>
        new(1.0, Servers.Of(servers), utilisation, serviceScv);
}
