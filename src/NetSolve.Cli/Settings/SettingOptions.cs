using System.CommandLine;
using System.CommandLine.Parsing;

namespace NetSolve.Cli.Settings;

/// <summary>
/// Options read by our own parsers (<see cref="OptionValues"/>), one factory per kind of value. A bad value is a
/// parse error naming the option, so every bad option is reported at once, with the other usage errors, and exit 2.
/// </summary>
internal static class SettingOptions
{
    /// <summary>A whole number from <paramref name="min"/> to <paramref name="max"/>.</summary>
    public static Option<int> WholeNumber(string name, int min, int max, int defaultValue, string description) => new(name)
    {
        Description = description,
        DefaultValueFactory = _ => defaultValue,
        CustomParser = result => Read(result, text => (OptionValues.WholeNumber(name, text, min, max, out int value), value)),
    };

    /// <summary>A whole number from <paramref name="min"/> to <paramref name="max"/>, or null when not given.</summary>
    public static Option<int?> OptionalWholeNumber(string name, int min, int max, string description, string? helpName = null) => new(name)
    {
        Description = description,
        HelpName = helpName,
        CustomParser = result => Read<int?>(result, text => (OptionValues.WholeNumber(name, text, min, max, out int value), value)),
    };

    /// <summary>A number that <paramref name="accept"/> takes; otherwise <paramref name="problem"/> of the text.</summary>
    public static Option<double> Number(string name, Func<double, bool> accept, Func<string, string> problem, double defaultValue, string description) => new(name)
    {
        Description = description,
        DefaultValueFactory = _ => defaultValue,
        CustomParser = result => Read(result, text => (OptionValues.Number(text, accept, out double value) ? null : problem(text), value)),
    };

    /// <summary>As <see cref="Number"/>, null when not given.</summary>
    public static Option<double?> OptionalNumber(string name, Func<double, bool> accept, Func<string, string> problem, string description, string? helpName = null) => new(name)
    {
        Description = description,
        HelpName = helpName,
        CustomParser = result => Read<double?>(result, text => (OptionValues.Number(text, accept, out double value) ? null : problem(text), value)),
    };

    /// <summary>A fraction (<c>0.85</c> or <c>85%</c>, as a file's probability) that <paramref name="accept"/> takes; otherwise <paramref name="problem"/> of the text.</summary>
    public static Option<double> Fraction(string name, Func<double, bool> accept, Func<string, string> problem, double defaultValue, string description) => new(name)
    {
        Description = description,
        DefaultValueFactory = _ => defaultValue,
        CustomParser = result => Read(result, text => (OptionValues.Fraction(text, accept, out double value) ? null : problem(text), value)),
    };

    /// <summary>As <see cref="Fraction"/>, null when not given.</summary>
    public static Option<double?> OptionalFraction(string name, Func<double, bool> accept, Func<string, string> problem, string description, string? helpName = null) => new(name)
    {
        Description = description,
        HelpName = helpName,
        CustomParser = result => Read<double?>(result, text => (OptionValues.Fraction(text, accept, out double value) ? null : problem(text), value)),
    };

    /// <summary>A duration as written (a bare number is in the file's time unit, so it becomes hours only once the file is read).</summary>
    public static Option<string> Duration(string name, DurationRule rule, string? defaultValue, string description, string? helpName = null)
    {
        var option = new Option<string>(name)
        {
            Description = description,
            HelpName = helpName,
            CustomParser = result => Read(result, text => (OptionValues.Duration(name, text, rule, null, out _), text)),
        };
        if (defaultValue is not null)
        {
            option.DefaultValueFactory = _ => defaultValue;
        }

        return option;
    }

    /// <summary>One of <paramref name="choices"/>, shown in help as <c>a|b|c</c>.</summary>
    public static Option<string> Choice(string name, string description, string defaultValue, string[] choices, params string[] aliases)
    {
        var option = new Option<string>(name, aliases)
        {
            Description = description,
            HelpName = string.Join("|", choices),
            DefaultValueFactory = _ => defaultValue,
            CustomParser = result => Read(result, text => (OptionValues.Choice(name, text, choices), text)),
        };
        option.CompletionSources.Add(choices);
        return option;
    }

    /// <summary>
    /// Parses the option's one token with <paramref name="parse"/>; a problem becomes a parse error on the option.
    /// </summary>
    public static T Read<T>(ArgumentResult result, Func<string, (string? Problem, T Value)> parse)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(parse);
        string text = result.Tokens.Count > 0 ? result.Tokens[^1].Value : string.Empty;
        var (problem, value) = parse(text);
        if (problem is not null)
        {
            result.AddError(problem);
            return default!;
        }

        return value;
    }
}
