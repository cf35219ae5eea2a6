using System.CommandLine;
using System.CommandLine.Parsing;
using System.Text;
using NetSolve.Cli.Settings;
using NetSolve.Fitting;
using NetSolve.Model;
using NetSolve.Presentation;
using NetSolve.Presentation.Fitting;
using NetSolve.Parsing;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve fit LOG.csv</c>: estimates a network file from a log of patient movements.</summary>
internal static class FitCommand
{
    public static Command Create(CliContext context)
    {
        var log = new Argument<string>("LOG") { Description = "Movement log (CSV: patient,unit,arrived,started,left; see docs/movement-log.md)." };
        var output = OutputFileOption.Optional("Write the network file here (default: print it).");
        var timeUnit = SettingOptions.Choice("--time-unit", "Time unit of the network file written: minute, hour or day.", "hour", ["minute", "hour", "day"]);
        var name = new Option<string?>("--name") { Description = "Network name (default: the log's file name)." };
        name.Validators.Add(result => RefuseUnsafeName(result, result.GetValueOrDefault<string?>()));
        var command = new Command("fit", "Estimate a network from a log of patient movements: arrival rates, routing fractions, service times and servers.")
        {
            log, output, timeUnit, name,
        };
        command.SetAction(parse =>
        {
            string path = parse.GetValue(log)!;
            var visits = ReadLog(path);
            var unit = Enum.Parse<TimeUnit>(parse.GetValue(timeUnit)!, ignoreCase: true);
            FittedNetwork fitted;
            try
            {
                fitted = NetworkFitter.Fit(visits, parse.GetValue(name) ?? Path.GetFileNameWithoutExtension(path), unit);
            }
            catch (ArgumentException exception)
            {
                throw new InputException(Messages.FitProblem(path, exception.Message.Split(" (Parameter", 2)[0]), exception);
            }

            string[] header = Messages.FittedHeader(Path.GetFileName(path), fitted.Patients, visits.Count,
                TimeConstants.FromHours(fitted.WindowHours, unit), TimeConstants.Name(unit));
            if (parse.GetValue(output) is string target)
            {
                AtomicFile.Write(target, stream =>
                {
                    using var writer = new StreamWriter(stream, new UTF8Encoding(false));
                    NetworkYamlWriter.Write(fitted.Network, writer, header);
                });
                WriteSummary(fitted, context.Out);
                context.Out.Write("\n" + Messages.NetworkWritten(target) + "\n");
            }
            else
            {
                NetworkYamlWriter.Write(fitted.Network, context.Out, header);
            }

            return ExitCodes.Success;
        });
        return command;
    }

    private static List<UnitVisit> ReadLog(string path)
    {
        if (InputFile.TryRead(path, "a movement log", InputFile.MaxMovementLogBytes, out var problem) is not string text)
        {
            throw new InputException(problem!.ToString());
        }

        var (visits, diagnostics) = MovementLogReader.Read(text, path);
        if (diagnostics.Any(d => d.IsError))
        {
            throw new InputException(string.Join("\n", diagnostics.Where(d => d.IsError)));
        }

        return [.. visits];
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

    private static void WriteSummary(FittedNetwork fitted, TextWriter output) => FittedUnitColumns.WriteTable(fitted, output);
}
