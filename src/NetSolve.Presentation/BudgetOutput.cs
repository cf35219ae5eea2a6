using NetSolve.Presentation.Formats;
using System.Globalization;
using System.Text.Json;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Presentation;

/// <summary>Writes a <see cref="BudgetPlan"/> (where extra servers help most) as a table, JSON or CSV.</summary>
/// <remarks>Times are in the network's time unit, which every format states. The table carries no caution; the caller adds it.</remarks>
public static class BudgetOutput
{
    /// <summary>The CSV header: one row per unit that can take servers.</summary>
    public const string CsvHeader = "id,servers,added,added_for_stability,utilisation_before,utilisation_after,mean_wait_before,mean_wait_after,time_unit";

    /// <summary>Writes the budget allocation as a table.</summary>
    public static void WriteTable(BudgetPlan plan, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(output);
        var timeUnit = plan.Before.Network.TimeUnit;
        string suffix = TimeConstants.Suffix(timeUnit);
        output.Write(string.Create(CultureInfo.InvariantCulture, $"{plan.Before.Network.Name}: where {plan.Budget} extra servers cut the mean time in network most  (times in {TimeConstants.Name(timeUnit)}s)\n\n"));
        var index = plan.Before.Network.BuildIndex();
        var table = new TextTable("unit", ">servers", ">added", ">for stability", ">util now", ">util after", $">wait now ({suffix})", $">wait after ({suffix})");
        foreach (var unit in plan.Units)
        {
            var before = plan.Before.Units[index[unit.UnitId]];
            var after = plan.After?.Units[index[unit.UnitId]];
            table.Add(
                unit.UnitId,
                unit.CurrentServers.ToString(CultureInfo.InvariantCulture),
                unit.Added == 0 ? Numbers.Missing : "+" + unit.Added.ToString(CultureInfo.InvariantCulture),
                unit.NeededForStability == 0 ? Numbers.Missing : unit.NeededForStability.ToString(CultureInfo.InvariantCulture),
                Numbers.Percent(before.Utilisation),
                Numbers.Percent(after?.Utilisation),
                Numbers.Compact(Wait(before, timeUnit)),
                Numbers.Compact(after is null ? null : Wait(after, timeUnit)));
        }

        table.Write(output);
        output.Write("\n");
        if (plan.Impossible is not null)
        {
            output.Write(plan.Impossible + "\n");
            return;
        }

        output.Write($"mean time in network {Numbers.Compact(Hours(plan.Before.Totals.MeanTimeInSystemHours, timeUnit))} -> "
            + $"{Numbers.Compact(Hours(plan.After!.Totals.MeanTimeInSystemHours, timeUnit))} {suffix}; patients in network "
            + $"{Numbers.Compact(plan.Before.Totals.MeanInSystem)} -> {Numbers.Compact(plan.After.Totals.MeanInSystem)}\n");
        output.Write("Placed one server at a time where the mean number of patients present falls most (marginal analysis). This is optimal: "
            + "the mean number present in an M/M/c unit is decreasing and convex in its servers (Dyer & Proll 1977, Management Science 23).\n");
    }

    /// <summary>Writes the budget allocation as one JSON document.</summary>
    public static void WriteJson(BudgetPlan plan, Stream output)
    {
        ArgumentNullException.ThrowIfNull(plan);
        using var json = new Utf8JsonWriter(output, new JsonWriterOptions { Indented = true });
        var timeUnit = plan.Before.Network.TimeUnit;
        var index = plan.Before.Network.BuildIndex();
        json.WriteStartObject();
        json.WriteString("network", plan.Before.Network.Name);
        json.WriteString("time_unit", TimeConstants.Name(timeUnit));
        json.WriteNumber("budget", plan.Budget);
        json.WriteNumber("placed", plan.Placed);
        if (plan.Impossible is null)
        {
            json.WriteNull("impossible");
        }
        else
        {
            json.WriteString("impossible", plan.Impossible);
        }

        JsonTableWriter.WriteNumber(json, "mean_time_in_system_before", Hours(plan.Before.Totals.MeanTimeInSystemHours, timeUnit));
        JsonTableWriter.WriteNumber(json, "mean_time_in_system_after", Hours(plan.After?.Totals.MeanTimeInSystemHours, timeUnit));
        json.WriteStartArray("units");
        foreach (var unit in plan.Units)
        {
            var before = plan.Before.Units[index[unit.UnitId]];
            var after = plan.After?.Units[index[unit.UnitId]];
            json.WriteStartObject();
            json.WriteString("id", unit.UnitId);
            json.WriteNumber("servers", unit.CurrentServers);
            json.WriteNumber("added", unit.Added);
            json.WriteNumber("added_for_stability", unit.NeededForStability);
            json.WriteNumber("utilisation_before", before.Utilisation);
            JsonTableWriter.WriteNumber(json, "utilisation_after", after?.Utilisation);
            JsonTableWriter.WriteNumber(json, "mean_wait_before", Wait(before, timeUnit));
            JsonTableWriter.WriteNumber(json, "mean_wait_after", after is null ? null : Wait(after, timeUnit));
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteEndObject();
        json.Flush();
    }

    /// <summary>Writes the budget allocation as CSV, one row per unit that can take servers.</summary>
    public static void WriteCsv(BudgetPlan plan, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(output);
        var timeUnit = plan.Before.Network.TimeUnit;
        var index = plan.Before.Network.BuildIndex();
        output.Write(CsvHeader + "\n");
        foreach (var unit in plan.Units)
        {
            var before = plan.Before.Units[index[unit.UnitId]];
            var after = plan.After?.Units[index[unit.UnitId]];
            output.Write(string.Join(',',
                MachineFormat.CsvText(unit.UnitId), MachineFormat.Csv(unit.CurrentServers), MachineFormat.Csv(unit.Added),
                MachineFormat.Csv(unit.NeededForStability), MachineFormat.Csv(before.Utilisation), MachineFormat.Csv(after?.Utilisation),
                MachineFormat.Csv(Wait(before, timeUnit)), MachineFormat.Csv(after is null ? null : Wait(after, timeUnit)),
                TimeConstants.Name(timeUnit)) + "\n");
        }
    }

    private static double? Wait(UnitResult result, TimeUnit timeUnit) => Hours(result.MeanWaitHours, timeUnit);

    private static double? Hours(double? hours, TimeUnit timeUnit) => hours is double h ? TimeConstants.FromHours(h, timeUnit) : null;
}
