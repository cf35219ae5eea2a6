using NetSolve.Model;

namespace NetSolve.Parsing.Values;

/// <summary>
/// An arrival rate (<c>11.5</c>, <c>11.5/h</c>, <c>11.5 /h</c>, <c>280/d</c>, <c>0.2/min</c>, <c>3/s</c>), read into
/// events per hour; a bare number is per the file's time unit. 0 (no arrivals), or within
/// <see cref="ValueRanges.RateRange"/>.
/// </summary>
/// <remarks>Thread-safe.</remarks>
public static class RateValue
{
    /// <summary>Reads <paramref name="text"/> as a rate in events per hour.</summary>
    /// <param name="text">The text as written.</param>
    /// <param name="timeUnit">The file's time unit, for a bare number.</param>
    public static ValueResult<double> Parse(ReadOnlySpan<char> text, TimeUnit timeUnit)
    {
        if (!NumberText.Split(text, "/", out var number, out var suffix) || !NumberText.IsTimeSuffix(suffix)
            || !NumberText.IsNumber(number, out double amount))
        {
            return ValueResult<double>.Invalid(
                $"'{text}' is not a rate (write e.g. 11.5/h, 280/d, 0.2/min, or a number per {TimeConstants.Name(timeUnit)})");
        }

        double perHour = amount / NumberText.HoursPerSuffix(suffix, timeUnit);
        if (perHour < 0.0)
        {
            return ValueResult<double>.Invalid($"'{text}' is negative; an arrival rate is 0 or more");
        }

        if (ValueRanges.IsRate(perHour))
        {
            return ValueResult<double>.Valid(perHour == 0.0 ? 0.0 : perHour);
        }

        string which = perHour > ValueRanges.LargestRatePerHour ? "too large" : "too small";
        return ValueResult<double>.Invalid($"'{text}' is {which} for a rate ({ValueRanges.RateRange})");
    }

    /// <inheritdoc cref="Parse(ReadOnlySpan{char}, TimeUnit)"/>
    public static ValueResult<double> Parse(string text, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(text);
        return Parse(text.AsSpan(), timeUnit);
    }
}
