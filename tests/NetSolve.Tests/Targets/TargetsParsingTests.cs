using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Targets;

public sealed class TargetsParsingTests
{
    private const string Network = """
        units:
          emergency: { servers: 4, service: 1h }
          ward: { servers: 10, service: 2d, capacity: 12 }
        targets:
          all_units:
            mean_wait: 4h
            mean_time_in_unit: 3d
          emergency:
            mean_wait: 15min
            wait_over: { time: 4h, at_most: 5% }
          ward:
            turned_away: 2%
        arrivals:
          emergency: 2
        routes:
          emergency: { ward: 0.1 }
        """;

    [Fact]
    public void A_units_own_target_wins_over_the_one_for_all_units_target_by_target()
    {
        var result = NetworkReader.ReadText(Network, "net.yaml");

        Assert.False(result.HasErrors, string.Join("\n", result.Diagnostics));
        var emergency = result.Network!.Units[0].Targets!;
        var ward = result.Network.Units[1].Targets!;
        Assert.Equal(0.25, emergency.MaxMeanWaitHours);
        Assert.Equal(72.0, emergency.MaxMeanTimeInUnitHours);
        Assert.Equal(new WaitOverTarget(4.0, 0.05), emergency.WaitOver);
        Assert.Null(emergency.MaxTurnedAway);
        Assert.Equal(4.0, ward.MaxMeanWaitHours);
        Assert.Equal(0.02, ward.MaxTurnedAway);
    }

    [Fact]
    public void A_network_without_targets_has_none_on_any_unit()
    {
        var network = NetworkReader.ReadFile(TestFiles.Network("kestrel-general")).Network!;

        Assert.All(network.Units, unit => Assert.Null(unit.Targets));
    }

    [Fact]
    public void The_example_with_targets_reads_them_all()
    {
        var network = NetworkReader.ReadFile(TestFiles.Network("ashcombe-targets")).Network!;

        Assert.All(network.Units, unit => Assert.NotNull(unit.Targets));
        Assert.Equal(1.0, network.Units.Single(unit => unit.Id == "critical_care").Targets!.MaxMeanWaitHours);
    }

    [Fact]
    public void Bad_targets_are_each_reported_at_their_line_and_column()
    {
        // Every mistake at once: unknown key, unknown unit, a bad duration, half a wait_over, turned_away without capacity,
        // a share above 1 (TestData/Invalid/bad-targets.diagnostics.txt lists them).
        var result = NetworkReader.ReadText(File.ReadAllText(TestFiles.TestData("Invalid", "bad-targets.yaml")), "bad-targets.yaml");

        Assert.Null(result.Network);
        Assert.Equal(6, result.Diagnostics.Count(d => d.IsError));
        Assert.Contains(result.Diagnostics, d => d.ToString().StartsWith("bad-targets.yaml:12:3: targets: unknown unit 'emergncy'; did you mean 'emergency'?", StringComparison.Ordinal));
    }
}
