using NetSolve.Presentation.Formats;
using NetSolve.Solving;

namespace NetSolve.Presentation.Solution;

/// <summary>Writes a solution as CSV: a header, then one row per unit; columns as in the JSON contract.</summary>
public static class SolutionCsvWriter
{
    /// <summary>Writes <paramref name="solution"/> to <paramref name="output"/>; empty cells stand for null.</summary>
    public static void Write(NetworkSolution solution, TextWriter output) => CsvTableWriter.Write(UnitColumns.Table(solution), output);
}
