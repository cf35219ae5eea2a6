using System.CommandLine;
using System.CommandLine.Parsing;
using NetSolve.Cli.Output;
using NetSolve.Cli.Settings;
using NetSolve.Presentation;
using NetSolve.Solving;

namespace NetSolve.Cli.Commands;

/// <summary>
/// The shape of every command that works on one network. It binds FILE (a network file or a scenario file),
/// <c>--format</c>, <c>--strain</c> and <c>--set</c> once, checks the command's own rules between options with
/// the other usage errors (every problem at once, exit 2), loads the network and hands it to <see cref="Execute"/>
/// as a <see cref="NetworkRequest"/>. A table written through <see cref="NetworkRequest.Output"/> ends with the
/// planning caution when <see cref="TableCarriesCaution"/>.
/// </summary>
/// <remarks>A command declares its own options as fields and lists them in <see cref="Symbols"/>.</remarks>
internal abstract class NetworkCommand(string name, string description)
{
    /// <summary>What <c>--format</c> says in help; null for a command that writes a file and takes no <c>--format</c>.</summary>
    protected virtual string? FormatDescription => CommonOptions.FormatDescription;

    /// <summary>False for a command that solves nothing, so <c>--strain</c> means nothing to it.</summary>
    protected virtual bool TakesStrain => true;

    /// <summary>True when the command's table gives capacity or staffing advice and so ends with the planning caution.</summary>
    protected virtual bool TableCarriesCaution => true;

    /// <summary>True for the simulator: it uses the keys the formulas ignore, so their warnings do not apply.</summary>
    protected virtual bool ForSimulation => false;

    /// <summary>The command's own arguments (after FILE) and options (after the shared ones).</summary>
    protected virtual IEnumerable<Symbol> Symbols => [];

    /// <summary>Builds the command; its handler writes to <paramref name="context"/>.</summary>
    public Command Create(CliContext context)
    {
        var file = CommonOptions.NetworkFile();
        var set = WhatIfOption.Create();
        var format = FormatDescription is string formatDescription ? CommonOptions.Format(formatDescription) : null;
        var strain = TakesStrain ? CommonOptions.Strain() : null;
        var command = new Command(name, description) { file };
        foreach (var argument in Symbols.OfType<Argument>())
        {
            command.Arguments.Add(argument);
        }

        foreach (var option in new Option?[] { format, strain, set }.OfType<Option>().Concat(Symbols.OfType<Option>()))
        {
            command.Options.Add(option);
        }

        file.CheckAfterOptions(CheckSettings);
        command.SetAction(parse =>
        {
            string path = parse.GetValue(file)!;
            var warnings = new WarningLog(context);
            var loaded = NetworkLoader.Read(path, warnings, parse.GetValue(set), ForSimulation);
            var output = new ResultOutput(context.Out, format is null ? OutputFormat.Table : CommonOptions.FormatOf(parse.GetValue(format)), TableCarriesCaution ? Caution.Text : null, loaded.Changes);
            double threshold = strain is null ? Defaults.StrainThreshold : parse.GetValue(strain);
            return Execute(new NetworkRequest(path, loaded.Network, threshold, output, context, warnings, parse) { Changes = loaded.Changes });
        });
        return command;
    }

    /// <summary>
    /// The command's rules between its options, checked at parse time: one problem per broken rule, each naming
    /// its options. Read values with <see cref="SettingsCheck.TryGetValue"/>, which skips an option whose own
    /// value was already reported bad.
    /// </summary>
    protected virtual IEnumerable<string> CheckSettings(CommandResult settings) => [];

    /// <summary>Does the command's work on the loaded network; returns the exit code.</summary>
    /// <remarks>Bad input found here is an <see cref="InputException"/> (exit 1); wrong usage that needed the file to see, a <see cref="UsageException"/> (exit 2).</remarks>
    protected abstract int Execute(NetworkRequest request);
}
