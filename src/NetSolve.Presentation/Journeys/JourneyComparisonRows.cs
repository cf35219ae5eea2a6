using System.Collections.Immutable;
using System.Text.Json;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Presentation.Simulation;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Presentation.Journeys;

/// <summary>
/// The journeys' rows of <c>simulate --compare</c>: each journey's formula figures against the simulated ones, in
/// the rows of the units' comparison, named <c>journey ID</c> (<c>journey ID/GROUP</c> for a patient group).
/// </summary>
public static class JourneyComparisonRows
{
    /// <summary>The method named in a journey's rows.</summary>
    public const string Method = "phase-type";

    /// <summary>The rows of every simulated journey that has a formula estimate; none without journeys.</summary>
    public static ImmutableArray<ComparisonRow> Of(SimulationResult simulated, NetworkSolution formula)
    {
        ArgumentNullException.ThrowIfNull(simulated);
        ArgumentNullException.ThrowIfNull(formula);
        return Of(simulated.Journeys, JourneyFormula.Estimate(formula), simulated.Network.TimeUnit);
    }

    /// <summary>Writes the array <c>journey_compare</c>, one object per compared metric, with the fields of the units' <c>compare</c> objects.</summary>
    public static void WriteJson(ImmutableArray<SimulatedJourney> simulated, ImmutableArray<JourneyEstimate> formula, TimeUnit timeUnit, Utf8JsonWriter json)
    {
        ArgumentNullException.ThrowIfNull(json);
        var rows = Of(simulated, formula, timeUnit);
        JsonTableWriter.WriteArray(ResultTable.Build([ComparedMetricColumns.Unit, ComparedMetricColumns.Metric, .. ComparedMetricColumns.ForJson], rows, timeUnit), "journey_compare", json);
    }

    private static ImmutableArray<ComparisonRow> Of(ImmutableArray<SimulatedJourney> simulated, ImmutableArray<JourneyEstimate> formula, TimeUnit timeUnit) =>
        [.. JourneyComparison.Pairs(simulated, formula).SelectMany(pair => JourneyComparison.Metrics(pair.Simulated, pair.Formula)
            .Select(metric => new ComparisonRow(Name(pair.Simulated), metric, timeUnit, Method)))];

    private static string Name(SimulatedJourney journey) =>
        "journey " + journey.Journey.Id + (journey.Group is PatientGroup group ? "/" + group.Id : string.Empty);
}
