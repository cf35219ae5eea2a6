using System.Globalization;
using NetSolve.Presentation.Simulation;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Output;

public sealed class SimulationCsvWriterTests
{
    [Fact]
    public void The_header_is_the_registry_ids_with_percentiles_waits_over_and_the_24_hours_last()
    {
        var (simulated, _) = SimulationRuns.Larkspur();
        using var output = new StringWriter(CultureInfo.InvariantCulture);
        SimulationCsvWriter.Write(simulated, output);
        var rows = CsvRows.Parse(output.ToString());

        // Source: docs/simulation.md, "CSV": id, label, servers, each metric from arrival_rate to diverted_rate with its
        // _ci, the percentiles time_in_unit_p50 to _p99, p_wait_over_T and p_wait_over_T_upper_bound per --wait-over
        // time (here 1 hour), the hours, then how the run was made; and, as Larkspur has a journey, docs/network-file.md,
        // "Journeys": kind, patients and the journey's figures, each with its _ci, its share over 4 h with its bound.
        string[] expected =
        [
            .. SimulatedUnitColumns.ForCsv.Select(column => column.Id),
            "time_in_unit_p50", "time_in_unit_p90", "time_in_unit_p95", "time_in_unit_p99", "p_wait_over_1", "p_wait_over_1_upper_bound",
            .. Enumerable.Range(0, 24).Select(hour => FormattableString.Invariant($"mean_queue_h{hour:00}")),
            "warmup", "duration", "precision_reached",
            "kind", "patients", "journey_rate", "journey_rate_ci", "journey_mean_time", "journey_mean_time_ci",
            "journey_p50", "journey_p50_ci", "journey_p90", "journey_p90_ci", "journey_p95", "journey_p95_ci", "journey_p99", "journey_p99_ci",
            "journey_over_4h", "journey_over_4h_ci", "journey_over_4h_upper_bound",
        ];
        Assert.Equal(expected, rows[0]);
        Assert.Equal(["id", "label", "servers", "arrival_rate", "arrival_rate_ci"], rows[0][..5]);
        Assert.Equal(["diverted_rate", "diverted_rate_ci"], rows[0][21..23]);
        Assert.All(rows, row => Assert.Equal(expected.Length, row.Length));
        Assert.Equal(simulated.Units.Length + simulated.Journeys.Length + 1, rows.Count);
    }
}
