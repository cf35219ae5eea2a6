using NetSolve.Model;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Core.Solving.Overflow;

public sealed class DivertedArrivalsTests
{
    private static Network Larkspur() => TestNetworks.Example("larkspur-simulation.yaml") with { ArrivalProfile = null };

    [Fact]
    public void The_urgent_care_unit_fed_by_diverted_ambulances_is_within_ten_percent_of_the_simulation()
    {
        // Source: the project's simulator, seed 2026, 10 replications of 50,000 h after 2,000 h (the long accuracy test,
        // docs/methods.md "Measured accuracy against the simulator"): urgent care waits 0.0185 ± 0.0004 h; taking the
        // diverted patients as Poisson gave 0.0112 h (−39%).
        var unit = NetworkSolver.Solve(Larkspur()).Units.Single(result => string.Equals(result.Unit.Id, "urgent_care", StringComparison.Ordinal));
        Assert.Equal(MethodNames.DivertedOverflow, unit.Method);
        Assert.InRange(unit.MeanWaitHours!.Value, 0.0185 * 0.9, 0.0185 * 1.1);
        Assert.Equal(unit.ArrivalsPerHour * unit.MeanWaitHours.Value, unit.MeanQueue!.Value, 1e-12);
        Assert.Equal(unit.MeanWaitHours.Value + (unit.OfferedLoad / unit.ArrivalsPerHour), unit.MeanTimeInUnitHours!.Value, 1e-12);
    }

    [Fact]
    public void Without_diversion_the_receiving_unit_keeps_its_two_moment_method()
    {
        // Exact by hand: turning patients away instead of diverting them leaves urgent care with Poisson-like arrivals only.
        var network = Larkspur();
        var turnAway = network with
        {
            Units = [.. network.Units.Select(unit => string.Equals(unit.Id, "emergency", StringComparison.Ordinal) ? unit with { WhenFull = WhenFull.TurnAway } : unit)],
        };
        var unit = NetworkSolver.Solve(turnAway).Units.Single(result => string.Equals(result.Unit.Id, "urgent_care", StringComparison.Ordinal));
        Assert.NotEqual(MethodNames.DivertedOverflow, unit.Method, StringComparer.Ordinal);
    }

    [Fact]
    public void Bursty_diverted_patients_wait_longer_than_the_same_rate_arriving_as_poisson()
    {
        // From memory: peaked (overflow) traffic waits longer than Poisson traffic of the same mean (Wilkinson 1956).
        var network = Larkspur();
        var solved = NetworkSolver.Solve(network).Units.Single(result => string.Equals(result.Unit.Id, "urgent_care", StringComparison.Ordinal));
        double poissonWait = GgcFormulas.Estimate(4, solved.ArrivalsPerHour, 50.0 / 60.0, solved.ArrivalScv, solved.ServiceScv,
            solved.Unit.EffectiveService).MeanWaitHours!.Value;
        Assert.True(solved.MeanWaitHours > 1.3 * poissonWait);
    }
}
