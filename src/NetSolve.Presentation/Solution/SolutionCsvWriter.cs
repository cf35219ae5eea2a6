using NetSolve.Analysis;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Journeys;
using NetSolve.Solving;

namespace NetSolve.Presentation.Solution;

/// <summary>Writes a solution as CSV: a header, then one row per unit; columns as in the JSON contract.</summary>
public static class SolutionCsvWriter
{
    /// <summary>Writes <paramref name="solution"/> to <paramref name="output"/>; empty cells stand for null.</summary>
    /// <remarks>With journeys, their rows follow the units' (<see cref="JourneyCsvRows"/>).</remarks>
    public static void Write(NetworkSolution solution, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(solution);
        var journeys = JourneyFormula.Estimate(solution);
        var table = JourneyCsvRows.Append(UnitColumns.Table(solution), journeys, row => row.Journey.Id, row => row.Journey.Label, JourneyColumns.ForCsv(journeys));
        CsvTableWriter.Write(table, output);
    }
}
