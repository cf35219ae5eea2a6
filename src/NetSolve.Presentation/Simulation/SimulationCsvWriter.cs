using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Journeys;
using NetSolve.Presentation.Metrics;
using NetSolve.Simulation;

namespace NetSolve.Presentation.Simulation;

/// <summary>Writes a simulation as CSV: one row per unit, each metric followed by its 95% half-width.</summary>
public static class SimulationCsvWriter
{
    /// <summary>
    /// Writes the header and one row per unit, columns from <see cref="SimulatedUnitColumns.ForCsvOf"/> (the mean queue
    /// by hour of day, <c>mean_queue_h00</c> to <c>mean_queue_h23</c>), then how the run was made (<see cref="RunColumns"/>),
    /// the same on every row so each stands on its own; times in the network's time unit.
    /// With journeys, their rows follow the units' (<see cref="JourneyCsvRows"/>).
    /// </summary>
    public static void Write(SimulationResult result, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(output);
        var columns = SimulatedUnitColumns.ForCsvOf(result).AddRange(RunColumns(result));
        var units = ResultTable.Build(columns, SimulatedUnitRow.Of(result), result.Network.TimeUnit);
        var journeys = result.Journeys.IsDefault ? [] : result.Journeys;
        var table = JourneyCsvRows.Append(units, journeys, row => row.Journey.Id, row => row.Journey.Label, SimulatedJourneyColumns.ForCsv(journeys));
        CsvTableWriter.Write(table, output);
    }

    /// <summary>
    /// <c>warmup</c> and <c>duration</c> (in the network's time unit) and <c>precision_reached</c> (<c>true</c>,
    /// <c>false</c>, or empty when no precision was asked): the last columns, a compatible extension.
    /// </summary>
    public static ImmutableArray<Column<SimulatedUnitRow>> RunColumns(SimulationResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        var options = result.Options;
        return
        [
            new("warmup", "warm-up", MetricDimension.Time, _ => Cell.Of(options.WarmupHours, MetricDimension.Time), Audience.Machines),
            new("duration", "duration", MetricDimension.Time, _ => Cell.Of(options.DurationHours, MetricDimension.Time), Audience.Machines),
            new("precision_reached", "precision reached", MetricDimension.Plain,
                _ => result.PrecisionReached is bool reached ? Cell.Word(reached ? "true" : "false") : Cell.Of(null, MetricDimension.Plain), Audience.Machines),
        ];
    }
}
