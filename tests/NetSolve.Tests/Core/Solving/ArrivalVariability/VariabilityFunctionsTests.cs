using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Variability;

/// <summary>
/// The variability-function option of the arrival variability (docs/methods.md, "Variability functions"): each unit's
/// arrival SCV from the two-moment equations evaluated at the time scale of its own queue.
/// </summary>
public sealed class VariabilityFunctionsTests
{
    // Closed form of the correlation function of stationary reflected Brownian motion (J. Abate and W. Whitt,
    // Stochastic Models 4(3), 1988, from memory): c*(0) = 1 and c*(1) = 4(φ(1) − Φᶜ(1)), with the standard normal
    // table values φ(1) = 0.24197072451914337 and Φᶜ(1) = 0.15865525393145707 (any statistics textbook).
    [Fact]
    public void The_correlation_function_of_reflected_brownian_motion_takes_its_closed_form_values()
    {
        Assert.Equal(1.0, VariabilityFunctions.BrownianCorrelation(0.0), 1e-15);
        Assert.Equal(4.0 * (0.24197072451914337 - 0.15865525393145707), VariabilityFunctions.BrownianCorrelation(1.0), 1e-12);
        Assert.Equal(0.0, VariabilityFunctions.BrownianCorrelation(double.PositiveInfinity));
        Assert.True(VariabilityFunctions.BrownianCorrelation(0.5) > VariabilityFunctions.BrownianCorrelation(2.0));
    }

    // Exact by hand from the equations of docs/methods.md: a Poisson stream (1/h) through a single server at load 0.8
    // with service SCV 4, then all of it to a single server at load 0.5 with exponential service. The decomposition
    // gives ca² = 1 + 0.8²·3 = 2.92 at the second unit. Its window is x = 0.5²(2.92 + 1)/(2·1·0.5²) = 1.96 h, the first
    // unit's relaxation time τ = 0.8²(1 + 4)/(1·0.2²) = 80 h, so ω = c*(0.0245) = 0.9585791173392922 (closed form
    // above) and ca² = 1 + 3ω: the short window sees the first unit's service, not its interval mix.
    [Fact]
    public void A_lightly_loaded_unit_behind_a_busy_one_sees_its_service_variability()
    {
        ArrivalVariabilityUnit[] units = [Unit(0.8, 4.0) with { ExternalPerHour = 1.0 }, Unit(0.5, 1.0)];
        ArrivalVariabilityRoute[] routes = [new(0, 1, 1.0)];

        var decomposition = ArrivalVariability.Solve(units, routes, ArrivalVariabilityMethod.Decomposition);
        var functions = ArrivalVariability.Solve(units, routes, ArrivalVariabilityMethod.VariabilityFunctions);

        Assert.Equal(2.92, decomposition.ArrivalScv[1], 1e-12);
        Assert.Equal(1.0 + (3.0 * 0.9585791173392922), functions.ArrivalScv[1], 1e-9);
        Assert.Equal(1.0, functions.ArrivalScv[0]);
        Assert.Equal(decomposition.DepartureScv, functions.DepartureScv);
    }

    // The two limits the variability functions interpolate between: a destination much busier than its source looks
    // over a long window and sees the source's arrivals (Poisson here: ca² → 1, the asymptotic method, W. Whitt,
    // Operations Research 30(1), 1982, from memory); a source much busier than its destination passes on its full
    // service variability (ca² → 4, the heavy-traffic bottleneck limit, Suresh and Whitt, Operations Research
    // Letters 9(6), 1990, pp. 355–362, from memory). The decomposition gives 1 + ρ²·3 whatever the destination's load.
    [Theory]
    [InlineData(0.5, 0.999, 1.0, 0.01)]
    [InlineData(0.9, 0.5, 4.0, 0.15)]
    public void The_arrival_scv_tends_to_the_asymptotic_and_the_bottleneck_limits(double sourceLoad, double destinationLoad, double limit, double tolerance)
    {
        ArrivalVariabilityUnit[] units = [Unit(sourceLoad, 4.0) with { ExternalPerHour = 1.0 }, Unit(destinationLoad, 1.0)];

        var functions = ArrivalVariability.Solve(units, [new(0, 1, 1.0)], ArrivalVariabilityMethod.VariabilityFunctions);

        Assert.Equal(limit, functions.ArrivalScv[1], tolerance);
        Assert.True(Math.Abs(1.0 + (3.0 * sourceLoad * sourceLoad) - limit) > tolerance, "the decomposition is not already at the limit");
    }

    // Jackson's network (any loop, Poisson arrivals, exponential service): every constant term of every system is 0,
    // so every arrival SCV is exactly 1, as with the decomposition.
    [Fact]
    public void Poisson_arrivals_and_exponential_service_give_exactly_1_everywhere()
    {
        ArrivalVariabilityUnit[] units = [Unit(0.6, 1.0) with { ExternalPerHour = 1.0 }, Unit(0.9, 1.0, servers: 3), Unit(0.3, 1.0)];
        ArrivalVariabilityRoute[] routes = [new(0, 1, 0.7), new(1, 2, 0.5), new(2, 0, 0.4), new(1, 0, 0.2)];

        var functions = ArrivalVariability.Solve(units, routes, ArrivalVariabilityMethod.VariabilityFunctions);

        Assert.All(functions.ArrivalScv, scv => Assert.Equal(1.0, scv));
    }

    // Unlimited servers keep no queue, so their departures carry their arrivals (ω = 0; with the Markovian-departures
    // option no chain is built for them): regular arrivals (c0² = 0.25) through an unlimited unit reach the next unit
    // unchanged, as in the decomposition.
    [Theory]
    [InlineData(ArrivalVariabilityMethod.VariabilityFunctions)]
    [InlineData(ArrivalVariabilityMethod.MarkovianDepartures)]
    public void A_unit_with_unlimited_servers_passes_its_arrivals_on(ArrivalVariabilityMethod method)
    {
        ArrivalVariabilityUnit[] units =
        [
            new ArrivalVariabilityUnit(1.0, Servers.Unlimited, 0.0, 4.0) { ExternalPerHour = 1.0, ExternalScv = 0.25 },
            Unit(0.7, 1.0),
        ];

        var solution = ArrivalVariability.Solve(units, [new(0, 1, 1.0)], method);

        Assert.Equal(0.25, solution.ArrivalScv[1], 1e-12);
    }

    private static ArrivalVariabilityUnit Unit(double utilisation, double serviceScv, int servers = 1) =>
        new(1.0, Servers.Of(servers), utilisation, serviceScv);
}
