using NetSolve.Parsing;

namespace NetSolve.Tests.Core.Solving.Variability;

public sealed class ArrivalCvParsingTests
{
    private const string Base = """
        units:
          triage:
            servers: 2
            service: 30min
          ward:
            servers: 10
            service: 2d
        arrivals:
          triage: 3/h
        """;

    private static ReadResult Read(string text) => NetworkReader.ReadText(text, "test.yaml");

    private static string Errors(ReadResult result) => string.Join("\n", result.Diagnostics.Where(d => d.IsError));

    // Source: docs/network-file.md, arrival_cv: default 1 (Poisson) where the key or the unit is absent.
    [Fact]
    public void Arrival_cv_is_read_onto_the_arrival_and_defaults_to_1()
    {
        var without = Read(Base);
        var with = Read(Base + "\narrival_cv:\n  triage: 0.5\n");

        Assert.False(with.HasErrors, Errors(with));
        Assert.Equal(1.0, Assert.Single(without.Network!.Arrivals).Cv);
        Assert.Equal(0.5, Assert.Single(with.Network!.Arrivals).Cv);
        Assert.Equal(without.Diagnostics.Length, with.Diagnostics.Length);
    }

    // Source: docs/network-file.md, arrival_cv: one located line per mistake, with file, line, column and unit.
    [Theory]
    [InlineData("  triag: 0.5", "test.yaml:11:3: arrival_cv: unknown unit 'triag'; did you mean 'triage'?")]
    [InlineData("  triage: -0.5", "test.yaml:11:11: unit 'triage': arrival_cv must be 0 or more (1 is Poisson arrivals, 0 evenly spaced)")]
    [InlineData("  triage: lots", "test.yaml:11:11: unit 'triage': arrival_cv: 'lots' is not a number")]
    [InlineData("  ward: 0.5", "test.yaml:11:3: unit 'ward': arrival_cv: the unit has no arrivals from outside; give it a rate under 'arrivals' or remove it here")]
    [InlineData("  - triage", "test.yaml:11:3: arrival_cv must be a mapping of keys to values")]
    public void Bad_arrival_cv_values_are_errors_naming_file_line_column_and_unit(string entry, string expected)
    {
        var result = Read(Base + "\narrival_cv:\n" + entry + "\n");

        Assert.Equal(expected, Errors(result));
    }
}
