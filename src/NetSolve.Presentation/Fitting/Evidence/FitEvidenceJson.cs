using System.Text.Json;
using NetSolve.Fitting.Estimation;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Fitting.Evidence;

/// <summary>
/// The fit evidence as a JSON object (docs/movement-log.md, "How fit estimates and how sure it is"): times in the
/// network's time unit, rates per that unit, absent values null.
/// </summary>
public static class FitEvidenceJson
{
    /// <summary>Writes the object <c>fit_evidence</c> into the object being written.</summary>
    public static void Write(NetworkEvidence evidence, IReadOnlyDictionary<string, double?>? predictedWaitHours, TimeUnit timeUnit, Utf8JsonWriter json)
    {
        ArgumentNullException.ThrowIfNull(evidence);
        ArgumentNullException.ThrowIfNull(json);
        var table = FitEvidenceTable.Table(FitEvidenceRow.For(evidence, predictedWaitHours), timeUnit);
        json.WriteStartObject("fit_evidence");
        json.WriteNumber("confidence", EvidenceThresholds.Confidence);
        JsonTableWriter.WriteNumber(json, "window", MachineFormat.Value(Cell.Of(evidence.Window.Hours, MetricDimension.Time), timeUnit));
        WriteRate(json, "entry_rate", evidence.Entries, timeUnit);
        WriteProfile(json, evidence.Profile);
        json.WriteStartArray("units");
        for (int i = 0; i < evidence.Units.Length; i++)
        {
            var unit = evidence.Units[i];
            json.WriteStartObject();
            JsonTableWriter.WriteFields(table, table.Rows[i], json);
            WriteRate(json, "entry_rate", unit.Entries, timeUnit);
            json.WriteStartArray("routes");
            foreach (var route in unit.Routes)
            {
                json.WriteStartObject();
                json.WriteString("to", route.ToUnitId);
                json.WriteNumber("count", route.Count);
                json.WriteNumber("of", route.Total);
                JsonTableWriter.WriteNumber(json, "fraction", route.Fraction.Value);
                JsonTableWriter.WriteNumber(json, "fraction_lower", route.Fraction.Interval.Lower);
                JsonTableWriter.WriteNumber(json, "fraction_upper", route.Fraction.Interval.Upper);
                json.WriteEndObject();
            }

            json.WriteEndArray();
            json.WriteStartArray("warnings");
            foreach (var warning in unit.Warnings)
            {
                json.WriteStringValue(warning.Message);
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteEndObject();
    }

    private static void WriteRate(Utf8JsonWriter json, string name, RateEvidence rate, TimeUnit timeUnit)
    {
        json.WriteNumber(name.Replace("rate", "count", StringComparison.Ordinal), rate.Count);
        foreach (var (suffix, value) in new[] { ("", rate.PerHour.Value), ("_lower", rate.PerHour.Interval.Lower), ("_upper", rate.PerHour.Interval.Upper) })
        {
            JsonTableWriter.WriteNumber(json, name + suffix, MachineFormat.Value(Cell.Of(value, MetricDimension.Rate), timeUnit));
        }
    }

    private static void WriteProfile(Utf8JsonWriter json, ArrivalProfileEstimate profile)
    {
        json.WriteStartObject("arrival_profile");
        json.WriteString("hour_of_day", EvidenceWords.DecisionId(profile.HourOfDay.Decision));
        JsonTableWriter.WriteNumber(json, "hour_of_day_p_value", profile.HourOfDay.PValue);
        json.WriteString("day_of_week", EvidenceWords.DecisionId(profile.DayOfWeek.Decision));
        JsonTableWriter.WriteNumber(json, "day_of_week_p_value", profile.DayOfWeek.PValue);
        if (profile.Profile is { } written)
        {
            json.WriteStartArray("hour_of_day_multipliers");
            foreach (double multiplier in written.HourOfDay)
            {
                json.WriteNumberValue(multiplier);
            }

            json.WriteEndArray();
            json.WriteStartArray("day_of_week_multipliers");
            foreach (double multiplier in written.DayOfWeek)
            {
                json.WriteNumberValue(multiplier);
            }

            json.WriteEndArray();
        }

        json.WriteEndObject();
    }
}
