using System.Text.Json;
using NetSolve.Presentation.Metrics;
using NetSolve.Presentation.Simulation;

namespace NetSolve.Tests.Output;

public sealed class SimulationJsonWriterTests
{
    // Source: docs/simulation.md, "JSON": the fields of solve's unit, each simulated metric followed by its _ci, then
    // capacity, p_full, turned_away_rate, diverted_rate (each with _ci), the percentiles, p_wait_over, the hourly
    // queues and, with --compare, compare.
    private static readonly string[] UnitFields =
    [
        "id", "label", "servers", "arrival_rate", "arrival_rate_ci", "visits_per_patient", "offered_load", "utilisation", "utilisation_ci",
        "p_wait", "p_wait_ci", "mean_queue", "mean_queue_ci", "mean_wait", "mean_wait_ci", "mean_in_unit", "mean_in_unit_ci",
        "mean_time_in_unit", "mean_time_in_unit_ci", "headroom", "status", "capacity", "p_full", "p_full_ci", "turned_away_rate",
        "turned_away_rate_ci", "diverted_rate", "diverted_rate_ci", "time_in_unit_percentiles", "p_wait_over", "mean_queue_by_hour",
        "mean_queue_by_hour_ci", "compare",
    ];

    // Source: docs/simulation.md, "JSON": solve's totals plus turned_away_rate and the percentiles.
    private static readonly string[] TotalsFields =
    [
        "external_arrival_rate", "throughput", "throughput_ci", "mean_in_system", "mean_in_system_ci", "mean_time_in_system",
        "mean_time_in_system_ci", "turned_away_rate", "turned_away_rate_ci", "time_in_system_percentiles",
    ];

    // Source: docs/simulation.md, "JSON": per group id, label, external_arrival_rate, throughput, mean_time_in_system, percentiles.
    private static readonly string[] GroupFields =
        ["id", "label", "external_arrival_rate", "throughput", "throughput_ci", "mean_time_in_system", "mean_time_in_system_ci", "time_in_system_percentiles"];

    [Fact]
    public void A_unit_object_has_the_documented_fields_and_its_flat_ones_are_the_registry_ids_in_order()
    {
        using var document = Document();
        var emitted = Names(document.RootElement.GetProperty("units")[0]);

        Assert.Equal(UnitFields, emitted, StringComparer.Ordinal);
        Assert.Equal(Ids(SimulatedUnitColumns.ForJson), emitted.Take(SimulatedUnitColumns.ForJson.Length), StringComparer.Ordinal);
    }

    [Fact]
    public void Totals_and_group_objects_have_the_documented_fields_and_their_flat_ones_are_the_registry_ids()
    {
        using var document = Document();
        var totals = Names(document.RootElement.GetProperty("totals"));
        var group = Names(document.RootElement.GetProperty("groups")[0]);

        Assert.Equal(TotalsFields, totals, StringComparer.Ordinal);
        Assert.Equal(Ids(SimulatedTotalsColumns.ForJson), totals.Take(SimulatedTotalsColumns.ForJson.Length), StringComparer.Ordinal);
        Assert.Equal(GroupFields, group, StringComparer.Ordinal);
        Assert.Equal(Ids(SimulatedGroupColumns.ForJson), group.Take(SimulatedGroupColumns.ForJson.Length), StringComparer.Ordinal);
    }

    [Fact]
    public void Nested_objects_use_the_ids_of_their_registries()
    {
        using var document = Document();
        var unit = document.RootElement.GetProperty("units")[0];

        // Source: docs/simulation.md, "JSON": p50 to p99 each with _ci; p_wait_over items (with upper_bound); compare items.
        Assert.Equal(["p50", "p50_ci", "p90", "p90_ci", "p95", "p95_ci", "p99", "p99_ci"], Names(unit.GetProperty("time_in_unit_percentiles")));
        Assert.Equal(["wait", "probability", "probability_ci", "upper_bound"], Names(unit.GetProperty("p_wait_over")[0]));
        Assert.Equal(Ids(WaitOverColumns.ForJson), Names(unit.GetProperty("p_wait_over")[0]), StringComparer.Ordinal);
        Assert.Equal(["formula", "simulated", "simulated_ci", "verdict", "relative_error", "relative_error_ci", "suspect"], Names(unit.GetProperty("compare").GetProperty("mean_wait")));
        Assert.Equal(Ids(ComparedMetricColumns.ForJson), Names(unit.GetProperty("compare").GetProperty("mean_wait")), StringComparer.Ordinal);
    }

    private static JsonDocument Document()
    {
        var (simulated, formula) = SimulationRuns.Larkspur();
        using var output = new MemoryStream();
        SimulationJsonWriter.Write(simulated, output, formula);
        return JsonDocument.Parse(output.ToArray());
    }

    private static List<string> Names(JsonElement element) => [.. element.EnumerateObject().Select(property => property.Name)];

    private static IEnumerable<string> Ids<TRow>(IEnumerable<Column<TRow>> columns) => columns.Select(column => column.Id);
}
