using System.CommandLine;
using System.Globalization;
using NetSolve.Solving;

namespace NetSolve.Cli;

/// <summary>Options shared by several commands, defined once so they read the same everywhere.</summary>
internal static class CommonOptions
{
    /// <summary>Show the stack trace of an internal error.</summary>
    public static readonly Option<bool> Verbose = new("--verbose")
    {
        Description = "Show full details of an internal error.",
        Recursive = true,
    };

    /// <summary>The network file argument.</summary>
    public static Argument<string> NetworkFile() => new("FILE")
    {
        Description = "Network file (YAML, see docs/network-file.md).",
    };

    /// <summary><c>--format table|json|csv</c>.</summary>
    public static Option<string> Format() => new Option<string>("--format", "-f")
    {
        Description = "Output: table (for people), json (the contract's document) or csv (one row per unit).",
        DefaultValueFactory = _ => "table",
    }.AcceptOnlyFromAmong("table", "json", "csv");

    /// <summary><c>--strain</c>: utilisation at which a unit is flagged strained.</summary>
    public static Option<double> Strain()
    {
        var option = new Option<double>("--strain")
        {
            Description = "Utilisation at or above which a unit is flagged strained (default 0.85, the common planning rule of thumb).",
            DefaultValueFactory = _ => Defaults.StrainThreshold,
        };
        option.Validators.Add(result =>
        {
            double value = result.GetValueOrDefault<double>();
            if (!(value > 0.0 && value <= 1.0))
            {
                result.AddError(string.Create(CultureInfo.InvariantCulture, $"--strain must be above 0 and at most 1, not {value}"));
            }
        });
        return option;
    }
}
