using NetSolve.Analysis;
using NetSolve.Presentation.Formats;

namespace NetSolve.Presentation.Growth;

/// <summary>Writes a <see cref="GrowthResult"/> as a table for people, as JSON, or as long-format CSV ready to plot.</summary>
/// <remarks>
/// JSON and CSV keep the network's time unit, which both state; the table shows each time in the unit that reads
/// best. The columns of every format are in <see cref="SaturationColumns"/>, <see cref="GrowthStepColumns"/> and
/// <see cref="GrowthRowColumns"/>.
/// </remarks>
public static class GrowthOutput
{
    /// <summary>Most unit columns in the people's table (units that saturate first); the JSON and CSV hold every unit.</summary>
    public const int MaxTableColumns = GrowthTableWriter.MaxTableColumns;

    /// <summary>Width in characters of the longest bar in the text chart.</summary>
    public const int ChartWidth = GrowthTableWriter.ChartWidth;

    /// <summary>The CSV header: one row per factor and unit. A test holds it equal to <see cref="GrowthRowColumns"/>' ids.</summary>
    public const string CsvHeader = "factor,unit,utilisation,mean_wait,mean_time_in_unit,status,time_unit";

    /// <summary>The columns the CSV appends when some unit has a capacity.</summary>
    public const string CsvBedLimitColumns = "p_full,full_1pct_at,full_5pct_at";

    /// <summary>Writes the saturation order, the thresholds, utilisation and wait by factor, and a text chart; the bed limits when some unit has a capacity.</summary>
    public static void WriteTable(GrowthResult growth, TextWriter output) => GrowthTableWriter.Write(growth, output);

    /// <summary>Writes one JSON document.</summary>
    public static void WriteJson(GrowthResult growth, Stream output) => GrowthJsonWriter.Write(growth, output);

    /// <summary>Writes long-format CSV: a header, then one row per factor and unit, factors in order.</summary>
    public static void WriteCsv(GrowthResult growth, TextWriter output) => CsvTableWriter.Write(GrowthRowColumns.Table(growth), output);

    /// <summary>The two threshold sentences.</summary>
    public static string Findings(GrowthResult growth) => GrowthTableWriter.Findings(growth);

    /// <summary>The bed-limit sentence: the unit with a capacity first to refuse 1% of its arrivals, and when 5%.</summary>
    public static string BedLimitFinding(GrowthResult growth) => GrowthTableWriter.BedLimitFinding(growth);
}
