using System.Globalization;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Staffing;

/// <summary>The registry of a by-hour staffing table: one row per unit and hour (docs/analysis.md, "Staffing by hour").</summary>
public static class HourlyStaffingColumns
{
    /// <summary>The unit's id.</summary>
    public static readonly Column<HourlyStaffingRow> Id = Columns.Words<HourlyStaffingRow>("id", "unit", row => row.Unit.UnitId);

    /// <summary>The hour of the cycle as <c>07-08</c>, with the day (<c>Mon 07-08</c>) in a week-long cycle.</summary>
    public static readonly Column<HourlyStaffingRow> Hour = Columns.Words<HourlyStaffingRow>("hour", "hour", row => HourName(row.Hour, row.Unit.ServersByHour.Length));

    /// <summary>Mean offered load in the hour, in erlangs.</summary>
    public static readonly Column<HourlyStaffingRow> OfferedLoad = Columns.Number<HourlyStaffingRow>("offered_load", "offered load", MetricDimension.Plain, row => row.Unit.OfferedLoadByHour[row.Hour]);

    /// <summary>Servers in the hour.</summary>
    public static readonly Column<HourlyStaffingRow> Servers = Columns.Number<HourlyStaffingRow>("servers", "servers", MetricDimension.Servers, row => row.Unit.ServersByHour[row.Hour]);

    /// <summary>Predicted mean wait of patients arriving in the hour.</summary>
    public static readonly Column<HourlyStaffingRow> MeanWait = Columns.Number<HourlyStaffingRow>("mean_wait", "mean wait", MetricDimension.Time,
        row => row.Unit.MeanWaitHoursByHour.IsEmpty ? null : row.Unit.MeanWaitHoursByHour[row.Hour]);

    /// <summary>Predicted P(wait &gt; t) in the hour; absent without a wait-tail target.</summary>
    public static readonly Column<HourlyStaffingRow> WaitOver = Columns.Number<HourlyStaffingRow>("p_wait_over", "P(long wait)", MetricDimension.Fraction,
        row => row.Unit.WaitOverByHour.IsEmpty ? null : row.Unit.WaitOverByHour[row.Hour]);

    /// <summary>Simulated mean wait in the hour; absent when not simulated.</summary>
    public static readonly Column<HourlyStaffingRow> SimulatedMeanWait = Columns.Number<HourlyStaffingRow>("simulated_mean_wait", "simulated wait", MetricDimension.Time,
        row => row.Unit.SimulatedMeanWaitHoursByHour.IsEmpty ? null : row.Unit.SimulatedMeanWaitHoursByHour[row.Hour].Mean);

    /// <summary>Whether the hour meets the targets in simulation within its interval; absent when not simulated.</summary>
    public static readonly Column<HourlyStaffingRow> SimulationCheck = Columns.Words<HourlyStaffingRow>("simulation_check", "simulated check",
        row => row.Unit.SimulationMeetsByHour.IsEmpty ? "not run" : row.Unit.SimulationMeetsByHour[row.Hour] ? "meets" : "misses");

    private static readonly string[] Days = ["Mon", "Tue", "Wed", "Thu", "Fri", "Sat", "Sun"];

    private static string HourName(int hour, int cycleHours)
    {
        int h = hour % ArrivalProfile.HoursPerDay;
        string span = string.Create(CultureInfo.InvariantCulture, $"{h:00}-{h + 1:00}");
        return cycleHours == ArrivalProfile.HoursPerDay ? span : $"{Days[hour / ArrivalProfile.HoursPerDay]} {span}";
    }

    /// <summary>Every column, in table order.</summary>
    public static readonly IReadOnlyList<Column<HourlyStaffingRow>> All = [Id, Hour, OfferedLoad, Servers, MeanWait, WaitOver, SimulatedMeanWait, SimulationCheck];
}
