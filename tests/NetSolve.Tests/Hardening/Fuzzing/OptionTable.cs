using System.CommandLine;
using NetSolve.Cli;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>
/// Every option of every command with the kind of value it takes. The options are read from the program's own
/// command tree, so a new option is fuzzed as soon as it exists; its kind comes from <see cref="Kinds"/>, and a test
/// fails while an option has none.
/// </summary>
internal static class OptionTable
{
    /// <summary>Kinds by option name, then by <c>COMMAND OPTION</c> where one name means different things in different commands.</summary>
    public static readonly IReadOnlyDictionary<string, OptionKind> Kinds = new Dictionary<string, OptionKind>(StringComparer.Ordinal)
    {
        ["--format"] = OptionKind.Choice,
        ["--direction"] = OptionKind.Choice,
        ["--time-unit"] = OptionKind.Choice,
        ["--strain"] = OptionKind.Fraction,
        ["--set"] = OptionKind.WhatIf,
        ["--output"] = OptionKind.OutputPath,
        ["--stream"] = OptionKind.Unit,
        ["growth --from"] = OptionKind.Number,
        ["growth --to"] = OptionKind.Number,
        ["--steps"] = OptionKind.WholeNumber,
        ["pathway --from"] = OptionKind.Unit,
        ["pathway --to"] = OptionKind.Unit,
        ["--path"] = OptionKind.Unit,
        ["--max-util"] = OptionKind.Fraction,
        ["--max-wait"] = OptionKind.Duration,
        ["--max-time"] = OptionKind.Duration,
        ["--wait-over"] = OptionKind.Duration,
        ["--at-most"] = OptionKind.Fraction,
        ["--max-turned-away"] = OptionKind.Fraction,
        ["--cost"] = OptionKind.UnitNumber,
        ["--budget"] = OptionKind.WholeNumber,
        ["--target"] = OptionKind.Text,
        ["--only"] = OptionKind.Unit,
        ["--by-hour"] = OptionKind.Flag,
        ["--shifts"] = OptionKind.Text,
        ["--exact"] = OptionKind.Flag,
        ["--no-check"] = OptionKind.Flag,
        ["--chart"] = OptionKind.OutputPath,
        ["--seed"] = OptionKind.Seed,
        ["--replications"] = OptionKind.WholeNumber,
        ["--warmup"] = OptionKind.Duration,
        ["--duration"] = OptionKind.Duration,
        ["--threads"] = OptionKind.WholeNumber,
        ["--compare"] = OptionKind.Flag,
        ["--simulate"] = OptionKind.Flag,
        ["--name"] = OptionKind.Text,
        ["--verbose"] = OptionKind.Flag,
        ["--precision"] = OptionKind.Fraction,
        ["--max-replications"] = OptionKind.WholeNumber,
        ["--allow-long"] = OptionKind.Flag,
        ["--extract-start"] = OptionKind.Text,
        ["--extract-end"] = OptionKind.Text,
        ["--time-zone"] = OptionKind.Text,
        ["--new-journey-after"] = OptionKind.Duration,
        ["--ignore-case"] = OptionKind.Flag,
        ["--strict"] = OptionKind.Flag,
        ["--unit-map"] = OptionKind.Text,
        ["fit --report"] = OptionKind.OutputPath,
        ["fit --servers"] = OptionKind.Text,
    };

    /// <summary>Each command's options (help left out), as the command tree declares them.</summary>
    public static IReadOnlyList<(string Command, string Option)> Options()
    {
        using var sink = new StringWriter();
        var root = NetSolveApp.BuildRoot(new CliContext(sink, sink));
        return
        [
            .. from command in root.Subcommands
               from option in command.Options
               where option is not System.CommandLine.Help.HelpOption and not VersionOption
               select (command.Name, option.Name),
        ];
    }

    /// <summary>The kind of <paramref name="option"/> in <paramref name="command"/>, or null when the table lacks it.</summary>
    public static OptionKind? KindOf(string command, string option) =>
        Kinds.TryGetValue(command + " " + option, out var specific) ? specific
        : Kinds.TryGetValue(option, out var general) ? general
        : null;
}
