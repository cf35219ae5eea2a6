using NetSolve.Presentation.Formats;
using NetSolve.Solving;

namespace NetSolve.Presentation.ByHour;

/// <summary>Writes the hour-by-hour solution as CSV (<c>solve --format csv --by-hour</c>): a header, then one row per unit and hour.</summary>
public static class ByHourCsvWriter
{
    /// <summary>Writes the rows of <see cref="ByHourColumns.Table"/>; empty cells stand for null.</summary>
    public static void Write(NetworkSolution solution, TextWriter output) => CsvTableWriter.Write(ByHourColumns.Table(solution), output);
}
