using System.Collections.Immutable;
using NetSolve.Fitting;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Fitting;

/// <summary>The registry of what <c>fit</c> observed per unit, shown on the terminal beside the written network.</summary>
public static class FittedUnitColumns
{
    /// <summary>Every column, in the summary's order.</summary>
    public static readonly ImmutableArray<Column<FittedUnit>> All =
    [
        Columns.Words<FittedUnit>("id", "unit", unit => unit.Id),
        Columns.Number<FittedUnit>("stays", "stays", MetricDimension.Count, unit => unit.Stays),
        Columns.Number<FittedUnit>("entry_rate", "entries", MetricDimension.Rate, unit => unit.EntriesPerHour),
        Columns.Number<FittedUnit>("mean_service", "service", MetricDimension.Time, unit => unit.MeanServiceHours),
        Columns.Number<FittedUnit>("service_cv", "service cv", MetricDimension.Plain, unit => unit.ServiceCv),
        Columns.Number<FittedUnit>("observed_wait", "observed wait", MetricDimension.Time, unit => unit.MeanWaitHours),
        Columns.Number<FittedUnit>("peak_in_service", "peak in service", MetricDimension.Count, unit => unit.PeakInService),
    ];

    /// <summary>Writes the summary table of <paramref name="fitted"/> for people.</summary>
    public static void WriteTable(FittedNetwork fitted, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(fitted);
        PeopleTableWriter.Write(ResultTable.Build(All, fitted.Units, fitted.Network.TimeUnit), output);
    }
}
