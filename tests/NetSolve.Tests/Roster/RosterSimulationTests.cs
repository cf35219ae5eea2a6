using System.Globalization;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Tests.Roster;

public sealed class RosterSimulationTests
{
    // Night and evening 0.5, day (08-20) 1.5: mean 1, so 4 arrivals an hour on average.
    private static readonly double[] Profile = [.. Enumerable.Range(0, 24).Select(h => h is >= 8 and < 20 ? 1.5 : 0.5)];
    private static readonly int[] Servers = [.. Enumerable.Range(0, 24).Select(h => h < 8 ? 2 : h < 20 ? 4 : 3)];
    private const double MeanArrivalsPerHour = 4.0;
    private const double MeanServiceHours = 0.5;

    private static Network RosteredUnit(string roster) => NetworkReader.ReadText($$"""
        units:
          cubicles:
            servers: 4
            service: 30min
            service_distribution: exponential
            roster: {{roster}}
        arrivals:
          cubicles: 4/h
        arrival_profile:
          hour_of_day: [{{string.Join(", ", Profile.Select(m => m.ToString(CultureInfo.InvariantCulture)))}}]
        """, "rostered.yaml").Network!;

    private static HourlyWaits ExactChain()
    {
        const int stepsPerHour = 6;
        var arrivals = Enumerable.Range(0, 24 * stepsPerHour).Select(k => MeanArrivalsPerHour * Profile[k / stepsPerHour]).ToArray();
        return PeriodicBirthDeathChain.Solve(arrivals, stepsPerHour, ServerRoster.ByHour(Servers), MeanServiceHours, new ExactChainOptions { Tolerance = 1e-7 });
    }

    private static SimulationResult Simulate(Network network) => Simulator.Run(network, new SimulationOptions
    {
        Seed = 20261202,
        Replications = 4,
        WarmupHours = 7 * 24,
        DurationHours = 100 * 24,
    });

    // Source: the exact time-dependent chain (uniformization: Grassmann, Computers & Operations Research 4, 1977,
    // 47-53) with the same roster; the simulator's hourly mean queue must hold it within its 95% interval in nearly
    // every hour (24 intervals at 95%: about one miss expected).
    [Fact]
    public void The_simulator_follows_the_roster_as_the_exact_chain_does()
    {
        var exact = ExactChain();
        var simulated = Simulate(RosteredUnit("{ \"00-08\": 2, \"08-20\": 4, \"20-00\": 3 }")).Units[0].MeanQueueByHour;

        int inside = Enumerable.Range(0, 24).Count(h => simulated[h]!.Value.Contains(exact.MeanQueueByHour[h]));
        Assert.True(inside >= 21, string.Create(CultureInfo.InvariantCulture, $"within the interval in {inside} of 24 hours"));
        for (int h = 0; h < 24; h++)
        {
            var estimate = simulated[h]!.Value;
            Assert.True(Math.Abs(estimate.Mean - exact.MeanQueueByHour[h]) <= (3.0 * estimate.HalfWidth!.Value) + 0.01, string.Create(CultureInfo.InvariantCulture, $"hour {h}: {estimate.Mean} against {exact.MeanQueueByHour[h]}"));
        }
    }

    // Exact by hand: the same roster as a list of 24 and as shift blocks is one roster, so the same seed gives the
    // same run; and without it (4 servers all day) the night queue, which only the roster's 2 servers make, is gone.
    [Fact]
    public void A_roster_written_as_blocks_or_as_a_list_simulates_alike_and_differs_from_fixed_servers()
    {
        var blocks = Simulate(RosteredUnit("{ \"00-08\": 2, \"08-20\": 4, \"20-00\": 3 }")).Units[0].MeanQueueByHour;
        var list = Simulate(RosteredUnit($"[{string.Join(", ", Servers)}]")).Units[0].MeanQueueByHour;
        var fixedServers = Simulate(RosteredUnit("[4, 4, 4, 4, 4, 4, 4, 4, 4, 4, 4, 4, 4, 4, 4, 4, 4, 4, 4, 4, 4, 4, 4, 4]")).Units[0].MeanQueueByHour;

        Assert.Equal(blocks.Select(e => e!.Value.Mean), list.Select(e => e!.Value.Mean));
        Assert.True(fixedServers[6]!.Value.Mean < blocks[6]!.Value.Mean / 2.0);
    }
}
