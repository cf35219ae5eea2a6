using NetSolve.Model;

namespace NetSolve.Parsing.Values;

/// <summary>
/// A duration (<c>45</c>, <c>45min</c>, <c>45 min</c>, <c>2.5h</c>, <c>4d</c>, <c>30s</c>), read into hours; a bare
/// number is in the file's time unit.
/// </summary>
/// <remarks>
/// Thread-safe. A duration is within <see cref="ValueRanges.DurationRange"/> (<see cref="IsUsableHours"/>):
/// <c>1e-320h</c> would make the service rate infinite and is refused as too short, <c>1e300h</c> as too long.
/// </remarks>
public static class DurationValue
{
    /// <summary>Reads <paramref name="text"/> as a duration in hours.</summary>
    /// <param name="text">The text as written.</param>
    /// <param name="timeUnit">The file's time unit, for a bare number.</param>
    public static ValueResult<double> Parse(ReadOnlySpan<char> text, TimeUnit timeUnit)
    {
        if (!NumberText.Split(text, string.Empty, out var number, out var suffix) || !NumberText.IsTimeSuffix(suffix)
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
        if (IsUsableHours(hours))
        {
            return ValueResult<double>.Valid(hours);
        }

        string which = hours > ValueRanges.LongestHours ? "too long" : "too short";
        return ValueResult<double>.Invalid($"'{text}' is {which} for a duration ({ValueRanges.DurationRange})");
    }

    /// <inheritdoc cref="Parse(ReadOnlySpan{char}, TimeUnit)"/>
    public static ValueResult<double> Parse(string text, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(text);
        return Parse(text.AsSpan(), timeUnit);
    }

    /// <summary>True for a number of hours within <see cref="ValueRanges.DurationRange"/> (so finite, normal, with a finite reciprocal).</summary>
    public static bool IsUsableHours(double hours) => ValueRanges.IsDuration(hours);
}
