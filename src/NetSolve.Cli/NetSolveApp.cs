using System.CommandLine;
using NetSolve.Cli.Commands;
using NetSolve.Solving;

namespace NetSolve.Cli;

/// <summary>Builds the <c>netsolve</c> command tree and runs it with the contract's exit codes.</summary>
internal static class NetSolveApp
{
    /// <summary>Runs the command line; never throws.</summary>
    public static int Run(string[] args, CliContext context)
    {
        var root = BuildRoot(context);
        var parse = root.Parse(args);
        if (parse.Errors.Count > 0)
        {
            foreach (var error in parse.Errors)
            {
                context.Report("netsolve: " + error.Message);
            }

            context.Report("Run 'netsolve --help' for usage.");
            return ExitCodes.Usage;
        }

        bool verbose = args.Contains("--verbose");
        try
        {
            return parse.Invoke(new InvocationConfiguration
            {
                Output = context.Out,
                Error = context.Error,
                EnableDefaultExceptionHandler = false,
            });
        }
        catch (InputException exception)
        {
            context.Report(exception.Message);
            return ExitCodes.InvalidInput;
        }
        catch (TrafficEquationsException exception)
        {
            context.Report("netsolve: " + exception.Message);
            return ExitCodes.InvalidInput;
        }
        catch (OperationCanceledException)
        {
            context.Report("netsolve: stopped");
            return ExitCodes.InvalidInput;
        }
#pragma warning disable CA1031 // The one place a defect is caught: one line instead of a stack trace.
        catch (Exception exception)
#pragma warning restore CA1031
        {
            context.Report($"netsolve: internal error: {exception.Message}" + (verbose ? "\n" + exception : " (run again with --verbose for details)"));
            return ExitCodes.InternalError;
        }
    }

    /// <summary>The root command with every subcommand.</summary>
    public static RootCommand BuildRoot(CliContext context)
    {
        var root = new RootCommand("NetSolve: queueing-network planning for hospital units. Finds where patient pathways saturate, "
            + "what-if and staffing answers, from Jackson-network formulas and simulation.");
        root.Options.Add(CommonOptions.Verbose);
        root.Subcommands.Add(CheckCommand.Create(context));
        root.Subcommands.Add(SolveCommand.Create(context));
        root.Subcommands.Add(FitCommand.Create(context));
        root.Subcommands.Add(GrowthCommand.Create(context));
        root.Subcommands.Add(CompareCommand.Create(context));
        root.Subcommands.Add(StaffCommand.Create(context));
        root.Subcommands.Add(PathwayCommand.Create(context));
        root.Subcommands.Add(SimulateCommand.Create(context));
        root.Subcommands.Add(MapCommand.Create(context));
        root.Subcommands.Add(ReportCommand.Create(context));
        return root;
    }
}
