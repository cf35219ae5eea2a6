namespace NetSolve.Parsing.Values;

/// <summary>A probability (<c>0.35</c>, <c>35%</c>, <c>35 %</c>): a fraction from 0 to 1.</summary>
/// <remarks>
/// Thread-safe. Above 0 it is at least <see cref="ValueRanges.SmallestProbability"/>: a route of <c>1e-320</c> would
/// give a unit visits too few to divide by (an infinite headroom).
/// </remarks>
public static class ProbabilityValue
{
    /// <summary>Reads <paramref name="text"/> as a probability.</summary>
    public static ValueResult<double> Parse(ReadOnlySpan<char> text)
    {
        if (!NumberText.Split(text, string.Empty, out var number, out var suffix) || suffix is not ("" or "%")
            || !NumberText.IsNumber(number, out double amount))
        {
            return ValueResult<double>.Invalid($"'{text}' is not a probability (write e.g. 0.35 or 35%)");
        }

        double probability = suffix is "%" ? amount / 100.0 : amount;
        if (probability is < 0.0 or > 1.0)
        {
            return ValueResult<double>.Invalid($"'{text}' is not between 0 and 1");
        }

        return probability == 0.0 || probability >= ValueRanges.SmallestProbability
            ? ValueResult<double>.Valid(probability == 0.0 ? 0.0 : probability)
            : ValueResult<double>.Invalid($"'{text}' is too small for a probability ({ValueRanges.ProbabilityRange})");
    }

    /// <inheritdoc cref="Parse(ReadOnlySpan{char})"/>
    public static ValueResult<double> Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        return Parse(text.AsSpan());
    }
}
