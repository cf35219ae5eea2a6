using NetSolve.Solving;
using NetSolve.Tests.Accuracy;

namespace NetSolve.Tests.Core.Solving.Variability;

/// <summary>
/// The two units of the accuracy study whose two-moment wait is not closer to the simulation than the exponential
/// formula (docs/methods.md, "Measured accuracy against the simulator"), rebuilt from the study's generator so that
/// the diagnosis written there stays true of the code: a change to the arrival-variability equations that moves them
/// fails here and sends the reader back to that section.
/// </summary>
public sealed class LoopedUnitCaseTests
{
    // Exact by hand from the departure and splitting equations of Whitt, BSTJ 62(9), 1983, pp. 2779–2815: u3 of
    // generated network 6 has one inflow, 24% of u2's departures, so its merging weight plays no part and
    // ca²(u3) = 0.24·cd²(u2) + 0.76 with cd²(u2) = 1 + (1 − ρ²)(ca²(u2) − 1) + ρ²(2² − 1) (one server, gamma cv 2).
    // About 1.43, where the simulated wait needs about 1.67 (docs/methods.md).
    [Fact]
    public void The_unit_fed_only_by_a_thinned_flow_gets_the_thinned_departure_scv_of_its_source()
    {
        var solution = NetworkSolver.Solve(AccuracyNetworks.Generate(6));
        var source = solution.Units.Single(unit => unit.Unit.Id == "u2");
        var fed = solution.Units.Single(unit => unit.Unit.Id == "u3");

        double rhoSquared = source.Utilisation * source.Utilisation;
        double departure = 1.0 + ((1.0 - rhoSquared) * (source.ArrivalScv - 1.0)) + (rhoSquared * 3.0);

        Assert.Equal((0.24 * departure) + 0.76, fed.ArrivalScv, 1e-12);
        Assert.InRange(fed.ArrivalScv, 1.42, 1.44);
    }

    // Exact by hand: u1 of generated network 12 merges four streams, each a weighted average near 1 by the same
    // equations, at load 0.36 on 5 servers; the refined merging weight pulls the sum further towards 1. The loop
    // u1 → u4 → u1 correlates the counts (their long-run index of dispersion is about 1.37, worked out from the
    // visit counts of the routing), which renewal two-moment equations cannot carry: ca² stays within 0.02 of 1,
    // where the simulated wait needs about 1.16 (docs/methods.md).
    [Fact]
    public void The_unit_in_a_loop_of_routes_gets_an_arrival_scv_near_1()
    {
        var solution = NetworkSolver.Solve(AccuracyNetworks.Generate(12));
        var looped = solution.Units.Single(unit => unit.Unit.Id == "u1");

        Assert.InRange(looped.ArrivalScv, 0.98, 1.02);
    }

    // The variability-function option (docs/methods.md, "Published refinements tried on the two units not closer"):
    // u3 of network 6 sees more of u2's service variability (its 10 h window is short against u2's 61 h relaxation
    // time, ω = c*(0.165) ≈ 0.79), but not the ca² ≈ 1.67 its simulated wait needs; u1 of network 12 looks over a
    // window shorter than one gap between its arrivals and stays near 1. Measured values, pinned so that the
    // documented outcome stays true of the code.
    [Fact]
    public void Variability_functions_move_the_looped_units_less_than_their_simulated_waits_need()
    {
        var six = NetworkSolver.Solve(AccuracyNetworks.Generate(6), Defaults.StrainThreshold, ArrivalVariabilityMethod.VariabilityFunctions);
        var twelve = NetworkSolver.Solve(AccuracyNetworks.Generate(12), Defaults.StrainThreshold, ArrivalVariabilityMethod.VariabilityFunctions);

        Assert.InRange(six.Units.Single(unit => unit.Unit.Id == "u3").ArrivalScv, 1.55, 1.58);
        Assert.InRange(twelve.Units.Single(unit => unit.Unit.Id == "u1").ArrivalScv, 1.0, 1.04);
    }

    // The Markovian-departures option (docs/methods.md, "Published refinements tried on the two units not closer"):
    // u2 of network 6 (one server, load 0.77, service SCV 4, fed as a renewal flow of ca² 1.05) has departures whose
    // index of dispersion never passes about 2.55 at any window from 6 minutes to 10,000 hours (runs after long
    // services, then the arrivals' 1.05 over long windows), below even the gap SCV 1 − ρ² + ρ²·4 ≈ 2.76 of an M/G/1
    // queue's departures. So no time scale lets 24% of that flow give u3 more than 0.24·2.55 + 0.76 ≈ 1.37, under the
    // decomposition's 1.43 and far from the 1.67 its simulated wait needs: the burstiness u3 sees is not in u2's own
    // queue but in the loops that feed u2. u1 of network 12 looks over 0.13 h, a quarter of one mean gap between its
    // arrivals, where every flow's index is near 1. Measured values, pinned so that the documented outcome stays true.
    [Fact]
    public void Markovian_departures_of_the_source_queue_cannot_reach_the_looped_units_simulated_waits()
    {
        var six = NetworkSolver.Solve(AccuracyNetworks.Generate(6));
        var source = six.Units.Single(unit => unit.Unit.Id == "u2");
        var gaps = PhaseTypeDistribution.FitTwoMoments(1.0 / source.ArrivalsPerHour, source.ArrivalScv);
        var service = PhaseTypeDistribution.FitTwoMoments(source.OfferedLoad / source.ArrivalsPerHour, source.ServiceScv);
        var counts = QueueDepartureProcess.Build(gaps, service, 1, 400).Counts();
        double peak = Enumerable.Range(-8, 41).Max(k => counts.IndexOfDispersion(Math.Pow(10.0, k / 8.0)));

        var markovianSix = NetworkSolver.Solve(AccuracyNetworks.Generate(6), Defaults.StrainThreshold, ArrivalVariabilityMethod.MarkovianDepartures);
        var markovianTwelve = NetworkSolver.Solve(AccuracyNetworks.Generate(12), Defaults.StrainThreshold, ArrivalVariabilityMethod.MarkovianDepartures);

        Assert.InRange(peak, 2.5, 2.6);
        Assert.True((0.24 * peak) + 0.76 < six.Units.Single(unit => unit.Unit.Id == "u3").ArrivalScv, "below the decomposition's value");
        Assert.InRange(markovianSix.Units.Single(unit => unit.Unit.Id == "u3").ArrivalScv, 1.35, 1.39);
        Assert.InRange(markovianTwelve.Units.Single(unit => unit.Unit.Id == "u1").ArrivalScv, 0.98, 1.02);
    }

    // The indices-of-dispersion option (docs/methods.md, "Indices of dispersion through the network"). At u1 of
    // network 12 the loops do come out: the long-run index of its arrival counts is 1.37, the value worked out from
    // the routing's visit counts above; but a unit of 5 servers at load 0.36 looks over about 0.13 h, where the index
    // is only about 1.06, so the equivalent SCV stays near 1.07 (the simulated wait needs about 1.16). At u3 of
    // network 6 the index peaks at about 1.42 near its 10 h window, as the decomposition's SCV: the counts carry no
    // more of u2's bursts than one SCV does. Measured values, pinned so that the documented outcome stays true.
    [Fact]
    public void Indices_of_dispersion_carry_the_loop_but_not_to_the_windows_the_looped_units_look_over()
    {
        var twelve = AccuracyNetworks.Generate(12);
        int u1 = twelve.Units.IndexOf(twelve.Units.Single(unit => unit.Id == "u1"));
        var (units, routes) = FlowsOf(twelve);
        var six = NetworkSolver.Solve(AccuracyNetworks.Generate(6), Defaults.StrainThreshold, ArrivalVariabilityMethod.IndicesOfDispersion);
        var dispersed = NetworkSolver.Solve(twelve, Defaults.StrainThreshold, ArrivalVariabilityMethod.IndicesOfDispersion);

        Assert.InRange(DispersionNetwork.ArrivalDispersion(units, routes, double.PositiveInfinity)[u1], 1.36, 1.39);
        Assert.InRange(DispersionNetwork.ArrivalDispersion(units, routes, 0.13)[u1], 1.04, 1.09);
        Assert.InRange(dispersed.Units[u1].ArrivalScv, 1.05, 1.09);
        Assert.InRange(six.Units.Single(unit => unit.Unit.Id == "u3").ArrivalScv, 1.40, 1.45);
    }

    /// <summary>The units and routes the solver hands the arrival-variability methods, from the decomposition's solution.</summary>
    private static (ArrivalVariabilityUnit[] Units, IReadOnlyList<ArrivalVariabilityRoute> Routes) FlowsOf(NetSolve.Model.Network network)
    {
        var solution = NetworkSolver.Solve(network);
        var inputs = SolverInputs.Of(network, null);
        var units = new ArrivalVariabilityUnit[network.Units.Length];
        for (int i = 0; i < units.Length; i++)
        {
            var result = solution.Units[i];
            units[i] = new ArrivalVariabilityUnit(result.ArrivalsPerHour, network.Units[i].Servers, result.Utilisation, inputs.ServiceScv[i])
            {
                ExternalPerHour = inputs.ExternalPerHour[i],
                ExternalScv = inputs.ExternalScv[i],
            };
        }

        return (units, inputs.Routes);
    }
}
