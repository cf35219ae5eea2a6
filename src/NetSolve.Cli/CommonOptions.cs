using System.CommandLine;
using NetSolve.Cli.Output;
using NetSolve.Cli.Settings;
using NetSolve.Solving;

namespace NetSolve.Cli;

/// <summary>Options shared by several commands, defined once so they read the same everywhere.</summary>
internal static class CommonOptions
{
    /// <summary>What <c>--format</c> says when the command does not say more.</summary>
    public const string FormatDescription = "Output: table (for people), json (the contract's document) or csv (one row per unit).";

    private static readonly string[] Formats = ["table", "json", "csv"];

    /// <summary>Show the stack trace of an internal error.</summary>
    /// <remarks>
    /// A new option for each command tree: an option remembers every command it is added to, so one shared instance
    /// kept every tree ever built alive (about 50 KB a run) in a process that runs the command line many times.
    /// </remarks>
    public static Option<bool> Verbose() => new("--verbose")
    {
        Description = "Show full details of an internal error.",
        Recursive = true,
    };

    /// <summary>The network file argument: a network file or a scenario file.</summary>
    public static Argument<string> NetworkFile() => new("FILE")
    {
        Description = "Network file (YAML, see docs/network-file.md), or a scenario file (its base network with the changes, see docs/scenarios.md).",
    };

    /// <summary><c>--format table|json|csv</c>, read by our own parser so a bad value is one line naming the option.</summary>
    public static Option<string> Format(string description = FormatDescription) => SettingOptions.Choice("--format", description, "table", Formats, "-f");

    /// <summary>The format a valid <c>--format</c> value names.</summary>
    public static OutputFormat FormatOf(string? value) => value switch
    {
        "json" => OutputFormat.Json,
        "csv" => OutputFormat.Csv,
        _ => OutputFormat.Table,
    };

    /// <summary><c>--strain</c>: utilisation at which a unit is flagged strained, read in invariant culture.</summary>
    public static Option<double> Strain() => SettingOptions.Fraction(
        "--strain",
        value => value > 0.0,
        text => Messages.NotNumber("--strain", text, "a utilisation", "above 0 and at most 1", "write e.g. 0.85 or 85%"),
        Defaults.StrainThreshold,
        "Utilisation at or above which a unit is flagged strained, above 0 and at most 1 or 100% (default 0.85, the common planning rule of thumb).");
}
