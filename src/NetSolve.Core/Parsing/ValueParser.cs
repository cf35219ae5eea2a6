using System.Globalization;
using System.Text.RegularExpressions;
using NetSolve.Model;

namespace NetSolve.Parsing;

/// <summary>Parses the contract's value forms: numbers, durations, rates and probabilities.</summary>
/// <remarks>Each method returns null on success and an error message (one line, no location) on failure.</remarks>
public static partial class ValueParser
{
    private const string NumberPattern = @"[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?";

    /// <summary>Parses a finite number.</summary>
    public static string? Number(string text, out double value)
    {
        ArgumentNullException.ThrowIfNull(text);
        value = 0.0;
        if (!NumberRegex().IsMatch(text))
        {
            return $"'{text}' is not a number";
        }

        value = double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);
        return double.IsFinite(value) ? null : $"'{text}' is too large for a number";
    }

    /// <summary>Parses a positive duration (<c>45</c>, <c>45min</c>, <c>2.5 h</c>, <c>4d</c>, <c>30s</c>) into hours.</summary>
    public static string? Duration(string text, TimeUnit timeUnit, out double hours)
    {
        ArgumentNullException.ThrowIfNull(text);
        hours = 0.0;
        var match = DurationRegex().Match(text);
        if (!match.Success)
        {
            return $"'{text}' is not a duration (write e.g. 45min, 2.5h, 3d, 30s, or a number in {TimeConstants.Name(timeUnit)}s)";
        }

        if (Number(match.Groups["n"].Value, out double amount) is string error)
        {
            return error;
        }

        hours = amount * HoursPerSuffix(match.Groups["u"].Value, timeUnit);
        return hours > 0.0 && double.IsFinite(hours) ? null : $"'{text}' is not a positive duration";
    }

    /// <summary>Parses a rate that is not negative (<c>11.5</c>, <c>11.5/h</c>, <c>280 /d</c>) into events per hour.</summary>
    public static string? Rate(string text, TimeUnit timeUnit, out double perHour)
    {
        ArgumentNullException.ThrowIfNull(text);
        perHour = 0.0;
        var match = RateRegex().Match(text);
        if (!match.Success)
        {
            return $"'{text}' is not a rate (write e.g. 11.5/h, 280/d, 0.2/min, or a number per {TimeConstants.Name(timeUnit)})";
        }

        if (Number(match.Groups["n"].Value, out double amount) is string error)
        {
            return error;
        }

        perHour = amount / HoursPerSuffix(match.Groups["u"].Value, timeUnit);
        if (!double.IsFinite(perHour))
        {
            return $"'{text}' is too large for a rate";
        }

        return perHour >= 0.0 ? null : $"'{text}' is negative; an arrival rate is 0 or more";
    }

    /// <summary>Parses a probability in [0, 1] (<c>0.35</c>, <c>35%</c>, <c>35 %</c>).</summary>
    public static string? Probability(string text, out double probability)
    {
        ArgumentNullException.ThrowIfNull(text);
        probability = 0.0;
        var match = ProbabilityRegex().Match(text);
        if (!match.Success)
        {
            return $"'{text}' is not a probability (write e.g. 0.35 or 35%)";
        }

        if (Number(match.Groups["n"].Value, out double amount) is string error)
        {
            return error;
        }

        probability = match.Groups["p"].Success ? amount / 100.0 : amount;
        return probability is >= 0.0 and <= 1.0 ? null : $"'{text}' is not between 0 and 1";
    }

    private static double HoursPerSuffix(string suffix, TimeUnit timeUnit) => suffix switch
    {
        "" => TimeConstants.HoursPer(timeUnit),
        "s" => 1.0 / TimeConstants.SecondsPerHour,
        "min" => 1.0 / TimeConstants.MinutesPerHour,
        "h" => 1.0,
        "d" => TimeConstants.HoursPerDay,
        _ => throw new ArgumentOutOfRangeException(nameof(suffix), suffix, "Unknown time suffix."),
    };

    [GeneratedRegex("^" + NumberPattern + "$", RegexOptions.CultureInvariant)]
    private static partial Regex NumberRegex();

    [GeneratedRegex("^(?<n>" + NumberPattern + ")(?: ?(?<u>s|min|h|d))?$", RegexOptions.CultureInvariant)]
    private static partial Regex DurationRegex();

    [GeneratedRegex("^(?<n>" + NumberPattern + ")(?: ?/(?<u>s|min|h|d))?$", RegexOptions.CultureInvariant)]
    private static partial Regex RateRegex();

    [GeneratedRegex("^(?<n>" + NumberPattern + ")(?<p> ?%)?$", RegexOptions.CultureInvariant)]
    private static partial Regex ProbabilityRegex();
}
