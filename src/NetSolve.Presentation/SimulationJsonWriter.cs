using NetSolve.Presentation.Formats;
using NetSolve.Analysis;
using System.Collections.Immutable;
using System.Text.Json;
using NetSolve.Model;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Presentation;

/// <summary>
/// Writes a simulation as the <c>solve</c> document plus confidence and percentile fields: each simulated metric
/// <c>x</c> has <c>x_ci</c>, the half-width of its 95% interval (null with one replication), and a
/// <c>simulation</c> object says how the run was made. With a formula solution each unit also gets <c>compare</c>.
/// </summary>
public static class SimulationJsonWriter
{
    /// <summary>Writes <paramref name="result"/> (and the comparison when <paramref name="formula"/> is given), indented, UTF-8.</summary>
    public static void Write(SimulationResult result, Stream output, NetworkSolution? formula = null, double strainThreshold = Defaults.StrainThreshold)
    {
        ArgumentNullException.ThrowIfNull(result);
        using var json = new Utf8JsonWriter(output, new JsonWriterOptions { Indented = true });
        var scale = new TimeScale(result.Network.TimeUnit);
        var statuses = SimulationStatus.Of(result, strainThreshold);
        json.WriteStartObject();
        json.WriteString("network", result.Network.Name);
        json.WriteString("time_unit", TimeConstants.Name(result.Network.TimeUnit));
        json.WriteBoolean("stable", !statuses.Contains(UnitStatus.Unstable));
        WriteRun(json, result, scale);
        json.WriteStartArray("units");
        for (int i = 0; i < result.Units.Length; i++)
        {
            WriteUnit(json, result, i, statuses[i], scale, formula?.Units[i]);
        }

        json.WriteEndArray();
        WriteTotals(json, result, scale);
        WriteGroups(json, result, scale);
        json.WriteEndObject();
        json.Flush();
    }

    private static void WriteRun(Utf8JsonWriter json, SimulationResult result, TimeScale scale)
    {
        var options = result.Options;
        json.WriteStartObject("simulation");
        json.WriteNumber("seed", options.Seed);
        json.WriteNumber("replications", options.Replications);
        json.WriteNumber("replications_finished", result.ReplicationsFinished);
        json.WriteBoolean("complete", result.IsComplete);
        json.WriteNumber("warmup", scale.Time(options.WarmupHours));
        json.WriteNumber("duration", scale.Time(options.DurationHours));
        json.WriteNumber("events", result.Events);
        json.WriteNumber("confidence_level", Estimate.ConfidenceLevel);
        json.WriteEndObject();
    }

    private static void WriteUnit(Utf8JsonWriter json, SimulationResult result, int index, UnitStatus status, TimeScale scale, UnitResult? formula)
    {
        var unit = result.Units[index];
        var model = unit.Unit;
        double entered = result.Totals!.EnteredPerHour.Mean;
        double offered = unit.ArrivalsPerHour.Mean * model.EffectiveService.MeanHours;
        json.WriteStartObject();
        json.WriteString("id", model.Id);
        json.WriteString("label", model.Label);
        JsonTableWriter.WriteNumber(json, "servers", model.Servers.IsUnlimited ? null : model.Servers.Count);
        Pair(json, "arrival_rate", unit.ArrivalsPerHour, scale.RateFactor);
        json.WriteNumber("visits_per_patient", entered > 0.0 ? unit.ArrivalsPerHour.Mean / entered : 0.0);
        json.WriteNumber("offered_load", offered);
        Pair(json, "utilisation", unit.Utilisation, 1.0);
        Pair(json, "p_wait", unit.WaitProbability, 1.0);
        Pair(json, "mean_queue", unit.MeanQueue, 1.0);
        Pair(json, "mean_wait", unit.MeanWaitHours, scale.TimeFactor);
        Pair(json, "mean_in_unit", unit.MeanInUnit, 1.0);
        Pair(json, "mean_time_in_unit", unit.MeanTimeInUnitHours, scale.TimeFactor);
        JsonTableWriter.WriteNumber(json, "headroom", !model.Servers.IsUnlimited && offered > 0.0 ? model.Servers.Count / offered : null);
        json.WriteString("status", StatusWords.Name(status));
        JsonTableWriter.WriteNumber(json, "capacity", model.Capacity);
        Pair(json, "p_full", unit.FullProbability, 1.0);
        Pair(json, "turned_away_rate", unit.TurnedAwayPerHour, scale.RateFactor);
        Pair(json, "diverted_rate", unit.DivertedPerHour, scale.RateFactor);
        Percentiles(json, "time_in_unit_percentiles", unit.TimeInUnitPercentiles, scale);
        json.WriteStartArray("p_wait_over");
        foreach (var over in unit.WaitOver)
        {
            json.WriteStartObject();
            json.WriteNumber("wait", scale.Time(over.WaitHours));
            Pair(json, "probability", over.Probability, 1.0);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        HourlyArray(json, "mean_queue_by_hour", unit.MeanQueueByHour, estimate => estimate.Mean);
        HourlyArray(json, "mean_queue_by_hour_ci", unit.MeanQueueByHour, estimate => estimate.HalfWidth);
        if (formula is not null)
        {
            WriteComparison(json, FormulaSimulationComparison.ForUnit(unit, formula), scale);
        }

        json.WriteEndObject();
    }

    private static void WriteComparison(Utf8JsonWriter json, ImmutableArray<ComparedMetric> metrics, TimeScale scale)
    {
        json.WriteStartObject("compare");
        foreach (var metric in metrics)
        {
            double factor = scale.FactorFor(metric.Dimension);
            json.WriteStartObject(metric.Name);
            JsonTableWriter.WriteNumber(json, "formula", metric.Formula * factor);
            json.WriteNumber("simulated", metric.Simulated.Mean * factor);
            JsonTableWriter.WriteNumber(json, "simulated_ci", metric.Simulated.HalfWidth * factor);
            json.WriteString("verdict", metric.Verdict);
            json.WriteEndObject();
        }

        json.WriteEndObject();
    }

    private static void WriteTotals(Utf8JsonWriter json, SimulationResult result, TimeScale scale)
    {
        var totals = result.Totals!;
        json.WriteStartObject("totals");
        json.WriteNumber("external_arrival_rate", scale.Rate(totals.ExternalArrivalsPerHour));
        Pair(json, "throughput", totals.ThroughputPerHour, scale.RateFactor);
        Pair(json, "mean_in_system", totals.MeanInSystem, 1.0);
        Pair(json, "mean_time_in_system", totals.MeanTimeInSystemHours, scale.TimeFactor);
        Pair(json, "turned_away_rate", totals.TurnedAwayPerHour, scale.RateFactor);
        Percentiles(json, "time_in_system_percentiles", totals.TimeInSystemPercentiles, scale);
        json.WriteEndObject();
    }

    private static void WriteGroups(Utf8JsonWriter json, SimulationResult result, TimeScale scale)
    {
        json.WriteStartArray("groups");
        foreach (var group in result.Groups)
        {
            json.WriteStartObject();
            json.WriteString("id", group.Group.Id);
            json.WriteString("label", group.Group.Label);
            json.WriteNumber("external_arrival_rate", scale.Rate(group.Group.ExternalArrivalsPerHour));
            Pair(json, "throughput", group.ThroughputPerHour, scale.RateFactor);
            Pair(json, "mean_time_in_system", group.MeanTimeInSystemHours, scale.TimeFactor);
            Percentiles(json, "time_in_system_percentiles", group.TimeInSystemPercentiles, scale);
            json.WriteEndObject();
        }

        json.WriteEndArray();
    }

    private static void Percentiles(Utf8JsonWriter json, string name, ImmutableArray<PercentileEstimate> percentiles, TimeScale scale)
    {
        json.WriteStartObject(name);
        foreach (var percentile in percentiles)
        {
            string key = "p" + percentile.Percent.ToString("0", System.Globalization.CultureInfo.InvariantCulture);
            Pair(json, key, percentile.Hours, scale.TimeFactor);
        }

        json.WriteEndObject();
    }

    /// <summary>An array of one number per hour of day; null for an hour not measured (or without a half-width).</summary>
    private static void HourlyArray(Utf8JsonWriter json, string name, ImmutableArray<Estimate?> byHour, Func<Estimate, double?> value)
    {
        json.WriteStartArray(name);
        foreach (var hour in byHour)
        {
            if (hour is Estimate estimate && value(estimate) is double number)
            {
                json.WriteNumberValue(number);
            }
            else
            {
                json.WriteNullValue();
            }
        }

        json.WriteEndArray();
    }

    /// <summary>Writes <c>name</c> and <c>name_ci</c>, scaled; both null when there is no estimate.</summary>
    private static void Pair(Utf8JsonWriter json, string name, Estimate? estimate, double factor)
    {
        JsonTableWriter.WriteNumber(json, name, estimate?.Mean * factor);
        JsonTableWriter.WriteNumber(json, name + "_ci", estimate?.HalfWidth * factor);
    }
}
