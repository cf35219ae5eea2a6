using System.Text;
using System.Text.Json;
using System.Text.RegularExpressions;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Scenarios;
using NetSolve.Solving;
using NetSolve.Tests.Analysis;

namespace NetSolve.Tests.Presentation.Scenarios;

public sealed class ComparisonOutputTests
{
    [Fact]
    public void A_unit_object_has_its_status_then_exactly_the_registry_metrics()
    {
        using var document = Json(Millbrook());
        var unit = document.RootElement.GetProperty("scenarios")[0].GetProperty("units")[0];
        string[] expected = ["id", "status_base", "status", "status_changed", .. ComparedMetrics.Units.Select(column => column.Id)];
        Assert.Equal(expected, unit.EnumerateObject().Select(property => property.Name), StringComparer.Ordinal);
    }

    [Fact]
    public void The_totals_object_has_exactly_the_registry_metrics()
    {
        using var document = Json(Millbrook());
        var totals = document.RootElement.GetProperty("scenarios")[0].GetProperty("totals");
        Assert.Equal(ComparedMetrics.Totals.Select(column => column.Id), totals.EnumerateObject().Select(property => property.Name), StringComparer.Ordinal);
    }

    [Fact]
    public void The_csv_rows_name_the_registry_metrics_in_order()
    {
        var comparison = Millbrook();
        using var output = new StringWriter();
        ComparisonOutput.WriteCsv(comparison, output);
        var lines = output.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(ComparisonOutput.CsvHeader, lines[0]);
        int totals = ComparedMetrics.Totals.Length;
        int perUnit = ComparedMetrics.Units.Length + 1;
        string[] expected = [.. ComparedMetrics.Totals.Select(c => c.Id), .. ComparedMetrics.Units.Select(c => c.Id), "status"];
        Assert.Equal(expected, lines.Skip(1).Take(totals + perUnit).Select(line => line.Split(',')[2]), StringComparer.Ordinal);
    }

    [Fact]
    public void In_the_json_change_is_scenario_minus_base_to_the_last_bit_in_the_file_unit()
    {
        // Source: docs/analysis.md, compare: the change is scenario minus base and the relative change is over the
        // base; millbrook is in minutes, so the values are converted before the change is taken.
        using var document = Json(Millbrook());
        foreach (var unit in document.RootElement.GetProperty("scenarios")[0].GetProperty("units").EnumerateArray())
        {
            foreach (var metric in unit.EnumerateObject().Where(property => property.Value.ValueKind == JsonValueKind.Object))
            {
                var change = metric.Value;
                if (change.GetProperty("base").ValueKind != JsonValueKind.Number || change.GetProperty("scenario").ValueKind != JsonValueKind.Number)
                {
                    continue;
                }

                double before = change.GetProperty("base").GetDouble();
                double after = change.GetProperty("scenario").GetDouble();
                Assert.Equal(after - before, change.GetProperty("change").GetDouble());
            }
        }
    }

    [Fact]
    public void The_table_signs_changes_and_writes_each_time_with_its_unit()
    {
        // Source: exact by hand, M/M/1 with S = 1 h: λ = 0.5/h gives ρ = 0.5, Wq = ρ / (μ − λ) = 1 h, W = 2 h;
        // λ = 0.75/h gives ρ = 0.75, Wq = 0.75 / 0.25 = 3 h, W = 4 h. Change +2 h, +200%; utilisation +25 points.
        var before = NetworkSolver.Solve(SmallNetworks.Build([("clinic", 1, 1.0)], [("clinic", 0.5)]));
        var after = NetworkSolver.Solve(SmallNetworks.Build([("clinic", 1, 1.0)], [("clinic", 0.75)]));
        string table = Table(NetworkComparison.Compare("base", before, [("busier", after)]));
        string row = table.Split('\n').Single(line => line.StartsWith("clinic ", StringComparison.Ordinal));
        string[] expected = ["clinic", "1", "50.0%", "75.0%", "+25.0 pt", "1.000 h", "3.000 h", "+2.000 h", "+200.0%", "2.000 h", "4.000 h", ">> bottleneck"];
        Assert.Equal(expected, Regex.Split(row.Trim(), " {2,}"));
        Assert.Contains("(rates per hour, strain threshold 85.0%; change = scenario minus base)", table, StringComparison.Ordinal);
    }

    [Fact]
    public void A_wait_far_below_a_minute_is_shown_without_an_exponent()
    {
        // Source: exact by hand. c = 20, a = 2: Wq ≈ 3.6e-15 h (Erlang C ≈ 6.5e-14 over cμ − λ = 18/h); with 21
        // servers it is smaller still. The old table printed these as 3.6E-15.
        var before = NetworkSolver.Solve(SmallNetworks.Build([("ward", 20, 1.0)], [("ward", 2.0)]));
        var after = NetworkSolver.Solve(SmallNetworks.Build([("ward", 21, 1.0)], [("ward", 2.0)]));
        string table = Table(NetworkComparison.Compare("base", before, [("one more bed", after)]));
        Assert.Contains("< 0.001 min", table, StringComparison.Ordinal);
        Assert.DoesNotContain("E-", table, StringComparison.Ordinal);
    }

    private static ComparisonResult Millbrook()
    {
        var network = SmallNetworks.Example("millbrook-clinic.yaml");
        var busier = network with { Arrivals = [.. network.Arrivals.Select(arrival => arrival with { PerHour = arrival.PerHour * 1.1 })] };
        Assert.Equal(TimeUnit.Minute, network.TimeUnit);
        return NetworkComparison.Compare("millbrook", NetworkSolver.Solve(network), [("busier", NetworkSolver.Solve(busier))]);
    }

    private static JsonDocument Json(ComparisonResult comparison)
    {
        using var buffer = new MemoryStream();
        ComparisonOutput.WriteJson(comparison, buffer);
        return JsonDocument.Parse(Encoding.UTF8.GetString(buffer.ToArray()));
    }

    private static string Table(ComparisonResult comparison)
    {
        using var output = new StringWriter();
        ComparisonOutput.WriteTable(comparison, output);
        return output.ToString();
    }
}
