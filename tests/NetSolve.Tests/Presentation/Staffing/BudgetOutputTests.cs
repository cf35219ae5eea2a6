using NetSolve.Analysis;
using NetSolve.Presentation.Staffing;
using NetSolve.Solving;

namespace NetSolve.Tests.Presentation.Staffing;

public sealed class BudgetOutputTests
{
    [Fact]
    public void The_registry_ids_are_the_json_fields_in_the_order_written()
    {
        var plan = Plan(1);

        using var json = Written.Json(output => BudgetOutput.WriteJson(plan, output));
        var root = json.RootElement;

        Assert.Equal(["network", "time_unit", .. Written.MachineIds(BudgetTotalsColumns.All), "units"], Written.FieldNames(root));
        Assert.All(root.GetProperty("units").EnumerateArray(), unit => Assert.Equal(Written.MachineIds(BudgetColumns.All), Written.FieldNames(unit)));
    }

    [Fact]
    public void The_csv_header_is_the_registry_ids_and_the_contract_header()
    {
        string csv = Written.Text(output => BudgetOutput.WriteCsv(Plan(1), output));

        Assert.Equal(BudgetOutput.CsvHeader, string.Join(',', Written.MachineIds(BudgetColumns.Csv)));
        Assert.Equal(BudgetOutput.CsvHeader, csv.Split('\n')[0]);
    }

    [Fact]
    public void One_server_goes_to_the_desk_and_the_table_shows_each_wait_with_its_unit()
    {
        // Exact by hand: a second desk server takes its mean number present from ρ/(1 − ρ) = 1 to 8/15 (M/M/2, a = 0.5:
        // Lq = C·ρ/(1 − ρ) = 0.1·0.25/0.75 = 1/30, L = 1/30 + 0.5), while an eleventh bay server saves under 1e-6.
        // The desk's wait falls from 1 h to 4 min (see StaffingOutputTests).
        string table = Written.Text(output => BudgetOutput.WriteTable(Plan(1), output));

        Assert.StartsWith("test: where 1 extra servers cut the mean time in network most  (rates per hour)\n", table, StringComparison.Ordinal);
        Assert.Equal(["desk", "1", "1", "0", "50.0%", "25.0%", "1.000", "h", "4.000", "min"], Written.Cells(table, "desk"));
        Assert.DoesNotMatch(@"\dE[-+]?\d", table);
    }

    [Fact]
    public void The_patients_in_the_network_are_for_people_only()
    {
        using var json = Written.Json(output => BudgetOutput.WriteJson(Plan(1), output));

        Assert.False(json.RootElement.TryGetProperty("mean_in_system_before", out _));
        Assert.Contains("; patients in network ", Written.Text(output => BudgetOutput.WriteTable(Plan(1), output)), StringComparison.Ordinal);
    }

    private static BudgetPlan Plan(int servers) =>
        BudgetAllocation.Allocate(NetworkSolver.Solve(StaffingOutputTests.Network()), servers);
}
