using NetSolve.Model;
using NetSolve.Parsing;

namespace NetSolve.Cli.Settings;

/// <summary>
/// Warns when a time on the command line is a bare number: it is read in the file's time unit, so
/// <c>--max-wait 30</c> on an hourly file is 30 hours, a target every unit already meets.
/// </summary>
internal static class BareOptionNumbers
{
    /// <summary>Reports a warning for <paramref name="text"/> given to <paramref name="option"/> when it carries no unit of time.</summary>
    public static void Report(WarningLog warnings, string option, string text, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(warnings);
        if (BareNumbers.IsBare(text, out double amount))
        {
            warnings.Report(Messages.BareOptionNumber(option, text, amount, TimeConstants.Name(timeUnit)));
        }
    }
}
