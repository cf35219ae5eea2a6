using NetSolve.Model;

namespace NetSolve.Parsing.Values;

/// <summary>
/// A duration (<c>45</c>, <c>45min</c>, <c>45 min</c>, <c>2.5h</c>, <c>4d</c>, <c>30s</c>), read into hours; a bare
/// number is in the file's time unit.
/// </summary>
/// <remarks>
/// Thread-safe. A duration is positive and both it and its reciprocal (the service rate) are ordinary finite doubles
/// (<see cref="IsUsableHours"/>): <c>1e-320h</c> would make the rate infinite and is refused as too short.
/// </remarks>
public static class DurationValue
{
    /// <summary>Reads <paramref name="text"/> as a duration in hours.</summary>
    /// <param name="text">The text as written.</param>
    /// <param name="timeUnit">The file's time unit, for a bare number.</param>
    public static ValueResult<double> Parse(string text, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (!NumberText.Split(text, string.Empty, out string number, out string suffix) || !NumberText.IsTimeSuffix(suffix)
            || !NumberText.IsNumber(number, out double amount))
        {
            return ValueResult<double>.Invalid(
                $"'{text}' is not a duration (write e.g. 45min, 2.5h, 3d, 30s, or a number in {TimeConstants.Name(timeUnit)}s)");
        }

        if (!(amount > 0.0))
        {
            return ValueResult<double>.Invalid($"'{text}' is not a positive duration");
        }

        double hours = amount * NumberText.HoursPerSuffix(suffix, timeUnit);
        if (!double.IsFinite(hours))
        {
            return ValueResult<double>.Invalid($"'{text}' is too long for a duration");
        }

        return IsUsableHours(hours)
            ? ValueResult<double>.Valid(hours)
            : ValueResult<double>.Invalid($"'{text}' is too short for a duration");
    }

    /// <summary>True for a positive, finite, normal number of hours whose reciprocal is finite too.</summary>
    public static bool IsUsableHours(double hours) => double.IsNormal(hours) && hours > 0.0 && double.IsFinite(1.0 / hours);
}
