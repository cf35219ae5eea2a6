namespace NetSolve.Parsing.Values;

/// <summary>A plain number (<c>12</c>, <c>0.5</c>, <c>2.5e-3</c>): finite and not subnormal; <c>.nan</c>, <c>.inf</c>,
/// overflow and <c>1e-320</c> are errors.</summary>
/// <remarks>Thread-safe. Used for <c>service_cv</c> and arrival-profile multipliers; the caller checks their range.</remarks>
public static class NumberValue
{
    /// <summary>Reads <paramref name="text"/> as a finite number.</summary>
    public static ValueResult<double> Parse(ReadOnlySpan<char> text)
    {
        if (!NumberText.IsNumber(text, out double value))
        {
            return ValueResult<double>.Invalid($"'{text}' is not a number");
        }

        if (!double.IsFinite(value))
        {
            return ValueResult<double>.Invalid($"'{text}' is too large for a number");
        }

        // A subnormal number has lost its digits and turns infinite when divided into: refused, as too small.
        return value == 0.0 || double.IsNormal(value)
            ? ValueResult<double>.Valid(value == 0.0 ? 0.0 : value)
            : ValueResult<double>.Invalid($"'{text}' is too small for a number (write 0, or a number of at least 1e-300)");
    }

    /// <inheritdoc cref="Parse(ReadOnlySpan{char})"/>
    public static ValueResult<double> Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        return Parse(text.AsSpan());
    }
}
