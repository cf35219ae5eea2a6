using NetSolve.Presentation.Formats;
using System.Globalization;
using System.Text.Json;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Presentation;

/// <summary>Writes a <see cref="StaffingPlan"/> (the targets search) as a table, JSON or CSV.</summary>
/// <remarks>Times are in the network's time unit, which every format states. The table carries no caution; the caller adds it.</remarks>
public static class StaffingOutput
{
    /// <summary>The CSV header of a targets search.</summary>
    public const string TargetsCsvHeader = "id,servers,required,added,cost_per_server,cost,utilisation_before,utilisation_after,mean_wait_before,mean_wait_after,p_wait_over_after,time_unit";

    /// <summary>The targets in words, in the network's time unit.</summary>
    public static string Describe(StaffingTargets targets, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(targets);
        var parts = new List<string> { "stable" };
        if (targets.MaxUtilisation is double u)
        {
            parts.Add($"utilisation <= {Numbers.Percent(u)}");
        }

        if (targets.MaxMeanWaitHours is double w)
        {
            parts.Add($"mean wait <= {Time(w, timeUnit)}");
        }

        if (targets.MaxMeanTimeInUnitHours is double t)
        {
            parts.Add($"mean time in unit <= {Time(t, timeUnit)}");
        }

        if (targets.WaitTail is WaitTailTarget tail)
        {
            parts.Add($"P(wait > {Time(tail.WaitHours, timeUnit)}) <= {Numbers.Percent(tail.MaxProbability)}");
        }

        return string.Join(", ", parts);
    }

    /// <summary>Writes the targets search as a table: servers now and needed, and the metrics before and after.</summary>
    public static void WriteTable(StaffingPlan plan, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(output);
        var timeUnit = plan.Before.Network.TimeUnit;
        string suffix = TimeConstants.Suffix(timeUnit);
        output.Write($"{plan.Before.Network.Name}: fewest added servers so that every unit is {Describe(plan.Targets, timeUnit)}  (times in {TimeConstants.Name(timeUnit)}s)\n\n");
        var table = new TextTable("unit", ">servers", ">needed", ">added", ">cost", ">util now", ">util after", $">wait now ({suffix})", $">wait after ({suffix})", ">P(long wait) after");
        for (int i = 0; i < plan.Units.Length; i++)
        {
            var unit = plan.Units[i];
            var before = plan.Before.Units[i];
            var after = plan.After?.Units[i];
            table.Add(
                unit.UnitId,
                before.Unit.Servers.ToString(),
                unit.RequiredServers?.ToString(CultureInfo.InvariantCulture) ?? (unit.CurrentServers is null ? "unlimited" : "impossible"),
                unit.Added == 0 ? Numbers.Missing : "+" + unit.Added.ToString(CultureInfo.InvariantCulture),
                unit.Added == 0 ? Numbers.Missing : Numbers.Compact(unit.Cost),
                Numbers.Percent(before.Utilisation),
                Numbers.Percent(after?.Utilisation),
                Numbers.Compact(Wait(before, timeUnit)),
                Numbers.Compact(after is null ? null : Wait(after, timeUnit)),
                after is null ? Numbers.Missing : Numbers.Percent(LongWait(after, plan.Targets)));
        }

        table.Write(output);
        output.Write("\n");
        foreach (var unit in plan.Units.Where(unit => unit.Impossible is not null))
        {
            output.Write($"unit '{unit.UnitId}' cannot meet the targets: {unit.Impossible}\n");
        }

        if (plan.IsFeasible)
        {
            output.Write(string.Create(CultureInfo.InvariantCulture, $"added: {plan.TotalAdded} servers in all, cost {Numbers.Compact(plan.TotalCost)}; mean time in network ")
                + $"{Numbers.Compact(Hours(plan.Before.Totals.MeanTimeInSystemHours, timeUnit))} -> {Numbers.Compact(Hours(plan.After!.Totals.MeanTimeInSystemHours, timeUnit))} {suffix}\n");
            output.Write("Each unit's number is the exact minimum: flows do not depend on servers and every measure falls as servers are added, so units are searched one by one.\n");
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
        json.WriteStartObject("targets");
        JsonTableWriter.WriteNumber(json, "max_utilisation", plan.Targets.MaxUtilisation);
        JsonTableWriter.WriteNumber(json, "max_mean_wait", Hours(plan.Targets.MaxMeanWaitHours, timeUnit));
        JsonTableWriter.WriteNumber(json, "max_mean_time_in_unit", Hours(plan.Targets.MaxMeanTimeInUnitHours, timeUnit));
        JsonTableWriter.WriteNumber(json, "wait_over", Hours(plan.Targets.WaitTail?.WaitHours, timeUnit));
        JsonTableWriter.WriteNumber(json, "wait_over_at_most", plan.Targets.WaitTail?.MaxProbability);
        json.WriteEndObject();
        json.WriteBoolean("feasible", plan.IsFeasible);
        json.WriteNumber("total_added", plan.TotalAdded);
        json.WriteNumber("total_cost", plan.TotalCost);
        JsonTableWriter.WriteNumber(json, "mean_time_in_system_before", Hours(plan.Before.Totals.MeanTimeInSystemHours, timeUnit));
        JsonTableWriter.WriteNumber(json, "mean_time_in_system_after", Hours(plan.After?.Totals.MeanTimeInSystemHours, timeUnit));
        json.WriteStartArray("units");
        for (int i = 0; i < plan.Units.Length; i++)
        {
            var unit = plan.Units[i];
            var before = plan.Before.Units[i];
            var after = plan.After?.Units[i];
            json.WriteStartObject();
            json.WriteString("id", unit.UnitId);
            JsonTableWriter.WriteNumber(json, "servers", unit.CurrentServers);
            JsonTableWriter.WriteNumber(json, "required", unit.RequiredServers);
            json.WriteNumber("added", unit.Added);
            json.WriteNumber("cost_per_server", unit.CostPerServer);
            json.WriteNumber("cost", unit.Cost);
            json.WriteNumber("utilisation_before", before.Utilisation);
            JsonTableWriter.WriteNumber(json, "utilisation_after", after?.Utilisation);
            JsonTableWriter.WriteNumber(json, "mean_wait_before", Wait(before, timeUnit));
            JsonTableWriter.WriteNumber(json, "mean_wait_after", after is null ? null : Wait(after, timeUnit));
            JsonTableWriter.WriteNumber(json, "p_wait_over_after", after is null ? null : LongWait(after, plan.Targets));
            if (unit.Impossible is null)
            {
                json.WriteNull("impossible");
            }
            else
            {
                json.WriteString("impossible", unit.Impossible);
            }

            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteEndObject();
        json.Flush();
    }

    /// <summary>Writes the targets search as CSV, one row per unit.</summary>
    public static void WriteCsv(StaffingPlan plan, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(output);
        var timeUnit = plan.Before.Network.TimeUnit;
        output.Write(TargetsCsvHeader + "\n");
        for (int i = 0; i < plan.Units.Length; i++)
        {
            var unit = plan.Units[i];
            var before = plan.Before.Units[i];
            var after = plan.After?.Units[i];
            output.Write(string.Join(',',
                MachineFormat.CsvText(unit.UnitId), unit.CurrentServers?.ToString(CultureInfo.InvariantCulture) ?? "unlimited",
                MachineFormat.Csv(unit.RequiredServers), MachineFormat.Csv(unit.Added), MachineFormat.Csv(unit.CostPerServer),
                MachineFormat.Csv(unit.Cost), MachineFormat.Csv(before.Utilisation), MachineFormat.Csv(after?.Utilisation),
                MachineFormat.Csv(Wait(before, timeUnit)), MachineFormat.Csv(after is null ? null : Wait(after, timeUnit)),
                MachineFormat.Csv(after is null ? null : LongWait(after, plan.Targets)), TimeConstants.Name(timeUnit)) + "\n");
        }
    }

    private static double? Wait(UnitResult result, TimeUnit timeUnit) => Hours(result.MeanWaitHours, timeUnit);

    private static double? Hours(double? hours, TimeUnit timeUnit) => hours is double h ? TimeConstants.FromHours(h, timeUnit) : null;

    private static string Time(double hours, TimeUnit timeUnit) => Numbers.Compact(TimeConstants.FromHours(hours, timeUnit)) + " " + TimeConstants.Suffix(timeUnit);

    private static double? LongWait(UnitResult result, StaffingTargets targets)
    {
        if (targets.WaitTail is not WaitTailTarget tail || !result.IsStable)
        {
            return null;
        }

        return result.Unit.Servers.IsUnlimited || !(result.ArrivalsPerHour > 0.0)
            ? 0.0
            : ErlangFormulas.WaitLongerThan(result.Unit.Servers.Count, result.OfferedLoad, result.Unit.MeanServiceHours, tail.WaitHours);
    }
}
