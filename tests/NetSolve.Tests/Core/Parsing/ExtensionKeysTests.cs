using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Parsing;

namespace NetSolve.Tests.Core.Parsing;

public sealed class ExtensionKeysTests
{
    private const string Base = """
        units:
          triage:
            servers: 2
            service: 30min
        arrivals:
          triage: 3/h
        """;

    private static ReadResult Read(string text) => NetworkReader.ReadText(text, "test.yaml");

    private static string Errors(ReadResult result) => string.Join("\n", result.Diagnostics.Where(d => d.IsError));

    [Fact]
    public void A_v1_file_keeps_its_meaning_and_gets_no_extension()
    {
        var result = Read(Base);

        Assert.False(result.HasErrors, Errors(result));
        var unit = result.Network!.Units[0];
        Assert.Null(unit.Service);
        Assert.Null(unit.Capacity);
        Assert.True(unit.WhenFull.IsTurnAway);
        Assert.Null(result.Network.ArrivalProfile);
        Assert.Empty(result.Network.Groups);
        Assert.Equal(ServiceKind.Exponential, unit.EffectiveService.Kind);
        Assert.Empty(result.Diagnostics);
    }

    [Fact]
    public void The_example_simulation_network_reads_every_extension_key()
    {
        var result = NetworkReader.ReadFile(Path.Combine("networks", "larkspur-simulation.yaml"));

        Assert.False(result.HasErrors, Errors(result));
        var network = result.Network!;
        var emergency = network.Units[0];
        Assert.Equal(ServiceKind.Lognormal, emergency.Service!.Kind);
        Assert.Equal(2.5, emergency.Service.MeanHours, 12);
        Assert.Equal(0.8, emergency.Service.Cv, 12);
        Assert.Equal(30, emergency.Capacity);
        Assert.Equal("urgent_care", emergency.WhenFull.DivertToUnitId);
        Assert.Equal(ServiceKind.Deterministic, network.Units[2].Service!.Kind);
        // Source: exact by hand: the mean of the ten listed stays is 214 h / 10.
        Assert.Equal(21.4, network.Units[3].MeanServiceHours, 12);
        Assert.Equal(1.0, network.ArrivalProfile!.HourOfDay.Average(), 12);
        Assert.Equal(7, network.ArrivalProfile.DayOfWeek.Length);
        var group = Assert.Single(network.Groups);
        Assert.Equal(14.0 / 24.0, group.ExternalArrivalsPerHour, 12);
        Assert.Equal(0.8, Assert.Single(group.Routes!.Value).Probability, 12);
        Assert.Equal(9 * 24.0, Assert.Single(group.Services).Service.MeanHours, 12);
    }

    // Source: docs/methods.md and docs/time-of-day.md: the formulas use service distributions, capacities, diversions and
    // patient groups, and solve follows the arrival profile hour by hour, so nothing is reported as ignored.
    [Fact]
    public void No_key_of_the_simulation_example_is_reported_as_left_to_the_simulation()
    {
        var result = NetworkReader.ReadFile(Path.Combine("networks", "larkspur-simulation.yaml"));

        var ignored = result.Diagnostics.Where(d => d.Code == DiagnosticCodes.IgnoredByFormulas).Select(d => d.ToString()).ToList();
        Assert.Empty(ignored);
    }

    [Fact]
    public void An_unknown_unit_key_is_an_error_with_location_unit_and_suggestion()
    {
        var result = Read(Base.Replace("service: 30min", "service: 30min\n    capacty: 4", StringComparison.Ordinal));

        Assert.Equal("test.yaml:5:5: unit 'triage': unknown key 'capacty'; did you mean 'capacity'?", Errors(result));
    }

    [Theory]
    [InlineData("capacity: 1", "test.yaml:5:15: unit 'triage': capacity 1 is below servers 2; capacity counts patients in service and waiting")]
    [InlineData("capacity: 4\n    when_full: divert to triag", "test.yaml:6:16: unit 'triage': when_full: unknown unit 'triag'; did you mean 'triage'?")]
    [InlineData("when_full: turn_away", "test.yaml:5:16: unit 'triage': when_full needs 'capacity': a unit without a capacity is never full")]
    [InlineData("service_distribution: lognormel", "test.yaml:5:27: unit 'triage': service_distribution must be exponential, lognormal, gamma, deterministic or empirical, not 'lognormel'; did you mean 'lognormal'?")]
    [InlineData("service_distribution: deterministic\n    service_cv: 0.5", "test.yaml:6:17: unit 'triage': service_cv of a deterministic service is 0; choose lognormal or gamma for another value")]
    [InlineData("service_samples: [20min, 40min]", "test.yaml:4:14: unit 'triage': service comes from service_samples for an empirical service; remove it")]
    public void Bad_extension_values_are_errors_naming_file_line_column_and_unit(string extra, string expected)
    {
        var result = Read(Base.Replace("service: 30min", "service: 30min\n    " + extra, StringComparison.Ordinal));

        Assert.Equal(expected, Errors(result));
    }

    [Fact]
    public void An_hour_of_day_profile_needs_24_numbers()
    {
        var result = Read(Base + "\narrival_profile:\n  hour_of_day: [1, 2, 3]\n");

        Assert.Equal("test.yaml:8:16: arrival_profile.hour_of_day must be a list of 24 numbers", Errors(result));
    }

    [Fact]
    public void A_group_that_routes_into_a_loop_with_no_exit_is_an_error_naming_the_group()
    {
        var text = Base + """

            groups:
              longstay:
                arrivals:
                  triage: 1/d
                routes:
                  triage:
                    triage: 100%
            """;

        var result = Read(text);

        Assert.Equal("test.yaml:8:3: unit 'triage': groups.longstay: patients who reach this unit can never leave the network; let its routes add up to less than 1", Errors(result));
    }

    [Fact]
    public void A_unit_reached_only_by_a_group_is_not_reported_unreached()
    {
        var text = Base.Replace("arrivals:", "  clinic:\n    servers: 1\n    service: 1h\narrivals:", StringComparison.Ordinal) + """

            groups:
              referrals:
                arrivals:
                  clinic: 2/d
            """;

        var result = Read(text);

        Assert.False(result.HasErrors, Errors(result));
        Assert.DoesNotContain(result.Diagnostics, d => d.Code == DiagnosticCodes.Unreached);
    }
}
