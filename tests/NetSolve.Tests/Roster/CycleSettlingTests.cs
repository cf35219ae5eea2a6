using System.Collections.Immutable;
using NetSolve.Analysis;

namespace NetSolve.Tests.Roster;

public sealed class CycleSettlingTests
{
    // Relaxation time of M/M/1 at ρ = 0.81 with a 1-hour service: 1/(μ(1 − √ρ)²) = 1/(1 × 0.1²) = 100 h (Abate and
    // Whitt, Queueing Systems 2, 1987, pp. 41-65, by hand). c servers at the same ρ relax c times as fast.
    [Theory]
    [InlineData(1, 0.81, 100.0)]
    [InlineData(4, 3.24, 25.0)]
    public void A_roster_at_the_mean_load_settles_in_its_relaxation_time(int servers, double load, double expectedHours)
    {
        var loads = Enumerable.Repeat(load, 24).ToImmutableArray();

        Assert.Equal(expectedHours, CycleSettling.Hours(loads, [.. Enumerable.Repeat(servers, 24)], 1.0), 9);
    }

    [Fact]
    public void The_cycle_mean_decides_not_the_busiest_hour()
    {
        // Load 0.81 on average (0.5 for twelve hours, 1.12 for twelve) on one server all day: the same 100 h as a flat load.
        var loads = Enumerable.Range(0, 24).Select(h => h < 12 ? 0.5 : 1.12).ToImmutableArray();

        Assert.Equal(100.0, CycleSettling.Hours(loads, [.. Enumerable.Repeat(1, 24)], 1.0), 9);
    }

    [Fact]
    public void A_roster_with_no_more_servers_than_load_never_settles()
    {
        var loads = Enumerable.Repeat(2.0, 24).ToImmutableArray();

        Assert.Equal(double.PositiveInfinity, CycleSettling.Hours(loads, [.. Enumerable.Repeat(2, 24)], 1.0));
    }
}
