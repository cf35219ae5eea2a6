using NetSolve.Analysis;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Journeys;
using NetSolve.Presentation.Metrics;
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
        ArgumentNullException.ThrowIfNull(output);
        var journeys = JourneyFormula.Estimate(solution);
        var columns = UnitColumns.For(solution);
        var timeUnit = solution.Network.TimeUnit;

        // The header and the journeys' rows come from the table without its units; the units' rows (100,000 in a
        // large network) are formatted one at a time into one row of cells, never held all at once.
        var layout = JourneyCsvRows.Append(ResultTable.Build(columns, Array.Empty<UnitResult>(), timeUnit), journeys, row => row.Journey.Id, row => row.Journey.Label, JourneyColumns.ForCsv(journeys));
        var shown = layout.ColumnsFor(Audience.Machines);
        var cells = new Cell[layout.Columns.Length];
        JourneyCsvRows.UnitRowTail(cells.Length - columns.Length).CopyTo(cells, columns.Length);
        output.Write(CsvTableWriter.Header(layout) + "\n");
        foreach (var unit in solution.Units)
        {
            for (int i = 0; i < columns.Length; i++)
            {
                cells[i] = columns[i].Read(unit);
            }

            CsvTableWriter.WriteRow(cells, shown, timeUnit, output);
        }

        foreach (var row in layout.Rows)
        {
            CsvTableWriter.WriteRow(row, shown, timeUnit, output);
        }
    }
}
