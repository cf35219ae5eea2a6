using NetSolve.Model;
using NetSolve.Parsing.Values;

namespace NetSolve.Parsing;

/// <summary>
/// The value kinds of <see cref="Values"/> in the shape of a try-method: null on success, else the error (one line,
/// no field, no location). The same parsers and messages as network files, scenario files and <c>--set</c>.
/// </summary>
public static class ValueParser
{
    /// <summary>Parses a finite number (<see cref="NumberValue"/>).</summary>
    public static string? Number(string text, out double value) => Unpack(NumberValue.Parse(text), out value);

    /// <summary>Parses a positive duration into hours (<see cref="DurationValue"/>).</summary>
    public static string? Duration(string text, TimeUnit timeUnit, out double hours) => Unpack(DurationValue.Parse(text, timeUnit), out hours);

    /// <summary>Parses a rate that is not negative into events per hour (<see cref="RateValue"/>).</summary>
    public static string? Rate(string text, TimeUnit timeUnit, out double perHour) => Unpack(RateValue.Parse(text, timeUnit), out perHour);

    /// <summary>Parses a probability in [0, 1] (<see cref="ProbabilityValue"/>).</summary>
    public static string? Probability(string text, out double probability) => Unpack(ProbabilityValue.Parse(text), out probability);

    private static string? Unpack(ValueResult<double> result, out double value)
    {
        value = result.IsValid ? result.Value : 0.0;
        return result.IsValid ? null : result.Error;
    }
}
