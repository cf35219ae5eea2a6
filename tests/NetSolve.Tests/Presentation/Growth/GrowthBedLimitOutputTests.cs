using System.Text;
using System.Text.Json;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Growth;
using NetSolve.Solving;
using NetSolve.Tests.Analysis;

namespace NetSolve.Tests.Presentation.Growth;

public sealed class GrowthBedLimitOutputTests
{
    // Source: Erlang B table, 10 servers carry 4.461 erlangs at 1% and 6.216 at 5% blocking; today 5 erlangs, so the
    // factors are 0.892 and 1.243 (docs/reference-values.md, growth bed limits).
    private static GrowthResult LossUnit() => GrowthAnalysis.Run(NetworkSolver.Solve(new Network(
        "Loss test",
        TimeUnit.Hour,
        [new Unit("beds", "beds", Servers.Of(10), 1.0) { Capacity = 10 }, new Unit("clinic", "clinic", Servers.Of(2), 1.0)],
        [new Arrival("beds", 5.0), new Arrival("clinic", 1.0)],
        [])));

    [Fact]
    public void The_json_bed_limits_carry_the_factors_at_one_and_five_percent_full()
    {
        using var stream = new MemoryStream();
        GrowthOutput.WriteJson(LossUnit(), stream);
        using var document = JsonDocument.Parse(Encoding.UTF8.GetString(stream.ToArray()));
        var point = Assert.Single(document.RootElement.GetProperty("bed_limits").EnumerateArray());
        Assert.Equal(BedLimitColumns.All.Select(column => column.Id), point.EnumerateObject().Select(property => property.Name), StringComparer.Ordinal);
        Assert.Equal("beds", point.GetProperty("unit").GetString());
        Assert.Equal(0.892, point.GetProperty("full_1pct_at").GetDouble(), 0.001);
        Assert.Equal(1.243, point.GetProperty("full_5pct_at").GetDouble(), 0.001);
        // Exact by hand: a unit with a capacity is never in the saturation order; only the clinic is.
        Assert.Equal("clinic", Assert.Single(document.RootElement.GetProperty("saturation_order").EnumerateArray()).GetProperty("unit").GetString());
    }

    [Fact]
    public void The_table_shows_the_bed_limits_and_names_the_first_unit_to_refuse_one_percent()
    {
        using var output = new StringWriter();
        GrowthOutput.WriteTable(LossUnit(), output);
        string table = output.ToString();
        Assert.Contains("Bed limits", table, StringComparison.Ordinal);
        Assert.Contains("0.892", table, StringComparison.Ordinal);
        Assert.Contains("1.243", table, StringComparison.Ordinal);
        Assert.Contains("First bed limit to refuse 1% of arrivals: beds at x0.892 (already there at today's demand); 5% at x1.243", table, StringComparison.Ordinal);
        Assert.Contains("P(full) by growth factor", table, StringComparison.Ordinal);
    }

    [Fact]
    public void The_csv_appends_p_full_and_the_bed_limit_factors_when_a_unit_has_a_capacity()
    {
        using var output = new StringWriter();
        GrowthOutput.WriteCsv(LossUnit(), output);
        string[] lines = output.ToString().Split('\n');
        Assert.Equal(GrowthOutput.CsvHeader + "," + GrowthOutput.CsvBedLimitColumns, lines[0]);
        var beds = lines.First(line => line.StartsWith("1,beds,", StringComparison.Ordinal)).Split(',');
        Assert.Equal(0.892, double.Parse(beds[^2], System.Globalization.CultureInfo.InvariantCulture), 0.001);
        Assert.Equal(1.243, double.Parse(beds[^1], System.Globalization.CultureInfo.InvariantCulture), 0.001);
        var clinic = lines.First(line => line.StartsWith("1,clinic,", StringComparison.Ordinal)).Split(',');
        Assert.Equal(string.Empty, clinic[^1]);
    }

    [Fact]
    public void A_network_without_capacities_keeps_the_csv_header_and_writes_an_empty_bed_limits_array()
    {
        var growth = GrowthAnalysis.Run(NetworkSolver.Solve(SmallNetworks.Build([("ward", 2, 1.0)], [("ward", 1.0)])));
        using var csv = new StringWriter();
        GrowthOutput.WriteCsv(growth, csv);
        Assert.StartsWith(GrowthOutput.CsvHeader + "\n", csv.ToString(), StringComparison.Ordinal);
        Assert.Equal(GrowthOutput.CsvHeader, CsvTableWriter.Header(GrowthRowColumns.Table(growth)));
        using var stream = new MemoryStream();
        GrowthOutput.WriteJson(growth, stream);
        using var document = JsonDocument.Parse(Encoding.UTF8.GetString(stream.ToArray()));
        Assert.Equal(0, document.RootElement.GetProperty("bed_limits").GetArrayLength());
    }
}
