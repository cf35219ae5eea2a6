namespace NetSolve.Tests.Hardening.Corpus;

/// <summary>
/// Labels and scenario names a spreadsheet would run as formulas (<c>=HYPERLINK(...)</c>, <c>+cmd|...</c>,
/// <c>@SUM(...)</c>, <c>-2+3</c>) used to be written as raw CSV cells by solve, simulate and compare; planners open
/// these files in spreadsheets. The contract check fails on any cell that starts with one of those characters.
/// </summary>
public sealed class OutputCorpusTests
{
    private static readonly string Labels = CorpusCase.File("csv-injection.yaml");

    [Fact]
    public void Solve_writes_formula_labels_inert_in_csv() => CorpusCase.Run(["solve", Labels, "--format", "csv"]);

    [Fact]
    public void Simulate_writes_formula_labels_inert_in_csv() =>
        CorpusCase.Run(["simulate", Labels, "--format", "csv", "--replications", "2", "--warmup", "1d", "--duration", "2d"]);

    [Fact]
    public void Compare_writes_a_formula_scenario_name_inert_in_csv() =>
        CorpusCase.Run(["compare", Labels, CorpusCase.File("csv-injection-scenario.yaml"), "--format", "csv"]);
}
