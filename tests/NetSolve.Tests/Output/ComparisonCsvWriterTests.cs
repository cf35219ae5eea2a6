using System.Globalization;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Presentation.Simulation;
using NetSolve.Simulation;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Output;

[Collection(CultureSensitiveCollection.Name)]
public sealed class ComparisonCsvWriterTests
{
    // The file format forbids commas and quotes in ids, but Core takes any id, so the writer must still quote it.
    private const string AwkwardId = "ward \"b\", east";

    private static readonly string[] MetricsInTableOrder =
        ["arrival_rate", "utilisation", "p_wait", "mean_queue", "mean_wait", "mean_in_unit", "mean_time_in_unit"];

    [Fact]
    public void The_first_line_is_the_header()
    {
        string csv = Csv(SimulateAndSolve(replications: 3));

        Assert.Equal("unit,metric,formula,simulated,simulated_ci,verdict,time_unit,relative_error,method,formula_exact,suspect,relative_error_ci", csv.Split('\n')[0]);
    }

    [Fact]
    public void The_header_is_the_ids_of_the_registry_columns_for_programs()
    {
        var run = SimulateAndSolve(replications: 3);

        Assert.Equal(ComparisonCsvWriter.Header, CsvTableWriter.Header(ComparedMetricColumns.Table(run.Simulated, run.Formula)));
    }

    [Fact]
    public void Each_unit_has_one_row_per_compared_metric_in_file_order()
    {
        var rows = CsvRows.Parse(Csv(SimulateAndSolve(replications: 3)));

        var expected = new[] { "triage", AwkwardId }.SelectMany(unit => MetricsInTableOrder.Select(metric => (unit, metric)));
        Assert.Equal(expected, rows.Skip(1).Select(row => (row[0], row[1])));
        Assert.All(rows, row => Assert.Equal(12, row.Length));
    }

    // One replication gives "no interval"; the ward's formula is unstable ("no formula"); five replications let the
    // stable triage unit be judged "inside" or "outside". Every verdict word is thus checked against the table.
    [Theory]
    [InlineData(1, new[] { "no interval", "no formula" })]
    [InlineData(5, new[] { "inside", "no formula" })]
    public void Every_row_shows_the_values_and_verdict_of_the_table_on_the_same_result(int replications, string[] verdictsPresent)
    {
        var run = SimulateAndSolve(replications);
        using var table = new StringWriter(CultureInfo.InvariantCulture);
        ComparisonTableWriter.Write(run.Simulated, run.Formula, table);

        var tableRows = ComparisonTableRows.Parse(table.ToString());
        var csvRows = CsvRows.Parse(Csv(run)).Skip(1).ToList();

        Assert.Equal(tableRows.Count, csvRows.Count);
        for (int i = 0; i < csvRows.Count; i++)
        {
            var (csv, shown) = (csvRows[i], tableRows[i]);
            Assert.Equal((shown.Unit, shown.Metric, shown.Verdict), (csv[0], csv[1], csv[5]));

            // Rounded as the table rounds, the CSV's full-precision numbers must print what the table printed. The CSV is in
            // minutes (the network's time unit) and the table formats Core's hours, so the test converts back.
            var dimension = DimensionOf(csv[1]);
            Assert.Equal(shown.Formula, PeopleFormat.Cell(Cell.Of(Hours(Number(csv[2]), dimension), dimension), TimeUnit.Minute));
            var simulated = Cell.WithHalfWidth(Hours(Number(csv[3]), dimension), Hours(Number(csv[4]), dimension), dimension);
            Assert.Equal(shown.Simulated, PeopleFormat.Cell(simulated, TimeUnit.Minute));
        }

        Assert.All(verdictsPresent, verdict => Assert.Contains(verdict, csvRows.Select(row => row[5]), StringComparer.Ordinal));
    }

    [Fact]
    public void Quoted_ids_and_invariant_numbers_read_back_whatever_the_current_culture()
    {
        var run = SimulateAndSolve(replications: 3);
        var culture = CultureInfo.CurrentCulture;
        string csv;
        try
        {
            // de-DE writes 0,5 for one half: a culture leak would add columns and break the numbers.
            CultureInfo.CurrentCulture = new CultureInfo("de-DE");
            csv = Csv(run);
        }
        finally
        {
            CultureInfo.CurrentCulture = culture;
        }

        // RFC 4180: a field with a comma or quote is enclosed in quotes and its quotes are doubled.
        Assert.Contains("\n\"ward \"\"b\"\", east\",mean_wait,", csv, StringComparison.Ordinal);
        var rows = CsvRows.Parse(csv);
        var triageWait = rows.Single(row => row[0] == "triage" && row[1] == "mean_wait");
        var wardWait = rows.Single(row => row[0] == AwkwardId && row[1] == "mean_wait");

        // Exact by hand: the network's time unit is the minute, so the formula's wait in hours is printed times 60.
        Assert.Equal(run.Formula.Units[0].MeanWaitHours!.Value * 60.0, Number(triageWait[2])!.Value, 1e-12);
        Assert.Equal(run.Simulated.Units[0].MeanWaitHours.Mean * 60.0, Number(triageWait[3])!.Value, 1e-12);
        Assert.Equal("minute", triageWait[6]);
        Assert.Equal(string.Empty, wardWait[2]);
        Assert.Equal("no formula", wardWait[5]);
    }

    /// <summary>
    /// Two units, times reported in minutes. Triage is a stable M/M/2 (load 5/h × 0.25 h). The ward is offered 1.5
    /// servers' worth of work on one server; its capacity of 3 turns patients away and keeps the simulation finite, while
    /// the formula is given the ward without that limit (<see cref="SimulateAndSolve"/>), so it calls it unstable.
    /// </summary>
    private static Network TwoUnits() => new(
        "Comparison CSV test",
        TimeUnit.Minute,
        [new Unit("triage", "Triage", Servers.Of(2), 0.25), new Unit(AwkwardId, "Ward B", Servers.Of(1), 1.0) { Capacity = 3 }],
        [new Arrival("triage", 5.0), new Arrival(AwkwardId, 1.5)],
        []);

    private static (SimulationResult Simulated, NetworkSolution Formula) SimulateAndSolve(int replications)
    {
        var network = TwoUnits();
        var options = new SimulationOptions { Seed = 11, Replications = replications, WarmupHours = 20, DurationHours = 2_000 };
        var unlimitedWaitingRoom = network with { Units = [.. network.Units.Select(unit => unit with { Capacity = null })] };
        return (Simulator.Run(network, options, cancellation: TestContext.Current.CancellationToken), NetworkSolver.Solve(unlimitedWaitingRoom));
    }

    private static string Csv((SimulationResult Simulated, NetworkSolution Formula) run)
    {
        using var output = new StringWriter(CultureInfo.InvariantCulture);
        ComparisonCsvWriter.Write(run.Simulated, run.Formula, output);
        return output.ToString();
    }

    // The dimension of each compared metric, as FormulaSimulationComparison declares it.
    private static MetricDimension DimensionOf(string metric) => metric switch
    {
        "arrival_rate" => MetricDimension.Rate,
        "utilisation" => MetricDimension.Fraction,
        "p_wait" => MetricDimension.Probability,
        "mean_wait" or "mean_time_in_unit" => MetricDimension.Time,
        _ => MetricDimension.Count,
    };

    // Back from the CSV's minutes to Core's hours: 60 minutes to the hour, 60 arrivals per hour for one a minute.
    private static double? Hours(double? value, MetricDimension dimension) => dimension switch
    {
        MetricDimension.Time => value / 60.0,
        MetricDimension.Rate => value * 60.0,
        _ => value,
    };

    private static double? Number(string cell) =>
        cell.Length == 0 ? null : double.Parse(cell, NumberStyles.Float, CultureInfo.InvariantCulture);
}
