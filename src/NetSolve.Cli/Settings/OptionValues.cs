using System.Globalization;
using System.Text.RegularExpressions;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Parsing.Values;

namespace NetSolve.Cli.Settings;

/// <summary>
/// Reads option values, one reader per kind of value, always in invariant culture (the built-in readers use the
/// current culture: 0.9 reads as 9 under de-DE). Each returns null on success and the problem, naming the option,
/// otherwise; none throws for bad text.
/// </summary>
internal static partial class OptionValues
{
    /// <summary>A whole number from <paramref name="min"/> to <paramref name="max"/> (no exponent, no fraction).</summary>
    public static string? WholeNumber(string option, string text, int min, int max, out int value)
    {
        value = 0;
        if (!long.TryParse(text, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out long number) || number < min || number > max)
        {
            return Messages.NotWholeNumber(option, text, min, max);
        }

        value = (int)number;
        return null;
    }

    /// <summary>A seed: any whole number from 0 to <see cref="ulong.MaxValue"/>.</summary>
    public static string? Seed(string option, string text, out ulong value) =>
        ulong.TryParse(text, NumberStyles.None, CultureInfo.InvariantCulture, out value) ? null : Messages.NotWholeNumber(option, text, 0, ulong.MaxValue);

    /// <summary>A finite number for which <paramref name="accept"/> holds; NaN and infinities are not numbers here.</summary>
    public static bool Number(string text, Func<double, bool> accept, out double value) =>
        ValueParser.Number(text, out value) is null && accept(value);

    /// <summary>
    /// A fraction as the files write a probability (<c>0.85</c>, <c>85%</c>, <c>85 %</c>) for which <paramref name="accept"/> holds.
    /// </summary>
    public static bool Fraction(string text, Func<double, bool> accept, out double value) =>
        ValueParser.Probability(text, out value) is null && accept(value);

    /// <summary>One of <paramref name="choices"/>, exactly as written there.</summary>
    public static string? Choice(string option, string text, IReadOnlyCollection<string> choices) =>
        choices.Contains(text, StringComparer.Ordinal) ? null : Messages.NotOneOf(option, text, choices);

    /// <summary>
    /// A duration in hours. With <paramref name="fileUnit"/> null (at parse time, before the file is read) a bare
    /// number could be in any time unit: the form is checked, and a limit only when every time unit breaks it.
    /// </summary>
    public static string? Duration(string option, string text, DurationRule rule, TimeUnit? fileUnit, out double hours)
    {
        ArgumentNullException.ThrowIfNull(rule);
        if (!TryDuration(text, fileUnit ?? TimeUnit.Minute, rule.AllowZero, out hours))
        {
            return OutOfRange(option, text, rule, fileUnit ?? TimeUnit.Minute) ?? Messages.NotDuration(option, text, rule.AllowZero, rule.Examples);
        }

        // Minutes give the fewest hours for a bare number and days the most, so these bounds hold in any file.
        double shortest = hours;
        double longest = fileUnit is null ? (TryDuration(text, TimeUnit.Day, rule.AllowZero, out double days) ? days : double.PositiveInfinity) : hours;
        if (shortest > rule.MaxDays * TimeConstants.HoursPerDay)
        {
            return Messages.DurationTooLong(option, text, rule.MaxDays, rule.TooLong);
        }

        if (longest < rule.MinDays * TimeConstants.HoursPerDay)
        {
            return Messages.DurationTooShort(option, text, rule.Shortest, rule.TooShort);
        }

        return null;
    }

    /// <summary>
    /// The problem of a well-formed duration outside the files' range (<see cref="ValueRanges.DurationRange"/>): the
    /// option's own limit when it has one and the text is too long, else the parser's message, which says the range.
    /// Null when the text is not a duration at all.
    /// </summary>
    private static string? OutOfRange(string option, string text, DurationRule rule, TimeUnit timeUnit)
    {
        if (ValueParser.Duration(text, timeUnit, out _) is not string problem || !problem.Contains(ValueRanges.DurationRange, StringComparison.Ordinal))
        {
            return null;
        }

        return problem.Contains("too long", StringComparison.Ordinal) && double.IsFinite(rule.MaxDays)
            ? Messages.DurationTooLong(option, text, rule.MaxDays, rule.TooLong)
            : Messages.OutOfRange(option, problem);
    }

    private static bool TryDuration(string text, TimeUnit timeUnit, bool allowZero, out double hours)
    {
        if (ValueParser.Duration(text, timeUnit, out hours) is null)
        {
            return true;
        }

        hours = 0.0;
        return allowZero && ZeroDurationRegex().IsMatch(text);
    }

    [GeneratedRegex("^(?:0+(?:\\.0*)?|\\.0+)(?: ?(?:s|min|h|d))?$", RegexOptions.CultureInvariant, matchTimeoutMilliseconds: 1000)]
    private static partial Regex ZeroDurationRegex();
}
