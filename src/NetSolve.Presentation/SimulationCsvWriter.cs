using NetSolve.Presentation.Formats;
using System.Globalization;
using NetSolve.Simulation;

namespace NetSolve.Presentation;

/// <summary>Writes a simulation as CSV: one row per unit, each metric followed by its 95% half-width.</summary>
public static class SimulationCsvWriter
{
    /// <summary>Writes the header and one row per unit (the mean queue by hour of day last, <c>mean_queue_h00</c> to <c>mean_queue_h23</c>); times in the network's time unit, invariant culture.</summary>
    public static void Write(SimulationResult result, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(output);
        var scale = new TimeScale(result.Network.TimeUnit);
        var thresholds = result.Options.WaitThresholdsHours.IsDefault ? [] : result.Options.WaitThresholdsHours;
        var header = new List<string> { "id", "label", "servers" };
        foreach (string name in new[] { "arrival_rate", "utilisation", "p_wait", "mean_queue", "mean_wait", "mean_in_unit", "mean_time_in_unit", "p_full", "turned_away_rate", "diverted_rate" })
        {
            header.Add(name);
            header.Add(name + "_ci");
        }

        header.AddRange(["time_in_unit_p50", "time_in_unit_p90", "time_in_unit_p95", "time_in_unit_p99"]);
        header.AddRange(thresholds.Select(t => "p_wait_over_" + MachineFormat.Csv(scale.Time(t))));
        header.AddRange(Enumerable.Range(0, TimeOfDayQueues.HoursOfDay).Select(h => "mean_queue_h" + h.ToString("00", CultureInfo.InvariantCulture)));
        output.Write(string.Join(",", header) + "\n");
        foreach (var unit in result.Units)
        {
            var cells = new List<string> { MachineFormat.CsvText(unit.Unit.Id), MachineFormat.CsvText(unit.Unit.Label), unit.Unit.Servers.ToString() };
            foreach (var (estimate, factor) in new[]
            {
                (unit.ArrivalsPerHour, scale.RateFactor), (unit.Utilisation, 1.0), (unit.WaitProbability, 1.0),
                (unit.MeanQueue, 1.0), (unit.MeanWaitHours, scale.TimeFactor), (unit.MeanInUnit, 1.0),
                (unit.MeanTimeInUnitHours, scale.TimeFactor), (unit.FullProbability, 1.0),
                (unit.TurnedAwayPerHour, scale.RateFactor), (unit.DivertedPerHour, scale.RateFactor),
            })
            {
                cells.Add(MachineFormat.Csv(estimate.Mean * factor));
                cells.Add(estimate.HalfWidth is double half ? MachineFormat.Csv(half * factor) : string.Empty);
            }

            cells.AddRange(unit.TimeInUnitPercentiles.Select(p => p.Hours is Estimate hours ? MachineFormat.Csv(hours.Mean * scale.TimeFactor) : string.Empty));
            cells.AddRange(unit.WaitOver.Select(over => MachineFormat.Csv(over.Probability.Mean)));
            cells.AddRange(unit.MeanQueueByHour.Select(hour => hour is Estimate estimate ? MachineFormat.Csv(estimate.Mean) : string.Empty));
            output.Write(string.Join(",", cells) + "\n");
        }
    }
}
