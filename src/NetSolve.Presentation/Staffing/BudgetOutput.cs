using System.Text.Json;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Staffing;

/// <summary>Writes a <see cref="BudgetPlan"/> (where extra servers help most) as a table, JSON or CSV, all read through <see cref="BudgetColumns"/>.</summary>
/// <remarks>
/// JSON and CSV keep the network's time unit, which they state; the table shows each time in the unit that reads best.
/// The table carries no caution; the caller adds it.
/// </remarks>
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
        string Show(Column<BudgetPlan> total) => PeopleFormat.Cell(total.Read(plan), timeUnit);
        output.Write($"{plan.Before.Network.Name}: where {Show(BudgetTotalsColumns.Budget)} extra servers cut the mean time in network most  (rates per {TimeConstants.Name(timeUnit)})\n\n");
        PeopleTableWriter.Write(BudgetColumns.Table(plan, BudgetColumns.All), output);
        output.Write("\n");
        if (plan.Impossible is not null)
        {
            output.Write(plan.Impossible + "\n");
            return;
        }

        output.Write($"mean time in network {Show(BudgetTotalsColumns.MeanTimeInSystemBefore)} -> {Show(BudgetTotalsColumns.MeanTimeInSystemAfter)}; "
            + $"patients in network {Show(BudgetTotalsColumns.MeanInSystemBefore)} -> {Show(BudgetTotalsColumns.MeanInSystemAfter)}\n");
        if (plan.Spent is double spent && plan.Units.Select(unit => unit.UnitId).Any())
        {
            output.Write($"cost of the servers placed {PeopleFormat.Number(spent)} of a budget of {Show(BudgetTotalsColumns.Budget)}\n");
            output.Write("Placed exactly by dynamic programming over the budget (Bellman 1957): with servers of different costs the mean number of "
                + "patients present is minimised unit by unit over every way to spend the budget; each unit's term is decreasing and convex in its servers.\n");
            return;
        }

        output.Write("Placed one server at a time where the mean number of patients present falls most (marginal analysis). This is optimal: "
            + "the mean number present in an M/M/c unit is decreasing and convex in its servers (Dyer & Proll 1977, Management Science 23).\n");
    }

    /// <summary>Writes the budget allocation as one JSON document.</summary>
    public static void WriteJson(BudgetPlan plan, Stream output)
    {
        ArgumentNullException.ThrowIfNull(plan);
        using var json = new Utf8JsonWriter(output, new JsonWriterOptions { Indented = true });
        json.WriteStartObject();
        json.WriteString("network", plan.Before.Network.Name);
        json.WriteString("time_unit", TimeConstants.Name(plan.Before.Network.TimeUnit));
        var totals = BudgetTotalsColumns.Table(plan);
        JsonTableWriter.WriteFields(totals, totals.Rows[0], json);
        if (plan.Spent is double spent)
        {
            JsonTableWriter.WriteNumber(json, "spent", spent);
        }

        JsonTableWriter.WriteArray(BudgetColumns.Table(plan, BudgetColumns.All), "units", json);
        json.WriteEndObject();
        json.Flush();
    }

    /// <summary>Writes the budget allocation as CSV, one row per unit that can take servers.</summary>
    public static void WriteCsv(BudgetPlan plan, TextWriter output) => CsvTableWriter.Write(BudgetColumns.Table(plan, BudgetColumns.Csv), output);
}
