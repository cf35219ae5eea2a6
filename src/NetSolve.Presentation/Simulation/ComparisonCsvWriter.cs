using NetSolve.Presentation.Formats;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Presentation.Simulation;

/// <summary>Writes formula against simulation as CSV: a header, then one row per unit and metric, with the verdict.</summary>
/// <remarks>
/// The rows, their order and the verdicts are those of <see cref="ComparisonTableWriter"/>, because both are built from
/// <see cref="ComparedMetricColumns"/>. Unlike the table, numbers keep round-trip precision: a program that recomputes a
/// verdict from the CSV must see the values the verdict was made from. Invariant culture; an empty cell stands for a
/// value that does not exist (the formula of an unstable unit, the interval of a single replication).
/// </remarks>
public static class ComparisonCsvWriter
{
    /// <summary>
    /// The header row. <c>simulated_ci</c> is the 95% half-width of <c>simulated</c>; times and rates are in
    /// <c>time_unit</c>, the network's, on every row so each row stands on its own when filtered; <c>relative_error</c> (a fraction) and <c>method</c> came later, then
    /// <c>formula_exact</c>, <c>suspect</c> (<c>run</c> or <c>formula</c> for a value outside) and <c>relative_error_ci</c>, and end the row.
    /// </summary>
    public const string Header = "unit,metric,formula,simulated,simulated_ci,verdict,time_unit,relative_error,method,formula_exact,suspect,relative_error_ci";

    /// <summary>Writes the header and, for each unit in file order, one row per compared metric.</summary>
    /// <param name="simulated">The simulation of a network.</param>
    /// <param name="formula">The formula solution of the same network: one result per unit, in the same order.</param>
    /// <param name="output">Receives the CSV; lines end with <c>\n</c>, like the other CSV writers.</param>
    public static void Write(SimulationResult simulated, NetworkSolution formula, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(simulated);
        ArgumentNullException.ThrowIfNull(formula);
        ArgumentNullException.ThrowIfNull(output);
        CsvTableWriter.Write(ComparedMetricColumns.Table(simulated, formula), output);
    }
}
