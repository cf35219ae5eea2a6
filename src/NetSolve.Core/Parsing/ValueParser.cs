using System.Globalization;
using NetSolve.Model;

namespace NetSolve.Parsing;

/// <summary>Parses the contract's value forms: numbers, durations, rates and probabilities.</summary>
/// <remarks>Each method returns null on success and an error message (one line, no location) on failure.</remarks>
public static class ValueParser
{
    /// <summary>Parses a finite number.</summary>
    public static string? Number(string text, out double value)
    {
        ArgumentNullException.ThrowIfNull(text);
        value = 0.0;
        if (NumberLength(text) != text.Length)
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
        if (!Split(text, string.Empty, out string number, out string suffix) || suffix is not ("" or "s" or "min" or "h" or "d"))
        {
            return $"'{text}' is not a duration (write e.g. 45min, 2.5h, 3d, 30s, or a number in {TimeConstants.Name(timeUnit)}s)";
        }

        if (Number(number, out double amount) is string error)
        {
            return error;
        }

        hours = amount * HoursPerSuffix(suffix, timeUnit);
        return hours > 0.0 && double.IsFinite(hours) ? null : $"'{text}' is not a positive duration";
    }

    /// <summary>Parses a rate that is not negative (<c>11.5</c>, <c>11.5/h</c>, <c>280 /d</c>) into events per hour.</summary>
    public static string? Rate(string text, TimeUnit timeUnit, out double perHour)
    {
        ArgumentNullException.ThrowIfNull(text);
        perHour = 0.0;
        if (!Split(text, "/", out string number, out string suffix) || suffix is not ("" or "s" or "min" or "h" or "d"))
        {
            return $"'{text}' is not a rate (write e.g. 11.5/h, 280/d, 0.2/min, or a number per {TimeConstants.Name(timeUnit)})";
        }

        if (Number(number, out double amount) is string error)
        {
            return error;
        }

        perHour = amount / HoursPerSuffix(suffix, timeUnit);
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
        if (!Split(text, string.Empty, out string number, out string suffix) || suffix is not ("" or "%"))
        {
            return $"'{text}' is not a probability (write e.g. 0.35 or 35%)";
        }

        if (Number(number, out double amount) is string error)
        {
            return error;
        }

        probability = suffix == "%" ? amount / 100.0 : amount;
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

    /// <summary>
    /// Splits <c>NUMBER[ ]MARKER SUFFIX</c>: a number in the contract's form, then (only when anything follows) one
    /// optional space, <paramref name="marker"/> and the rest as the suffix. False when no number starts the text.
    /// </summary>
    private static bool Split(string text, string marker, out string number, out string suffix)
    {
        int length = NumberLength(text);
        number = text[..length];
        suffix = string.Empty;
        if (length == 0)
        {
            return false;
        }

        if (length == text.Length)
        {
            return true;
        }

        int rest = text[length] == ' ' ? length + 1 : length;
        if (!text.AsSpan(rest).StartsWith(marker, StringComparison.Ordinal))
        {
            return false;
        }

        suffix = text[(rest + marker.Length)..];
        return suffix.Length > 0;
    }

    /// <summary>
    /// Length of the number at the start of <paramref name="text"/> in the form
    /// <c>[+-]? (digits [. digits?] | . digits) ([eE] [+-]? digits)?</c>; 0 when there is none.
    /// </summary>
    private static int NumberLength(string text)
    {
        int i = 0;
        if (i < text.Length && text[i] is '+' or '-')
        {
            i++;
        }

        int integerDigits = Digits(text, ref i);
        int fractionDigits = 0;
        if (i < text.Length && text[i] == '.')
        {
            i++;
            fractionDigits = Digits(text, ref i);
        }

        if (integerDigits == 0 && fractionDigits == 0)
        {
            return 0;
        }

        if (i < text.Length && text[i] is 'e' or 'E')
        {
            int exponent = i + 1;
            if (exponent < text.Length && text[exponent] is '+' or '-')
            {
                exponent++;
            }

            if (Digits(text, ref exponent) > 0)
            {
                i = exponent;
            }
        }

        return i;
    }

    private static int Digits(string text, ref int i)
    {
        int start = i;
        while (i < text.Length && char.IsAsciiDigit(text[i]))
        {
            i++;
        }

        return i - start;
    }
}
