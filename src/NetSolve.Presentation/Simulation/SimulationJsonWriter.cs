using System.Collections.Immutable;
using System.Runtime.CompilerServices;
using System.Text.Json;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Journeys;
using NetSolve.Presentation.Metrics;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Presentation.Simulation;

/// <summary>
/// Writes a simulation as the <c>solve</c> document plus confidence and percentile fields: each simulated metric
/// <c>x</c> has <c>x_ci</c>, the half-width of its 95% interval (null with one replication), and a
/// <c>simulation</c> object says how the run was made. With a formula solution each unit also gets <c>compare</c>.
/// </summary>
/// <remarks>
/// The document nests objects a flat table cannot hold, so the nesting is written here; every value is read through
/// the registries (<see cref="SimulatedUnitColumns"/> and the others) and converted by <see cref="MachineFormat"/>.
/// </remarks>
public static class SimulationJsonWriter
{
    /// <summary>Bytes of the document held before they are handed to the output stream.</summary>
    private const int FlushBytes = 64 * 1024;

    /// <summary>Writes <paramref name="result"/> (and the comparison when <paramref name="formula"/> is given), indented, UTF-8.</summary>
    public static void Write(SimulationResult result, Stream output, NetworkSolution? formula = null, double strainThreshold = Defaults.StrainThreshold)
    {
        ArgumentNullException.ThrowIfNull(result);
        using var json = new Utf8JsonWriter(output, new JsonWriterOptions { Indented = true });
        var timeUnit = result.Network.TimeUnit;
        var rows = SimulatedUnitRow.Of(result, strainThreshold);
        json.WriteStartObject();
        json.WriteString("network", result.Network.Name);
        json.WriteString("time_unit", TimeConstants.Name(timeUnit));
        json.WriteBoolean("stable", rows.All(row => row.Status != UnitStatus.Unstable));
        WriteRun(json, result);
        // Each unit's cells are read as it is written and the document is handed on every FlushBytes, so memory does not
        // grow with the units: at 100,000 units a table of every cell and the whole document held for one final flush
        // were about 700 MB. The field names are encoded once and nothing is built per unit: tables of a unit's
        // percentiles and P(wait > t) were about 16 KB allocated per unit.
        var fields = Fields<SimulatedUnitRow>.Of(SimulatedUnitColumns.ForJson);
        var details = new UnitDetails();
        json.WriteStartArray("units");
        for (int i = 0; i < rows.Length; i++)
        {
            json.WriteStartObject();
            fields.Write(json, rows[i], timeUnit);
            details.Write(json, rows[i].Simulated, timeUnit);
            if (formula is not null)
            {
                WriteComparison(json, ComparisonRow.OfUnit(rows[i].Simulated, formula.Units[i], result.Network), timeUnit);
            }

            json.WriteEndObject();
            if (json.BytesPending >= FlushBytes)
            {
                json.Flush();
            }
        }

        json.WriteEndArray();
        WriteTotals(json, result.Totals!, timeUnit);
        WriteGroups(json, result.Groups, timeUnit);
        JourneyJsonWriter.Write(result.Journeys, timeUnit, json);
        if (formula is not null && !result.Journeys.IsDefaultOrEmpty)
        {
            JourneyComparisonRows.WriteJson(result.Journeys, JourneyFormula.Estimate(formula), timeUnit, json);
        }

        json.WriteEndObject();
        json.Flush();
    }

    private static void WriteRun(Utf8JsonWriter json, SimulationResult result)
    {
        var options = result.Options;
        var timeUnit = result.Network.TimeUnit;
        json.WriteStartObject("simulation");
        json.WriteNumber("seed", options.Seed);
        json.WriteNumber("replications", options.Replications);
        json.WriteNumber("replications_finished", result.ReplicationsFinished);
        json.WriteBoolean("complete", result.IsComplete);
        JsonTableWriter.WriteCell(json, "warmup", Cell.Of(options.WarmupHours, MetricDimension.Time), timeUnit);
        JsonTableWriter.WriteCell(json, "duration", Cell.Of(options.DurationHours, MetricDimension.Time), timeUnit);
        json.WriteString("warmup_from", options.IsWarmupFromModel ? "relaxation_time" : "given");
        json.WriteString("duration_from", options.IsDurationFromModel ? "relaxation_time" : "given");
        WriteNumberOrNull(json, "precision", options.Precision);
        if (result.PrecisionReached is bool reached)
        {
            json.WriteBoolean("precision_reached", reached);
        }
        else
        {
            json.WriteNull("precision_reached");
        }

        WriteNumberOrNull(json, "worst_relative_ci", result.WorstRelativeHalfWidth is double worst && double.IsFinite(worst) ? worst : null);
        WriteNumberOrNull(json, "max_replications", options.Precision is null ? null : options.MaxReplications);
        json.WriteNumber("events", result.Events);
        json.WriteNumber("confidence_level", Estimate.ConfidenceLevel);
        json.WriteEndObject();
    }

    private static void WriteNumberOrNull(Utf8JsonWriter json, string name, double? value)
    {
        if (value is double number)
        {
            json.WriteNumber(name, number);
        }
        else
        {
            json.WriteNull(name);
        }
    }

    /// <summary>
    /// The nested fields of a unit: percentiles, P(wait &gt; t) and the mean queue by hour of day, written from what
    /// was worked out for the first unit (the encoded names) and into one buffer of hours reused by every unit.
    /// </summary>
    private sealed class UnitDetails
    {
        private const string TimeInUnitPercentilesName = "time_in_unit_percentiles";
        private static readonly JsonEncodedText TimeInUnitPercentiles = JsonEncodedText.Encode(TimeInUnitPercentilesName);
        private static readonly JsonEncodedText WaitOver = JsonEncodedText.Encode("p_wait_over");
        private static readonly JsonEncodedText QueueByHour = JsonEncodedText.Encode("mean_queue_by_hour");
        private static readonly JsonEncodedText QueueByHourHalfWidth = JsonEncodedText.Encode("mean_queue_by_hour_ci");

        private readonly Fields<WaitOverEstimate> _waitOver = Fields<WaitOverEstimate>.Of(WaitOverColumns.ForJson);
        private readonly PercentileFields _percentiles = new();
        private Estimate?[] _hours = [];

        // Optimized from its first call: a one-time pass over 100,000 units spent most of its time here in tier-0 and
        // instrumented copies (docs/performance.md).
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        public void Write(Utf8JsonWriter json, SimulatedUnit unit, TimeUnit timeUnit)
        {
            json.WritePropertyName(TimeInUnitPercentiles);
            _percentiles.Write(json, TimeInUnitPercentilesName, unit.TimeInUnitPercentiles, timeUnit);
            json.WriteStartArray(WaitOver);
            foreach (var over in unit.WaitOver)
            {
                json.WriteStartObject();
                _waitOver.Write(json, over, timeUnit);
                json.WriteEndObject();
            }

            json.WriteEndArray();

            // Each hour's estimate is worked out from the replications' rows when read: read once for both arrays.
            var byHour = unit.MeanQueueByHour;
            if (_hours.Length != byHour.Count)
            {
                _hours = new Estimate?[byHour.Count];
            }

            for (int hour = 0; hour < _hours.Length; hour++)
            {
                _hours[hour] = byHour[hour];
            }

            WriteHourly(json, QueueByHour, _hours, EstimateCell.Mean, timeUnit);
            WriteHourly(json, QueueByHourHalfWidth, _hours, EstimateCell.HalfWidth, timeUnit);
        }
    }

    /// <summary>
    /// The machines' fields of a registry's columns with their names encoded once: written for each of many rows
    /// without building a table.
    /// </summary>
    private sealed class Fields<TRow>
    {
        private readonly Func<TRow, Cell>[] _read;
        private readonly JsonEncodedText[] _names;

        private Fields(Func<TRow, Cell>[] read, JsonEncodedText[] names)
        {
            _read = read;
            _names = names;
        }

        public static Fields<TRow> Of(IEnumerable<Column<TRow>> columns)
        {
            var shown = columns.Where(column => ResultTable.Shows(column.Audience, Audience.Machines)).ToArray();
            return new Fields<TRow>([.. shown.Select(column => column.Read)], [.. shown.Select(column => JsonEncodedText.Encode(column.Id))]);
        }

        /// <summary>Writes the fields of <paramref name="row"/> into the object being written.</summary>
        // Optimized from its first call: a one-time pass over 100,000 units spent most of its time here in tier-0 and
        // instrumented copies (docs/performance.md).
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        public void Write(Utf8JsonWriter json, TRow row, TimeUnit timeUnit)
        {
            for (int i = 0; i < _read.Length; i++)
            {
                JsonTableWriter.WriteCell(json, _names[i], _read[i](row), timeUnit);
            }
        }
    }

    /// <summary>
    /// A percentiles object (<c>{"p50": .., "p50_ci": .., ...}</c>, the machines' columns of <see cref="PercentileColumns"/>),
    /// with the columns made and their keys encoded once for as long as the percentiles asked for stay the same.
    /// </summary>
    private sealed class PercentileFields
    {
        private double[] _percents = [];
        private Fields<PercentileRow>? _fields;

        public void Write(Utf8JsonWriter json, string name, ImmutableArray<PercentileEstimate> percentiles, TimeUnit timeUnit)
        {
            if (_fields is null || !Matches(percentiles))
            {
                _percents = [.. percentiles.Select(percentile => percentile.Percent)];
                _fields = Fields<PercentileRow>.Of(PercentileColumns.Of(percentiles));
            }

            json.WriteStartObject();
            _fields.Write(json, new PercentileRow(name, percentiles), timeUnit);
            json.WriteEndObject();
        }

        private bool Matches(ImmutableArray<PercentileEstimate> percentiles)
        {
            if (percentiles.Length != _percents.Length)
            {
                return false;
            }

            for (int i = 0; i < _percents.Length; i++)
            {
                if (percentiles[i].Percent.CompareTo(_percents[i]) != 0)
                {
                    return false;
                }
            }

            return true;
        }
    }

    /// <summary>One object per compared metric, keyed by its name.</summary>
    private static void WriteComparison(Utf8JsonWriter json, ImmutableArray<ComparisonRow> rows, TimeUnit timeUnit)
    {
        var table = ResultTable.Build(ComparedMetricColumns.ForJson, rows, timeUnit);
        json.WriteStartObject("compare");
        for (int i = 0; i < rows.Length; i++)
        {
            json.WritePropertyName(rows[i].Metric.Name);
            JsonTableWriter.WriteObject(table, table.Rows[i], json);
        }

        json.WriteEndObject();
    }

    private static void WriteTotals(Utf8JsonWriter json, SimulatedTotals totals, TimeUnit timeUnit)
    {
        var table = ResultTable.Build(SimulatedTotalsColumns.ForJson, [totals], timeUnit);
        json.WriteStartObject("totals");
        WriteFields(json, table, table.Rows[0]);
        WritePercentiles(json, "time_in_system_percentiles", totals.TimeInSystemPercentiles, timeUnit);
        json.WriteEndObject();
    }

    private static void WriteGroups(Utf8JsonWriter json, ImmutableArray<SimulatedGroup> groups, TimeUnit timeUnit)
    {
        var table = ResultTable.Build(SimulatedGroupColumns.ForJson, groups, timeUnit);
        json.WriteStartArray("groups");
        for (int i = 0; i < groups.Length; i++)
        {
            json.WriteStartObject();
            WriteFields(json, table, table.Rows[i]);
            WritePercentiles(json, "time_in_system_percentiles", groups[i].TimeInSystemPercentiles, timeUnit);
            json.WriteEndObject();
        }

        json.WriteEndArray();
    }

    private static void WritePercentiles(Utf8JsonWriter json, string name, ImmutableArray<PercentileEstimate> percentiles, TimeUnit timeUnit)
    {
        json.WritePropertyName(name);
        new PercentileFields().Write(json, name, percentiles, timeUnit);
    }

    /// <summary>An array of one number per hour of day; null for an hour not measured (or without a half-width).</summary>
    // Optimized from its first call: a one-time pass over 100,000 units spent most of its time here in tier-0 and
    // instrumented copies (docs/performance.md).
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void WriteHourly(Utf8JsonWriter json, JsonEncodedText name, Estimate?[] byHour, Func<Estimate?, MetricDimension, Cell> cell, TimeUnit timeUnit)
    {
        json.WriteStartArray(name);
        foreach (var hour in byHour)
        {
            if (MachineFormat.Value(cell(hour, MetricDimension.Count), timeUnit) is double number)
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

    /// <summary>The fields of one row, without opening an object: nested fields follow them in the same object.</summary>
    private static void WriteFields(Utf8JsonWriter json, ResultTable table, IReadOnlyList<Cell> row)
    {
        foreach (int i in table.ColumnsFor(Audience.Machines))
        {
            JsonTableWriter.WriteCell(json, table.Columns[i].Id, row[i], table.TimeUnit);
        }
    }
}
