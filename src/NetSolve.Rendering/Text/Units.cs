using NetSolve.Model;

namespace NetSolve.Rendering.Text;

/// <summary>Turns Core's hours and rates per hour into the network's own time unit, with the unit written beside.</summary>
internal static class Units
{
    /// <summary>A duration stored in hours, printed in <paramref name="unit"/>: <c>0.52 h</c>.</summary>
    public static string Time(double hours, TimeUnit unit) =>
        Invariant.Number(TimeConstants.FromHours(hours, unit)) + " " + TimeConstants.Suffix(unit);

    /// <summary>A rate stored per hour, printed per <paramref name="unit"/>: <c>11.5/h</c>.</summary>
    public static string Rate(double perHour, TimeUnit unit) =>
        Invariant.Number(TimeConstants.RateFromPerHour(perHour, unit)) + "/" + TimeConstants.Suffix(unit);
}
