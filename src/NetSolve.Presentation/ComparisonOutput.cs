using NetSolve.Presentation.Formats;
using System.Globalization;
using System.Text.Json;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Presentation;

/// <summary>Writes a <see cref="ComparisonResult"/> as tables for people, as JSON, or as long-format CSV.</summary>
/// <remarks>Every time is in the base network's time unit, which every format states.</remarks>
public static class ComparisonOutput
{
    /// <summary>The status word for a unit the scenario added (absent from the base).</summary>
    public const string Added = "added";

    /// <summary>The status word for a unit the scenario closed (absent from the scenario).</summary>
    public const string Closed = "closed";

    /// <summary>The CSV header: one row per scenario, unit and metric; the network totals have an empty unit.</summary>
    public const string CsvHeader = "scenario,unit,metric,base,scenario_value,change,relative_change,time_unit";

    /// <summary>Writes one section per scenario: the unit table, totals, status changes and the bottleneck.</summary>
    public static void WriteTable(ComparisonResult comparison, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(comparison);
        ArgumentNullException.ThrowIfNull(output);
        var timeUnit = comparison.Base.Network.TimeUnit;
        string suffix = TimeConstants.Suffix(timeUnit);
        output.Write($"Base: {comparison.BaseName}  (times in {TimeConstants.Name(timeUnit)}s; change = scenario minus base)\n");
        foreach (var scenario in comparison.Scenarios)
        {
            output.Write($"\nScenario: {scenario.Name}\n");
            var table = new TextTable("unit", ">servers", ">util base", ">util", ">change", $">wait base ({suffix})", $">wait ({suffix})",
                ">change", ">change %", $">time base ({suffix})", $">time ({suffix})", "status");
            foreach (var unit in scenario.Units)
            {
                var wait = unit.MeanWaitHours;
                var time = unit.MeanTimeInUnitHours;
                table.Add(
                    unit.UnitId,
                    ServersCell(unit),
                    Numbers.Percent(unit.Before?.Utilisation),
                    Numbers.Percent(unit.After?.Utilisation),
                    Points(unit.Utilisation.Absolute),
                    Time(wait.Before, timeUnit),
                    Time(wait.After, timeUnit),
                    Signed(wait.Absolute is double d ? TimeConstants.FromHours(d, timeUnit) : null),
                    Numbers.Percent(wait.Relative),
                    Time(time.Before, timeUnit),
                    Time(time.After, timeUnit),
                    StatusCell(unit));
            }

            table.Write(output);
            output.Write("\n" + Totals(scenario, timeUnit) + "\n");
            output.Write(StatusChanges(scenario) + "\n");
            output.Write(Bottleneck(comparison, scenario) + "\n");
        }
    }

    /// <summary>Writes one JSON document.</summary>
    public static void WriteJson(ComparisonResult comparison, Stream output)
    {
        ArgumentNullException.ThrowIfNull(comparison);
        using var json = new Utf8JsonWriter(output, new JsonWriterOptions { Indented = true });
        var timeUnit = comparison.Base.Network.TimeUnit;
        json.WriteStartObject();
        json.WriteString("base", comparison.BaseName);
        json.WriteString("time_unit", TimeConstants.Name(timeUnit));
        Ids(json, "base_bottleneck", comparison.BaseBottlenecks);
        json.WriteStartArray("scenarios");
        foreach (var scenario in comparison.Scenarios)
        {
            json.WriteStartObject();
            json.WriteString("name", scenario.Name);
            json.WriteBoolean("stable", scenario.Solution.IsStable);
            Ids(json, "bottleneck", scenario.Bottlenecks);
            json.WriteBoolean("bottleneck_changed", !scenario.Bottlenecks.SequenceEqual(comparison.BaseBottlenecks));
            json.WriteStartObject("totals");
            Change(json, "external_arrival_rate", Rate(scenario.ExternalArrivalsPerHour, timeUnit));
            Change(json, "mean_in_system", scenario.MeanInSystem);
            Change(json, "mean_time_in_system", Hours(scenario.MeanTimeInSystemHours, timeUnit));
            json.WriteEndObject();
            json.WriteStartArray("units");
            foreach (var unit in scenario.Units)
            {
                json.WriteStartObject();
                json.WriteString("id", unit.UnitId);
                json.WriteString("status_base", StatusName(unit.Before));
                json.WriteString("status", StatusName(unit.After, Closed));
                json.WriteBoolean("status_changed", unit.StatusChanged);
                Change(json, "servers", unit.Servers);
                Change(json, "arrival_rate", Rate(unit.ArrivalsPerHour, timeUnit));
                Change(json, "utilisation", unit.Utilisation);
                Change(json, "mean_wait", Hours(unit.MeanWaitHours, timeUnit));
                Change(json, "mean_time_in_unit", Hours(unit.MeanTimeInUnitHours, timeUnit));
                Change(json, "mean_in_unit", unit.MeanInUnit);
                json.WriteEndObject();
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteEndObject();
        json.Flush();
    }

    /// <summary>Writes long-format CSV: per scenario, the totals (empty unit), then each unit's metrics and status.</summary>
    public static void WriteCsv(ComparisonResult comparison, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(comparison);
        ArgumentNullException.ThrowIfNull(output);
        var timeUnit = comparison.Base.Network.TimeUnit;
        string unitName = TimeConstants.Name(timeUnit);
        output.Write(CsvHeader + "\n");
        foreach (var scenario in comparison.Scenarios)
        {
            string name = MachineFormat.CsvText(scenario.Name);
            void Row(string unit, string metric, MetricChange change) => output.Write(string.Join(',', name, unit, metric,
                MachineFormat.Csv(change.Before), MachineFormat.Csv(change.After), MachineFormat.Csv(change.Absolute),
                MachineFormat.Csv(change.Relative), unitName) + "\n");

            Row(string.Empty, "external_arrival_rate", Rate(scenario.ExternalArrivalsPerHour, timeUnit));
            Row(string.Empty, "mean_in_system", scenario.MeanInSystem);
            Row(string.Empty, "mean_time_in_system", Hours(scenario.MeanTimeInSystemHours, timeUnit));
            foreach (var unit in scenario.Units)
            {
                string id = MachineFormat.CsvText(unit.UnitId);
                Row(id, "servers", unit.Servers);
                Row(id, "arrival_rate", Rate(unit.ArrivalsPerHour, timeUnit));
                Row(id, "utilisation", unit.Utilisation);
                Row(id, "mean_wait", Hours(unit.MeanWaitHours, timeUnit));
                Row(id, "mean_time_in_unit", Hours(unit.MeanTimeInUnitHours, timeUnit));
                Row(id, "mean_in_unit", unit.MeanInUnit);
                output.Write(string.Join(',', name, id, "status", StatusName(unit.Before), StatusName(unit.After, Closed),
                    unit.StatusChanged ? "changed" : string.Empty, string.Empty, unitName) + "\n");
            }
        }
    }

    /// <summary>One line: network totals before and after.</summary>
    public static string Totals(ScenarioComparison scenario, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        var inSystem = scenario.MeanInSystem;
        var time = Hours(scenario.MeanTimeInSystemHours, timeUnit);
        return $"patients in network {Numbers.Compact(inSystem.Before)} -> {Numbers.Compact(inSystem.After)} ({Signed(inSystem.Absolute)}, {Numbers.Percent(inSystem.Relative)}); "
            + $"mean time in network {Numbers.Compact(time.Before)} -> {Numbers.Compact(time.After)} {TimeConstants.Suffix(timeUnit)} ({Signed(time.Absolute)}, {Numbers.Percent(time.Relative)})"
            + (scenario.Solution.IsStable ? string.Empty : "; the scenario is UNSTABLE: network totals do not exist");
    }

    /// <summary>One line listing units whose status changed.</summary>
    public static string StatusChanges(ScenarioComparison scenario)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        var changes = scenario.StatusChanges.Select(unit => $"{unit.UnitId} {StatusName(unit.Before)} -> {StatusName(unit.After, Closed)}").ToList();
        return changes.Count == 0 ? "status changes: none" : "status changes: " + string.Join("; ", changes);
    }

    /// <summary>One line naming the scenario's bottleneck and whether it moved.</summary>
    public static string Bottleneck(ComparisonResult comparison, ScenarioComparison scenario)
    {
        ArgumentNullException.ThrowIfNull(comparison);
        ArgumentNullException.ThrowIfNull(scenario);
        string now = scenario.Bottlenecks.IsEmpty ? "none" : string.Join(", ", scenario.Bottlenecks);
        string was = comparison.BaseBottlenecks.IsEmpty ? "none" : string.Join(", ", comparison.BaseBottlenecks);
        return scenario.Bottlenecks.SequenceEqual(comparison.BaseBottlenecks)
            ? $"bottleneck: {now} (unchanged)"
            : $"new bottleneck: {now} (was {was})";
    }

    private static string StatusName(UnitResult? result, string absent = Added) => result is null ? absent : StatusWords.Name(result.Status);

    private static string StatusCell(UnitComparison unit) => unit.StatusChanged
        ? $"{StatusName(unit.Before)} -> {StatusName(unit.After, Closed)}"
        : StatusName(unit.After, Closed);

    private static string ServersCell(UnitComparison unit)
    {
        static string Of(UnitResult? result) => result is null ? Numbers.Missing : result.Unit.Servers.ToString();
        string before = Of(unit.Before);
        string after = Of(unit.After);
        return before == after ? after : $"{before} -> {after}";
    }

    private static string Time(double? hours, TimeUnit timeUnit) => Numbers.Compact(hours is double h ? TimeConstants.FromHours(h, timeUnit) : null);

    private static string Points(double? change) => change is double d
        ? (d * 100.0).ToString("+0.0;-0.0;0.0", CultureInfo.InvariantCulture) + " pt"
        : Numbers.Missing;

    private static string Signed(double? value) => value is double d && d > 0.0 ? "+" + Numbers.Compact(d) : Numbers.Compact(value);

    private static MetricChange Hours(MetricChange change, TimeUnit timeUnit) => new(
        change.Before is double b ? TimeConstants.FromHours(b, timeUnit) : null,
        change.After is double a ? TimeConstants.FromHours(a, timeUnit) : null);

    private static MetricChange Rate(MetricChange change, TimeUnit timeUnit) => new(
        change.Before is double b ? TimeConstants.RateFromPerHour(b, timeUnit) : null,
        change.After is double a ? TimeConstants.RateFromPerHour(a, timeUnit) : null);

    private static void Ids(Utf8JsonWriter json, string name, IEnumerable<string> ids)
    {
        json.WriteStartArray(name);
        foreach (var id in ids)
        {
            json.WriteStringValue(id);
        }

        json.WriteEndArray();
    }

    private static void Change(Utf8JsonWriter json, string name, MetricChange change)
    {
        json.WriteStartObject(name);
        JsonTableWriter.WriteNumber(json, "base", change.Before);
        JsonTableWriter.WriteNumber(json, "scenario", change.After);
        JsonTableWriter.WriteNumber(json, "change", change.Absolute);
        JsonTableWriter.WriteNumber(json, "relative_change", change.Relative);
        json.WriteEndObject();
    }
}
