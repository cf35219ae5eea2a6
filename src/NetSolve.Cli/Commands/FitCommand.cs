using System.CommandLine;
using System.CommandLine.Parsing;
using System.Text;
using NetSolve.Cli.Settings;
using NetSolve.Cli.Terminal;
using NetSolve.Fitting;
using NetSolve.Fitting.Reading;
using NetSolve.Model;
using NetSolve.Presentation;
using NetSolve.Presentation.Fitting.Evidence;
using NetSolve.Rendering.Report;
using NetSolve.Solving;
using NetSolve.Parsing;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve fit LOG.csv</c>: estimates a network file from a log of patient movements.</summary>
internal static class FitCommand
{
    /// <summary>Logs smaller than this (about 600,000 rows) read in a few seconds: no progress bar.</summary>
    private const long ProgressBarFromBytes = 40L * 1024 * 1024;

    public static Command Create(CliContext context)
    {
        var log = new Argument<string>("LOG") { Description = "Movement log (CSV: patient,unit,arrived,started,left; see docs/movement-log.md)." };
        var output = OutputFileOption.Optional("Write the network file here (default: print it).");
        var timeUnit = SettingOptions.Choice("--time-unit", "Time unit of the network file written: minute, hour or day.", "hour", ["minute", "hour", "day"]);
        var name = new Option<string?>("--name") { Description = "Network name (default: the log's file name)." };
        name.Validators.Add(result => RefuseUnsafeName(result, result.GetValueOrDefault<string?>()));
        var format = SettingOptions.Choice("--format", "Summary: table (for people) or json (the fit evidence as one document).", "table", ["table", "json"], "-f");
        var report = OutputFileOption.Named(
            new Option<string?>("--report")
            {
                Description = "Also write an HTML report (.html) of the fitted network with a section on how sure the fit is.",
                HelpName = "FILE",
            },
            ReportCommand.Extensions);
        var roster = new Option<string[]>("--servers")
        {
            Description = "Servers from the roster or bed count: UNIT=N (repeat per unit) or a CSV file with the columns unit,servers; units not given get the peak in service, flagged when they never queued.",
            HelpName = "UNIT=N|FILE",
        };
        var reading = new FitLogOptions();
        var command = new Command("fit", "Estimate a network from a log of patient movements: arrival rates, routing fractions, service times and servers.")
        {
            log, output, timeUnit, name, format, report, roster,
        };
        foreach (var option in reading.All)
        {
            command.Options.Add(option);
        }

        command.SetAction(parse =>
        {
            string path = parse.GetValue(log)!;
            var movements = ReadLog(path, reading.Read(parse), context);
            var unit = Enum.Parse<TimeUnit>(parse.GetValue(timeUnit)!, ignoreCase: true);
            FittedNetwork fitted;
            try
            {
                fitted = NetworkFitter.Fit(movements, parse.GetValue(name) ?? Path.GetFileNameWithoutExtension(path), unit, FitRoster.Read(parse.GetValue(roster) ?? [], movements));
            }
            catch (ArgumentException exception)
            {
                throw new InputException(Messages.FitProblem(path, exception.Message.Split(" (Parameter", 2)[0]), exception);
            }

            string[] header = [.. Messages.FittedHeader(Path.GetFileName(path), fitted.Patients, movements.Stays,
                TimeConstants.FromHours(fitted.WindowHours, unit), TimeConstants.Name(unit)), .. FitNotes.Lines(fitted, withRowOrder: false)];
            var solution = NetworkSolver.Solve(fitted.Network);
            var predicted = FitPredictedWaits.Of(solution);
            if (parse.GetValue(report) is string reportTarget)
            {
                string html = HtmlReport.Write(solution, provenance: ReportProvenanceReader.Read(path, []), fitEvidence: fitted.Evidence);
                AtomicFile.Write(reportTarget, stream => stream.Write(new UTF8Encoding(false).GetBytes(html)));
            }

            string? target = parse.GetValue(output);
            if (target is not null)
            {
                AtomicFile.Write(target, stream =>
                {
                    using var writer = new StreamWriter(stream, new UTF8Encoding(false));
                    NetworkYamlWriter.Write(fitted.Network, writer, header);
                });
            }

            if (parse.GetValue(format) == "json")
            {
                FitJsonSummary.Write(fitted, predicted, target is null ? Yaml(fitted, header) : null, context.Out);
            }
            else if (target is not null)
            {
                WriteSummary(fitted, predicted, context.Out);
                context.Out.Write("\n" + Messages.NetworkWritten(target) + "\n");
            }
            else
            {
                NetworkYamlWriter.Write(fitted.Network, context.Out, header);
            }

            if (parse.GetValue(report) is string written)
            {
                context.Report(Messages.ReportWritten(written));
            }

            return ExitCodes.Success;
        });
        return command;
    }

    /// <summary>
    /// Streams the log (any size) under a progress bar when stderr is a terminal and the file is large enough for
    /// one to help; warnings (an unknown column ignored) go to stderr, errors stop the command.
    /// </summary>
    private static MovementLog ReadLog(string path, MovementLogOptions options, CliContext context)
    {
        using var stream = InputFile.TryOpen(path, "a movement log", out var problem) ?? throw new InputException(problem!.ToString());
        long length = stream.CanSeek ? stream.Length : 0;
        var (log, diagnostics) = context.IsTerminal && length >= ProgressBarFromBytes
            ? ReadProgressBar.Run(Messages.ReadingLog(Path.GetFileName(path)), length, progress => MovementLogReader.Read(stream, path, options, progress), context.Error)
            : MovementLogReader.Read(stream, path, options);
        if (log is null)
        {
            throw new InputException(string.Join("\n", diagnostics.Where(d => d.IsError)));
        }

        foreach (var warning in diagnostics)
        {
            context.Report(warning.ToString());
        }

        return log;
    }

    /// <summary>
    /// A name with a character network files refuse (a control, a line break, a direction override) is a usage error:
    /// the name is written into the network file and shown on the terminal, and the file would not read back.
    /// </summary>
    private static void RefuseUnsafeName(OptionResult result, string? text)
    {
        if (text is null)
        {
            return;
        }

        int index = text.AsSpan().IndexOfAny('\t', '\n', '\r');
        index = index >= 0 ? index : InputCharacters.FindRefused(text);
        if (index >= 0)
        {
            string why = text[index] is '\t' or '\n' or '\r' ? "a tab or line break is not allowed in a name" : InputCharacters.Describe(text, index);
            result.AddError(Messages.NotName("--name", text, why));
        }
    }

    /// <summary>The summary for people: the evidence per unit (with the waits the fitted network predicts), then the notes.</summary>
    private static void WriteSummary(FittedNetwork fitted, IReadOnlyDictionary<string, double?> predicted, TextWriter output)
    {
        FitEvidenceTable.Write(fitted.Evidence, predicted, fitted.Network.TimeUnit, output);
        output.Write("\n" + string.Join("\n", FitNotes.Lines(fitted, withRowOrder: true)) + "\n");
    }

    private static string Yaml(FittedNetwork fitted, IEnumerable<string> header)
    {
        using var text = new StringWriter(System.Globalization.CultureInfo.InvariantCulture);
        NetworkYamlWriter.Write(fitted.Network, text, header);
        return text.ToString();
    }
}
