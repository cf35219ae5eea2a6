using System.Globalization;
using NetSolve.Analysis;
using NetSolve.Benchmarks;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Journeys;
using NetSolve.Presentation.Solution;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Presentation;

/// <summary>
/// The solution's table and CSV are written a unit at a time (a 100,000-unit network would otherwise hold every cell:
/// about 170 MB more at the peak). They must be the documents the table of all cells gives, byte for byte; the
/// golden files pin those for the bundled examples, these tests for generated networks of several hundred units
/// and for the examples with journeys, whose rows follow the units' in the CSV.
/// </summary>
public sealed class StreamedSolutionTablesTests
{
    public static TheoryData<string> Networks => new() { "kestrel-general", "larkspur-simulation", "harbourside", "generated 400 units", "generated 1000 units" };

    [Theory]
    [MemberData(nameof(Networks))]
    public void The_unit_table_written_row_by_row_is_the_table_of_all_cells(string name)
    {
        var solution = NetworkSolver.Solve(Load(name));
        using var streamed = new StringWriter(CultureInfo.InvariantCulture);
        using var whole = new StringWriter(CultureInfo.InvariantCulture);

        PeopleTableWriter.Write(UnitColumns.For(solution), solution.Units, solution.Network.TimeUnit, streamed);
        PeopleTableWriter.Write(UnitColumns.Table(solution), whole);

        Assert.Equal(whole.ToString(), streamed.ToString());
    }

    [Theory]
    [MemberData(nameof(Networks))]
    public void The_csv_written_row_by_row_is_the_table_of_all_cells_with_the_journeys_after_the_units(string name)
    {
        var solution = NetworkSolver.Solve(Load(name));
        var journeys = JourneyFormula.Estimate(solution);
        using var streamed = new StringWriter(CultureInfo.InvariantCulture);
        using var whole = new StringWriter(CultureInfo.InvariantCulture);

        SolutionCsvWriter.Write(solution, streamed);
        CsvTableWriter.Write(JourneyCsvRows.Append(UnitColumns.Table(solution), journeys, row => row.Journey.Id, row => row.Journey.Label, JourneyColumns.ForCsv(journeys)), whole);

        Assert.Equal(whole.ToString(), streamed.ToString());
        Assert.Equal(solution.Units.Length + journeys.Length + 1, streamed.ToString().Count(c => c == '\n'));
    }

    private static Network Load(string name) => name.StartsWith("generated", StringComparison.Ordinal)
        ? NetworkGenerator.Generate(int.Parse(name.Split(' ')[1], CultureInfo.InvariantCulture), seed: 5).Network
        : TestNetworks.Parse(File.ReadAllText(TestFiles.Network(name)), name + ".yaml");
}
