using NetSolve.Model;

namespace NetSolve.Presentation;

/// <summary>Turns Core's hours and rates per hour into the network's own time unit, with the unit written beside.</summary>
public static class Units
{
    /// <summary>A duration stored in hours, printed in <paramref name="unit"/>: <c>0.52 h</c>, or <c>&lt; 0.001 h</c> when tiny.</summary>
    public static string Time(double hours, TimeUnit unit) =>
        Invariant.Number(TimeConstants.FromHours(hours, unit)) + " " + TimeConstants.Suffix(unit);

    /// <summary>A duration to two significant digits, for map boxes: <c>0.039 h</c>, or <c>&lt; 0.001 h</c> when tiny.</summary>
    public static string ShortTime(double hours, TimeUnit unit)
    {
        double value = TimeConstants.FromHours(hours, unit);
        string number = value > 0.0 && value < Invariant.Smallest ? "< 0.001" : Invariant.Brief(value);
        return number + " " + TimeConstants.Suffix(unit);
    }

    /// <summary>A rate to two significant digits, for map lines: <c>2.4/h</c>, or <c>&lt; 0.001/h</c> when tiny.</summary>
    public static string ShortRate(double perHour, TimeUnit unit)
    {
        double value = TimeConstants.RateFromPerHour(perHour, unit);
        string number = value > 0.0 && value < Invariant.Smallest ? "< 0.001" : Invariant.Brief(value);
        return number + "/" + TimeConstants.Suffix(unit);
    }

    /// <summary>A rate stored per hour, printed per <paramref name="unit"/>: <c>11.5/h</c>.</summary>
    public static string Rate(double perHour, TimeUnit unit) =>
        Invariant.Number(TimeConstants.RateFromPerHour(perHour, unit)) + "/" + TimeConstants.Suffix(unit);
}
