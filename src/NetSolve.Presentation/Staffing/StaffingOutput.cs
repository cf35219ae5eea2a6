using System.Text.Json;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Staffing;

/// <summary>Writes a <see cref="StaffingPlan"/> (the targets search) as a table, JSON or CSV, all read through <see cref="StaffingColumns"/>.</summary>
/// <remarks>
/// JSON and CSV keep the network's time unit, which they state; the table shows each time in the unit that reads best.
/// The table carries no caution; the caller adds it.
/// </remarks>
public static class StaffingOutput
{
    /// <summary>The CSV header of a targets search.</summary>
    public const string TargetsCsvHeader = "id,servers,required,added,cost_per_server,cost,utilisation_before,utilisation_after,mean_wait_before,mean_wait_after,p_wait_over_after,p_full_after,time_unit";

    /// <summary>The targets in words for people: <c>stable, mean wait &lt;= 30.00 min</c>.</summary>
    public static string Describe(StaffingTargets targets, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(targets);
        string Show(Column<StaffingTargets> target) => PeopleFormat.Cell(target.Read(targets), timeUnit);
        var parts = new List<string> { "stable" };
        if (targets.MaxUtilisation is not null)
        {
            parts.Add($"utilisation <= {Show(StaffingTargetColumns.MaxUtilisation)}");
        }

        if (targets.MaxMeanWaitHours is not null)
        {
            parts.Add($"mean wait <= {Show(StaffingTargetColumns.MaxMeanWait)}");
        }

        if (targets.MaxMeanTimeInUnitHours is not null)
        {
            parts.Add($"mean time in unit <= {Show(StaffingTargetColumns.MaxMeanTimeInUnit)}");
        }

        if (targets.WaitTail is not null)
        {
            parts.Add($"P(wait > {Show(StaffingTargetColumns.WaitOver)}) <= {Show(StaffingTargetColumns.WaitOverAtMost)}");
        }

        if (targets.MaxTurnedAway is not null)
        {
            parts.Add($"P(full) <= {Show(StaffingTargetColumns.MaxTurnedAway)} where beds are limited");
        }

        return string.Join(", ", parts);
    }

    /// <summary>Writes the targets search as a table: servers now and needed, and the metrics before and after.</summary>
    public static void WriteTable(StaffingPlan plan, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(output);
        var timeUnit = plan.Before.Network.TimeUnit;
        string Show(Column<StaffingPlan> total) => PeopleFormat.Cell(total.Read(plan), timeUnit);
        output.Write($"{plan.Before.Network.Name}: fewest added servers so that every unit is {Describe(plan.Targets, timeUnit)}{(plan.Before.Network.Units.Any(unit => unit.Targets is { IsEmpty: false }) ? " and meets its own targets" : string.Empty)}  (rates per {TimeConstants.Name(timeUnit)})\n\n");
        bool limited = plan.Before.Network.Units.Any(unit => unit.Capacity is not null);
        PeopleTableWriter.Write(StaffingColumns.Table(plan, limited ? StaffingColumns.WithCapacity : StaffingColumns.All), output);
        output.Write("\n");
        foreach (var unit in plan.Units.Where(unit => unit.Impossible is not null))
        {
            output.Write($"unit '{unit.UnitId}' cannot meet the targets: {unit.Impossible}\n");
        }

        if (plan.IsFeasible)
        {
            output.Write($"added: {Show(StaffingTotalsColumns.TotalAdded)} servers in all, cost {Show(StaffingTotalsColumns.TotalCost)}; "
                + $"mean time in network {Show(StaffingTotalsColumns.MeanTimeInSystemBefore)} -> {Show(StaffingTotalsColumns.MeanTimeInSystemAfter)}\n");
            bool jackson = !limited && plan.Before.Units.All(unit => unit.ArrivalScv == 1.0 && unit.ServiceScv == 1.0);
            output.Write(jackson
                ? "Each unit's number is the exact minimum: flows do not depend on servers and every measure falls as servers are added, so units are searched one by one.\n"
                : "Each unit is searched by its own method at its solved flow and arrival variability, then the network is re-solved with the servers found (units with a capacity keep their waiting places); the numbers after are the solver's own for those servers.\n");
        }
    }

    /// <summary>Writes the targets search as one JSON document.</summary>
    public static void WriteJson(StaffingPlan plan, Stream output)
    {
        ArgumentNullException.ThrowIfNull(plan);
        using var json = new Utf8JsonWriter(output, new JsonWriterOptions { Indented = true });
        var timeUnit = plan.Before.Network.TimeUnit;
        json.WriteStartObject();
        json.WriteString("network", plan.Before.Network.Name);
        json.WriteString("time_unit", TimeConstants.Name(timeUnit));
        var targets = StaffingTargetColumns.Table(plan.Targets, timeUnit);
        json.WritePropertyName("targets");
        JsonTableWriter.WriteObject(targets, targets.Rows[0], json);
        json.WriteBoolean("feasible", plan.IsFeasible);
        var totals = StaffingTotalsColumns.Table(plan);
        JsonTableWriter.WriteFields(totals, totals.Rows[0], json);
        JsonTableWriter.WriteArray(StaffingColumns.Table(plan, StaffingColumns.Json), "units", json);
        json.WriteEndObject();
        json.Flush();
    }

    /// <summary>Writes the targets search as CSV, one row per unit.</summary>
    public static void WriteCsv(StaffingPlan plan, TextWriter output) => CsvTableWriter.Write(StaffingColumns.Table(plan, StaffingColumns.Csv), output);
}
