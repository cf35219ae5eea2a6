using NetSolve.Analysis;

namespace NetSolve.Presentation.Scenarios;

/// <summary>Writes a <see cref="ComparisonResult"/> as tables for people, as JSON, or as long-format CSV.</summary>
/// <remarks>
/// JSON and CSV keep the base network's time unit, which both state; the tables show each time in the unit that reads
/// best. The metrics compared are in <see cref="ComparedMetrics"/>.
/// </remarks>
public static class ComparisonOutput
{
    /// <summary>The status word for a unit the scenario added (absent from the base).</summary>
    public const string Added = ScenarioStatus.Added;

    /// <summary>The status word for a unit the scenario closed (absent from the scenario).</summary>
    public const string Closed = ScenarioStatus.Closed;

    /// <summary>The CSV header: one row per scenario, unit and metric; the network totals have an empty unit.</summary>
    public const string CsvHeader = ScenarioCsvWriter.Header;

    /// <summary>Writes one section per scenario: the unit table, totals, status changes and the bottleneck.</summary>
    public static void WriteTable(ComparisonResult comparison, TextWriter output) => ScenarioTableWriter.Write(comparison, output);

    /// <summary>Writes one JSON document.</summary>
    public static void WriteJson(ComparisonResult comparison, Stream output) => ScenarioJsonWriter.Write(comparison, output);

    /// <summary>Writes long-format CSV: per scenario, the totals (empty unit), then each unit's metrics and status.</summary>
    public static void WriteCsv(ComparisonResult comparison, TextWriter output) => ScenarioCsvWriter.Write(comparison, output);
}
