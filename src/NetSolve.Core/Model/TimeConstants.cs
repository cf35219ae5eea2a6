namespace NetSolve.Model;

/// <summary>Conversions between the time units a file may use. Core stores every time in hours.</summary>
public static class TimeConstants
{
    /// <summary>Minutes in one hour.</summary>
    public const double MinutesPerHour = 60.0;

    /// <summary>Hours in one day.</summary>
    public const double HoursPerDay = 24.0;

    /// <summary>Seconds in one hour.</summary>
    public const double SecondsPerHour = 3600.0;

    /// <summary>How many hours one <paramref name="unit"/> lasts.</summary>
    public static double HoursPer(TimeUnit unit) => unit switch
    {
        TimeUnit.Minute => 1.0 / MinutesPerHour,
        TimeUnit.Hour => 1.0,
        TimeUnit.Day => HoursPerDay,
        _ => throw new ArgumentOutOfRangeException(nameof(unit), unit, "Unknown time unit."),
    };

    /// <summary>Converts a time in hours to <paramref name="unit"/>.</summary>
    public static double FromHours(double hours, TimeUnit unit) => hours / HoursPer(unit);

    /// <summary>Converts a rate per hour to a rate per <paramref name="unit"/>.</summary>
    public static double RateFromPerHour(double perHour, TimeUnit unit) => perHour * HoursPer(unit);

    /// <summary>The word used in files and outputs: <c>minute</c>, <c>hour</c> or <c>day</c>.</summary>
    public static string Name(TimeUnit unit) => unit switch
    {
        TimeUnit.Minute => "minute",
        TimeUnit.Hour => "hour",
        TimeUnit.Day => "day",
        _ => throw new ArgumentOutOfRangeException(nameof(unit), unit, "Unknown time unit."),
    };

    /// <summary>The short suffix used beside printed numbers: <c>min</c>, <c>h</c> or <c>d</c>.</summary>
    public static string Suffix(TimeUnit unit) => unit switch
    {
        TimeUnit.Minute => "min",
        TimeUnit.Hour => "h",
        TimeUnit.Day => "d",
        _ => throw new ArgumentOutOfRangeException(nameof(unit), unit, "Unknown time unit."),
    };
}
