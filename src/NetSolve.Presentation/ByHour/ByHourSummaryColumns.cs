using NetSolve.Model;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.ByHour;

/// <summary>The registry of the by-hour summary for people: one row per unit whose arrivals or servers vary by hour.</summary>
public static class ByHourSummaryColumns
{
    /// <summary>The unit's id.</summary>
    public static readonly Column<ByHourUnit> Id = Columns.Words<ByHourUnit>("id", "unit", unit => unit.UnitId);

    /// <summary>The hour with the most arrivals.</summary>
    public static readonly Column<ByHourUnit> PeakHour = Columns.Words<ByHourUnit>("peak_hour", "peak arrivals", unit => ByHourColumns.HourName(unit.PeakHour, unit.CycleHours));

    /// <summary>The most arrivals in any hour.</summary>
    public static readonly Column<ByHourUnit> PeakArrivals = Columns.Number<ByHourUnit>("peak_arrival_rate", "arrivals", MetricDimension.Rate, unit => unit.ArrivalsPerHourByHour[unit.PeakHour]);

    /// <summary>The hour with the longest mean wait.</summary>
    public static readonly Column<ByHourUnit> WorstHour = Columns.Words<ByHourUnit>("worst_hour", "worst hour",
        unit => unit.WorstHour is int hour ? ByHourColumns.HourName(hour, unit.CycleHours) : "-");

    /// <summary>The highest utilisation in any hour.</summary>
    public static readonly Column<ByHourUnit> WorstUtilisation = Columns.Number<ByHourUnit>("worst_utilisation", "worst util", MetricDimension.Fraction, unit => unit.WorstUtilisation);

    /// <summary>The longest hourly mean wait.</summary>
    public static readonly Column<ByHourUnit> WorstWait = Columns.Number<ByHourUnit>("worst_mean_wait", "worst wait", MetricDimension.Time,
        unit => unit.WorstHour is int hour ? unit.MeanWaitHours(hour) : null);

    /// <summary>How the hourly values were found.</summary>
    public static readonly Column<ByHourUnit> Method = Columns.Words<ByHourUnit>("method", "method", unit => unit.Waits.Method);

    /// <summary>Every column, in table order.</summary>
    public static readonly IReadOnlyList<Column<ByHourUnit>> All = [Id, PeakHour, PeakArrivals, WorstHour, WorstUtilisation, WorstWait, Method];
}
