namespace NetSolve.Parsing.Values;

/// <summary>A coefficient of variation (<c>service_cv</c>, <c>arrival_cv</c>): a number within <see cref="ValueRanges.CvRange"/>.</summary>
/// <remarks>
/// Thread-safe. 0 is evenly spaced, 1 the exponential; far above 100 no formula or sampler stays meaningful. Only the
/// upper bound is checked here: each caller refuses a negative value in words that fit its field.
/// </remarks>
public static class CvValue
{
    /// <summary>Reads <paramref name="text"/> as a coefficient of variation.</summary>
    public static ValueResult<double> Parse(ReadOnlySpan<char> text)
    {
        var number = NumberValue.Parse(text);
        if (!number.IsValid)
        {
            return number;
        }

        // A negative value is left to the caller, whose message says what 0 and 1 mean for that field.
        return number.Value <= ValueRanges.LargestCv
            ? number
            : ValueResult<double>.Invalid($"'{text}' is not a coefficient of variation ({ValueRanges.CvRange}; 1 is exponential, 0 evenly spaced)");
    }

    /// <inheritdoc cref="Parse(ReadOnlySpan{char})"/>
    public static ValueResult<double> Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        return Parse(text.AsSpan());
    }
}
