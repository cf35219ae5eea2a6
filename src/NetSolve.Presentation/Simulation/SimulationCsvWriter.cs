using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Simulation;

namespace NetSolve.Presentation.Simulation;

/// <summary>Writes a simulation as CSV: one row per unit, each metric followed by its 95% half-width.</summary>
public static class SimulationCsvWriter
{
    /// <summary>
    /// Writes the header and one row per unit, columns from <see cref="SimulatedUnitColumns.ForCsvOf"/> (the mean queue
    /// by hour of day last, <c>mean_queue_h00</c> to <c>mean_queue_h23</c>); times in the network's time unit.
    /// </summary>
    public static void Write(SimulationResult result, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(output);
        CsvTableWriter.Write(ResultTable.Build(SimulatedUnitColumns.ForCsvOf(result), SimulatedUnitRow.Of(result), result.Network.TimeUnit), output);
    }
}
