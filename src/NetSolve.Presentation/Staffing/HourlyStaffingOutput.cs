using System.Globalization;
using System.Text.Json;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Staffing;

/// <summary>Writes an <see cref="HourlyStaffingPlan"/> as a table, JSON or CSV, all read through <see cref="HourlyStaffingColumns"/>.</summary>
public static class HourlyStaffingOutput
{
    private static ResultTable Table(HourlyStaffingPlan plan, TimeUnit timeUnit) => ResultTable.Build(
        HourlyStaffingColumns.All,
        plan.Units.SelectMany(unit => Enumerable.Range(0, unit.ServersByHour.Length).Select(hour => new HourlyStaffingRow(unit, hour))),
        timeUnit);

    /// <summary>Writes the rosters as a table, then staff-hours against the flat staffing per unit. The caller adds the caution.</summary>
    public static void WriteTable(HourlyStaffingPlan plan, string networkName, TimeUnit timeUnit, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(output);
        string cycle = plan.CycleHours == ArrivalProfile.HoursPerDay ? "day" : "week";
        output.Write($"{networkName}: fewest servers in each hour so that every hour is {StaffingOutput.Describe(plan.Targets, timeUnit)}\n\n");
        PeopleTableWriter.Write(Table(plan, timeUnit), output);
        output.Write("\n");
        foreach (var unit in plan.Units)
        {
            output.Write(string.Create(CultureInfo.InvariantCulture,
                $"unit '{unit.UnitId}' ({unit.Method}): {unit.StaffHours} staff-hours a {cycle} on the roster against {unit.FlatStaffHours} with {unit.FlatServers} servers all the time\n"));
        }
    }

    /// <summary>Writes the rosters as one JSON document: per unit its arrays by hour and its totals.</summary>
    public static void WriteJson(HourlyStaffingPlan plan, string networkName, TimeUnit timeUnit, Stream output)
    {
        ArgumentNullException.ThrowIfNull(plan);
        using var json = new Utf8JsonWriter(output, new JsonWriterOptions { Indented = true });
        json.WriteStartObject();
        json.WriteString("network", networkName);
        json.WriteString("time_unit", TimeConstants.Name(timeUnit));
        json.WriteNumber("cycle_hours", plan.CycleHours);
        json.WriteStartArray("units");
        foreach (var unit in plan.Units)
        {
            json.WriteStartObject();
            json.WriteString("id", unit.UnitId);
            json.WriteString("method", unit.Method);
            json.WriteNumber("staff_hours", unit.StaffHours);
            json.WriteNumber("flat_servers", unit.FlatServers);
            json.WriteNumber("flat_staff_hours", unit.FlatStaffHours);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        JsonTableWriter.WriteArray(Table(plan, timeUnit), "hours", json);
        json.WriteEndObject();
        json.Flush();
    }

    /// <summary>Writes the rosters as CSV, one row per unit and hour.</summary>
    public static void WriteCsv(HourlyStaffingPlan plan, TimeUnit timeUnit, TextWriter output) => CsvTableWriter.Write(Table(plan, timeUnit), output);
}
