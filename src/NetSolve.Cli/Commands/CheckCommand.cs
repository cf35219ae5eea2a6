using System.CommandLine;
using System.Globalization;

namespace NetSolve.Cli.Commands;

/// <summary><c>netsolve check FILE</c>: validates a network file and shows its warnings, solving nothing.</summary>
internal static class CheckCommand
{
    public static Command Create(CliContext context)
    {
        var input = new NetworkInput();
        var command = new Command("check", "Validate a network file: report every error and warning with file, line, column and unit.")
        {
            input.File, input.Set,
        };
        command.SetAction(parse =>
        {
            var network = input.Load(parse, context);
            context.Out.Write(string.Create(CultureInfo.InvariantCulture,
                $"{parse.GetValue(input.File)}: valid: {network.Units.Length} units, {network.Arrivals.Length} arrival streams, {network.Routes.Length} routes\n"));
            return ExitCodes.Success;
        });
        return command;
    }
}
