using System.CommandLine;
using System.CommandLine.Parsing;

namespace NetSolve.Cli.Settings;

/// <summary>
/// Rules between a command's options, checked at parse time with every other usage error. An option whose own
/// value was bad is skipped by <see cref="TryGetValue"/>: its problem is already on the list.
/// </summary>
internal static class SettingsCheck
{
    /// <summary>True when <paramref name="option"/> was written on the command line (not left to its default).</summary>
    public static bool IsGiven(this CommandResult command, Option option) => command.GetResult(option) is { Implicit: false };

    /// <summary>The option's value (its default when not given); false when its own parser reported a problem.</summary>
    public static bool TryGetValue<T>(this CommandResult command, Option<T> option, out T? value)
    {
        try
        {
            value = command.GetValue(option);
            return true;
        }
        catch (InvalidOperationException)
        {
            // System.CommandLine throws the option's own parse error again here; it is reported once, by the parse.
            value = default;
            return false;
        }
    }

    /// <summary>
    /// Checks <paramref name="rules"/> between a command's options once every option has been read, and adds each
    /// problem as a parse error. System.CommandLine reads a command's options before its arguments and skips them
    /// all when a command validator fails first, so the rules hang on an argument every use gives (FILE): then a bad
    /// value and a broken rule are reported together.
    /// </summary>
    public static void CheckAfterOptions(this Argument argument, Func<CommandResult, IEnumerable<string>> rules)
    {
        ArgumentNullException.ThrowIfNull(argument);
        ArgumentNullException.ThrowIfNull(rules);
        argument.Validators.Add(result =>
        {
            foreach (string problem in rules((CommandResult)result.Parent!))
            {
                result.AddError(problem);
            }
        });
    }
}
