using System.CommandLine;
using System.Text.RegularExpressions;
using NetSolve.Model;
using NetSolve.Parsing;

namespace NetSolve.Cli;

/// <summary>The simulation options <c>simulate</c> and <c>report --simulate</c> share, defined once so they read the same.</summary>
internal static partial class SimulationCliOptions
{
    /// <summary><c>--seed</c>, default 1.</summary>
    public static Option<ulong> Seed() => new("--seed")
    {
        Description = "Seed of the run; the same seed gives the same numbers on any machine and thread count.",
        DefaultValueFactory = _ => 1UL,
    };

    /// <summary><c>--replications/-r</c>, at least 1.</summary>
    public static Option<int> Replications(int defaultValue)
    {
        var option = new Option<int>("--replications", "-r")
        {
            Description = "Independent replications (at least 2 for confidence intervals).",
            DefaultValueFactory = _ => defaultValue,
        };
        option.Validators.Add(result =>
        {
            if (result.GetValueOrDefault<int>() < 1)
            {
                result.AddError("--replications must be at least 1");
            }
        });
        return option;
    }

    /// <summary>A duration option (<c>28d</c>, <c>12h</c>, <c>90min</c>); a bad value is a usage error naming the option.</summary>
    public static Option<string> Duration(string name, string description, string defaultValue, bool allowZero)
    {
        var option = new Option<string>(name) { Description = description, DefaultValueFactory = _ => defaultValue };
        option.Validators.Add(result =>
        {
            string text = result.GetValueOrDefault<string>() ?? string.Empty;
            if (ParseDuration(text, TimeUnit.Hour, allowZero) is null)
            {
                result.AddError($"{name}: '{text}' is not a {(allowZero ? string.Empty : "positive ")}duration (write e.g. 28d, 12h, 90min)");
            }
        });
        return option;
    }

    /// <summary>Hours, or null when <paramref name="text"/> is not a duration; bare numbers are in <paramref name="timeUnit"/>.</summary>
    public static double? ParseDuration(string text, TimeUnit timeUnit, bool allowZero)
    {
        if (ValueParser.Duration(text, timeUnit, out double hours) is null)
        {
            return hours;
        }

        return allowZero && ZeroDurationRegex().IsMatch(text) ? 0.0 : null;
    }

    [GeneratedRegex("^0*(?:\\.0*)?(?: ?(?:s|min|h|d))?$", RegexOptions.CultureInvariant, matchTimeoutMilliseconds: 1000)]
    private static partial Regex ZeroDurationRegex();
}
