using NetSolve.Model;

namespace NetSolve.Parsing.Values;

/// <summary>
/// The contract's number form, <c>[+-]? (digits [. digits?] | . digits) ([eE] [+-]? digits)?</c>, and the split of
/// a value into that number and what follows it. Shared by every value kind, so they all accept the same numbers.
/// </summary>
internal static class NumberText
{
    /// <summary>The time suffixes a duration or rate may carry, besides none (the file's time unit).</summary>
    public static bool IsTimeSuffix(ReadOnlySpan<char> suffix) => suffix is "" or "s" or "min" or "h" or "d";

    /// <summary>Hours in one <paramref name="suffix"/>; none means one <paramref name="timeUnit"/>.</summary>
    public static double HoursPerSuffix(ReadOnlySpan<char> suffix, TimeUnit timeUnit) => suffix switch
    {
        "" => TimeConstants.HoursPer(timeUnit),
        "s" => 1.0 / TimeConstants.SecondsPerHour,
        "min" => 1.0 / TimeConstants.MinutesPerHour,
        "h" => 1.0,
        "d" => TimeConstants.HoursPerDay,
        _ => throw new ArgumentOutOfRangeException(nameof(suffix), suffix.ToString(), "Unknown time suffix."),
    };

    /// <summary>The number <paramref name="text"/> is, in full; false when it is anything else or overflows.</summary>
    /// <param name="text">The text.</param>
    /// <param name="value">The number; infinite when the form is right but too large for a double.</param>
    /// <returns>True when all of <paramref name="text"/> is one number in the contract's form.</returns>
    public static bool IsNumber(ReadOnlySpan<char> text, out double value)
    {
        value = 0.0;
        if (text.Length == 0 || NumberLength(text) != text.Length)
        {
            return false;
        }

        value = double.Parse(text, System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture);
        return true;
    }

    /// <summary>
    /// Splits <c>NUMBER[ ]MARKER SUFFIX</c>: a number in the contract's form, then (only when anything follows) one
    /// optional space, <paramref name="marker"/> and the rest as the suffix. False when no number starts the text.
    /// </summary>
    public static bool Split(ReadOnlySpan<char> text, string marker, out ReadOnlySpan<char> number, out ReadOnlySpan<char> suffix)
    {
        int length = NumberLength(text);
        number = text[..length];
        suffix = [];
        if (length == 0)
        {
            return false;
        }

        if (length == text.Length)
        {
            return true;
        }

        int rest = text[length] == ' ' ? length + 1 : length;
        if (!text[rest..].StartsWith(marker, StringComparison.Ordinal))
        {
            return false;
        }

        suffix = text[(rest + marker.Length)..];
        return suffix.Length > 0;
    }

    private static int NumberLength(ReadOnlySpan<char> text)
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

    private static int Digits(ReadOnlySpan<char> text, ref int i)
    {
        int start = i;
        while (i < text.Length && char.IsAsciiDigit(text[i]))
        {
            i++;
        }

        return i - start;
    }
}
