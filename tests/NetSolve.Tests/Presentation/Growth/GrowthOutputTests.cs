using System.Text;
using System.Text.Json;
using NetSolve.Analysis;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Growth;
using NetSolve.Presentation.Metrics;
using NetSolve.Solving;
using NetSolve.Tests.Analysis;

namespace NetSolve.Tests.Presentation.Growth;

public sealed class GrowthOutputTests
{
    [Fact]
    public void The_saturation_order_objects_have_exactly_the_registry_ids()
    {
        using var document = Json(Harbourside());
        var point = document.RootElement.GetProperty("saturation_order")[0];
        Assert.Equal(MachineIds(SaturationColumns.All), Names(point));
    }

    [Fact]
    public void A_step_and_its_units_have_exactly_the_registry_ids()
    {
        using var document = Json(Harbourside());
        var step = document.RootElement.GetProperty("steps")[0];
        string[] expected =
        [
            GrowthStepColumns.Factor.Id, GrowthStepColumns.ExternalArrivalRate.Id, "stable", GrowthStepColumns.MeanTimeInSystem.Id, "units",
        ];
        Assert.Equal(expected, Names(step));
        Assert.Equal(MachineIds(GrowthStepColumns.Units), Names(step.GetProperty("units")[0]));
    }

    [Fact]
    public void The_csv_header_is_the_registry_ids()
    {
        var growth = Harbourside();
        using var output = new StringWriter();
        GrowthOutput.WriteCsv(growth, output);
        Assert.Equal(GrowthOutput.CsvHeader, CsvTableWriter.Header(GrowthRowColumns.Table(growth)));
        Assert.StartsWith(GrowthOutput.CsvHeader + "\n", output.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void A_wait_far_below_a_minute_is_shown_without_an_exponent()
    {
        // Source: exact by hand. c = 20, a = 2 (λ = 2/h, S = 1 h): Erlang B(20, 2) ≈ 5.8e-14, C ≈ 6.5e-14 and
        // Wq = C / (cμ − λ) ≈ 3.6e-15 h, far below 0.001 min; the old table printed it as 3.6E-15.
        var network = SmallNetworks.Build([("ward", 20, 1.0)], [("ward", 2.0)]);
        var growth = GrowthAnalysis.Run(NetworkSolver.Solve(network), [1.0, 2.0]);
        using var output = new StringWriter();
        GrowthOutput.WriteTable(growth, output);
        string table = output.ToString();
        Assert.Contains("< 0.001 min", table, StringComparison.Ordinal);
        Assert.DoesNotContain("E-", table, StringComparison.Ordinal);
    }

    [Fact]
    public void The_table_shows_a_one_hour_wait_in_hours_beside_the_number()
    {
        // Source: exact by hand, M/M/1: λ = 0.5/h, S = 1 h gives Wq = ρ / (μ − λ) = 0.5 / 0.5 = 1 h; factor 1.5 gives
        // λ = 0.75/h and Wq = 0.75 / 0.25 = 3 h.
        var network = SmallNetworks.Build([("clinic", 1, 1.0)], [("clinic", 0.5)]);
        var growth = GrowthAnalysis.Run(NetworkSolver.Solve(network), [1.0, 1.5]);
        using var output = new StringWriter();
        GrowthOutput.WriteTable(growth, output);
        string table = output.ToString();
        Assert.Contains("1.000  1.000 h\n", table, StringComparison.Ordinal);
        Assert.Contains("1.500  3.000 h\n", table, StringComparison.Ordinal);
        Assert.Contains("(rates per hour, strain threshold 85.0%)", table, StringComparison.Ordinal);
    }

    private static GrowthResult Harbourside() =>
        GrowthAnalysis.Run(NetworkSolver.Solve(SmallNetworks.Example("harbourside.yaml")), [1.0, 1.1]);

    private static JsonDocument Json(GrowthResult growth)
    {
        using var buffer = new MemoryStream();
        GrowthOutput.WriteJson(growth, buffer);
        return JsonDocument.Parse(Encoding.UTF8.GetString(buffer.ToArray()));
    }

    private static string[] Names(JsonElement element) => [.. element.EnumerateObject().Select(property => property.Name)];

    private static string[] MachineIds<TRow>(IEnumerable<Column<TRow>> columns) =>
        [.. columns.Where(column => column.Audience != Audience.People).Select(column => column.Id)];
}
