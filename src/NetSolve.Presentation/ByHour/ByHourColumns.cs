using System.Globalization;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;
using NetSolve.Solving;

namespace NetSolve.Presentation.ByHour;

/// <summary>
/// The registry of the hour-by-hour view of <c>solve</c>: one row per unit and hour (docs/network-file.md, "By hour").
/// The JSON's <c>by_hour</c> arrays are these columns read down one unit's rows.
/// </summary>
public static class ByHourColumns
{
    private static readonly string[] Days = ["Mon", "Tue", "Wed", "Thu", "Fri", "Sat", "Sun"];

    /// <summary>The unit's id.</summary>
    public static readonly Column<ByHourRow> Id = Columns.Words<ByHourRow>("id", "unit", row => row.Unit.UnitId);

    /// <summary>The hour as <c>07-08</c>, with the day (<c>Mon 07-08</c>) in a week-long cycle.</summary>
    public static readonly Column<ByHourRow> Hour = Columns.Words<ByHourRow>("hour", "hour", row => HourName(row.Hour, row.Unit.CycleHours));

    /// <summary>Mean arrivals in the hour.</summary>
    public static readonly Column<ByHourRow> ArrivalRate = Columns.Number<ByHourRow>("arrival_rate", "arrivals", MetricDimension.Rate, row => row.Unit.ArrivalsPerHourByHour[row.Hour]);

    /// <summary>Servers in the hour; empty for unlimited servers.</summary>
    public static readonly Column<ByHourRow> Servers = Columns.Number<ByHourRow>("servers", "servers", MetricDimension.Servers, row => row.Unit.Servers(row.Hour));

    /// <summary>Busy servers ÷ servers over the hour.</summary>
    public static readonly Column<ByHourRow> Utilisation = Columns.Number<ByHourRow>("utilisation", "util", MetricDimension.Fraction, row => row.Unit.Utilisation(row.Hour));

    /// <summary>Mean patients waiting over the hour.</summary>
    public static readonly Column<ByHourRow> MeanQueue = Columns.Number<ByHourRow>("mean_queue", "queue", MetricDimension.Count, row => row.Unit.MeanQueue(row.Hour));

    /// <summary>Mean wait of patients arriving in the hour.</summary>
    public static readonly Column<ByHourRow> MeanWait = Columns.Number<ByHourRow>("mean_wait", "wait", MetricDimension.Time, row => row.Unit.MeanWaitHours(row.Hour));

    /// <summary>How the unit's hourly values were found (docs/time-of-day.md, section 2).</summary>
    public static readonly Column<ByHourRow> Method = Columns.Words<ByHourRow>("method", "method", row => row.Unit.Waits.Method, Audience.Machines);

    /// <summary>Every column, in table order.</summary>
    public static readonly IReadOnlyList<Column<ByHourRow>> All = [Id, Hour, ArrivalRate, Servers, Utilisation, MeanQueue, MeanWait, Method];

    /// <summary>One row per unit and hour, units in file order; no rows without an hour-by-hour solution.</summary>
    public static ResultTable Table(NetworkSolution solution)
    {
        ArgumentNullException.ThrowIfNull(solution);
        var rows = ByHourUnit.All(solution).SelectMany(unit => Enumerable.Range(0, unit.CycleHours).Select(hour => new ByHourRow(unit, hour)));
        return ResultTable.Build(All, rows, solution.Network.TimeUnit);
    }

    /// <summary>The hour of the cycle for people and CSV: <c>07-08</c>, or <c>Mon 07-08</c> in a week.</summary>
    public static string HourName(int hour, int cycleHours)
    {
        int h = hour % ArrivalProfile.HoursPerDay;
        string span = string.Create(CultureInfo.InvariantCulture, $"{h:00}-{h + 1:00}");
        return cycleHours == ArrivalProfile.HoursPerDay ? span : $"{Days[hour / ArrivalProfile.HoursPerDay]} {span}";
    }
}
