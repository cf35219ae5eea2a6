using System.Globalization;
using NetSolve.Cli;

namespace NetSolve.Tests.Support;

/// <summary>Runs <c>netsolve</c> in this process with stdout and stderr captured: the one way tests drive the command line.</summary>
internal static class CliRun
{
    /// <summary>Runs the command line with these arguments, as <c>netsolve ARGS...</c> would.</summary>
    public static CliResult Run(params string[] args)
    {
        // The writers format with the current culture, as the console's do, so culture tests see what a planner would.
        using var output = new StringWriter(CultureInfo.CurrentCulture);
        using var error = new StringWriter(CultureInfo.CurrentCulture);
        int exitCode = NetSolveApp.Run(args, new CliContext(output, error));
        return new CliResult(exitCode, output.ToString(), error.ToString());
    }
}
