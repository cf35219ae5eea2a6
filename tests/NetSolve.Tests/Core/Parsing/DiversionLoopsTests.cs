using NetSolve.Diagnostics;
using NetSolve.Parsing;

namespace NetSolve.Tests.Core.Parsing;

public sealed class DiversionLoopsTests
{
    private const string Units = """
        units:
          east:
            servers: 1
            service: 1h
            capacity: 2
            when_full: divert to west
          west:
            servers: 1
            service: 1h
            capacity: 2
            when_full: divert to north
          north:
            servers: 1
            service: 1h
            capacity: 1
        arrivals:
          east: 1/h
        """;

    private static string Errors(string text)
    {
        var errors = NetworkReader.ReadText(text, "test.yaml").Diagnostics.Where(d => d.IsError).ToList();
        Assert.All(errors, error => Assert.Equal(DiagnosticCodes.NoExit, error.Code));
        return string.Join("\n", errors);
    }

    [Fact]
    public void A_chain_of_diversions_that_ends_at_a_unit_turning_patients_away_is_accepted()
    {
        Assert.Equal(string.Empty, Errors(Units));
    }

    [Fact]
    public void A_loop_of_diversions_is_one_error_at_the_when_full_of_its_first_unit()
    {
        string text = Units.Replace("capacity: 1", "capacity: 1\n    when_full: divert to east", StringComparison.Ordinal);

        Assert.Equal(
            "test.yaml:6:16: unit 'east': when_full: a diversion chain with no way out ('east' → 'west' → 'north' → 'east'); when all of them are full a patient has nowhere to go, so let one of them turn patients away",
            Errors(text));
    }

    [Fact]
    public void A_unit_diverting_into_a_loop_is_not_itself_reported()
    {
        string text = Units.Replace("capacity: 1", "capacity: 1\n    when_full: divert to west", StringComparison.Ordinal);

        Assert.Equal(
            "test.yaml:11:16: unit 'west': when_full: a diversion chain with no way out ('west' → 'north' → 'west'); when all of them are full a patient has nowhere to go, so let one of them turn patients away",
            Errors(text));
    }
}
