namespace NetSolve.Parsing.Values;

/// <summary>
/// A factor that multiplies a value (<c>1.2</c> is 20% more, <c>0.8</c> is 20% less): within
/// <see cref="ValueRanges.FactorRange"/>. Times take a
/// <see cref="Positive"/> factor; arrivals a <see cref="NotNegative"/> one, since 0 stops a stream.
/// </summary>
/// <remarks>
/// Thread-safe. The text is the number alone: a scenario file's <c>x</c> and <c>--set</c>'s <c>*=</c> are removed
/// by the caller, so both name the same mistake the same way.
/// </remarks>
public static class FactorValue
{
    /// <summary>Reads a factor more than 0 (for a duration).</summary>
    public static ValueResult<double> Positive(ReadOnlySpan<char> text) => Parse(text, allowZero: false);

    /// <summary>Reads a factor of 0 or more (for an arrival rate).</summary>
    public static ValueResult<double> NotNegative(ReadOnlySpan<char> text) => Parse(text, allowZero: true);

    private static ValueResult<double> Parse(ReadOnlySpan<char> text, bool allowZero)
    {
        if (!NumberText.IsNumber(text, out double factor))
        {
            return ValueResult<double>.Invalid($"'{text}' is not a factor (write a number, e.g. 1.2 for 20% more)");
        }

        if (!(allowZero ? factor >= 0.0 : factor > 0.0))
        {
            return ValueResult<double>.Invalid($"the factor must be {(allowZero ? "0 or more" : "more than 0")}, not '{text}'");
        }

        if (allowZero && factor == 0.0)
        {
            return ValueResult<double>.Valid(0.0);
        }

        return factor is >= ValueRanges.SmallestFactor and <= ValueRanges.LargestFactor
            ? ValueResult<double>.Valid(factor)
            : ValueResult<double>.Invalid(
                $"'{text}' is too {(factor > ValueRanges.LargestFactor ? "large" : "small")} for a factor ({(allowZero ? "0, or " : string.Empty)}{ValueRanges.FactorRange})");
    }
}
