namespace NetSolve.Parsing.Values;

/// <summary>A probability (<c>0.35</c>, <c>35%</c>, <c>35 %</c>): a fraction from 0 to 1.</summary>
/// <remarks>Thread-safe.</remarks>
public static class ProbabilityValue
{
    /// <summary>Reads <paramref name="text"/> as a probability.</summary>
    public static ValueResult<double> Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (!NumberText.Split(text, string.Empty, out string number, out string suffix) || suffix is not ("" or "%")
            || !NumberText.IsNumber(number, out double amount))
        {
            return ValueResult<double>.Invalid($"'{text}' is not a probability (write e.g. 0.35 or 35%)");
        }

        double probability = suffix == "%" ? amount / 100.0 : amount;
        return probability is >= 0.0 and <= 1.0
            ? ValueResult<double>.Valid(probability)
            : ValueResult<double>.Invalid($"'{text}' is not between 0 and 1");
    }
}
