namespace NetSolve.Parsing.Values;

/// <summary>A plain number (<c>12</c>, <c>0.5</c>, <c>2.5e-3</c>): finite; <c>.nan</c>, <c>.inf</c> and overflow are errors.</summary>
/// <remarks>Thread-safe. Used for <c>service_cv</c> and arrival-profile multipliers; the caller checks their range.</remarks>
public static class NumberValue
{
    /// <summary>Reads <paramref name="text"/> as a finite number.</summary>
    public static ValueResult<double> Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (!NumberText.IsNumber(text, out double value))
        {
            return ValueResult<double>.Invalid($"'{text}' is not a number");
        }

        return double.IsFinite(value)
            ? ValueResult<double>.Valid(value)
            : ValueResult<double>.Invalid($"'{text}' is too large for a number");
    }
}
