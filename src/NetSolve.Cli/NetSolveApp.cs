using System.CommandLine;
using NetSolve.Cli.Commands;
using NetSolve.Cli.Settings;
using NetSolve.Solving;

namespace NetSolve.Cli;

/// <summary>Builds the <c>netsolve</c> command tree and runs it with the contract's exit codes.</summary>
internal static class NetSolveApp
{
    /// <summary>Runs the command line; never throws.</summary>
    public static int Run(string[] args, CliContext context)
    {
        bool verbose = args.Contains("--verbose");
        try
        {
            var root = BuildRoot(context);
            // No response files: "@name" is a value as typed (a shift list, a label), never a file to read arguments from.
            var parse = root.Parse(args, new ParserConfiguration { ResponseFileTokenReplacer = null });
            // An unknown option taken for FILE is no parse error: look for unknown words even then.
            var problems = UnknownWords.Problems(parse, args);
            if (problems.Count > 0)
            {
                return Usage(problems, context);
            }

            return parse.Invoke(new InvocationConfiguration
            {
                Output = context.Out,
                Error = context.Error,
                EnableDefaultExceptionHandler = false,
            });
        }
        catch (UsageException exception)
        {
            return Usage(exception.Problems, context);
        }
        catch (InputException exception)
        {
            context.Report(exception.Message);
            return ExitCodes.InvalidInput;
        }
        catch (TrafficEquationsException exception)
        {
            context.Report(Messages.SolverProblem(exception.Message));
            return ExitCodes.InvalidInput;
        }
        catch (OperationCanceledException)
        {
            context.Report(Messages.Stopped);
            return ExitCodes.InvalidInput;
        }
#pragma warning disable CA1031 // The one place a defect is caught: one line instead of a stack trace.
        catch (Exception exception)
#pragma warning restore CA1031
        {
            context.Report(Messages.InternalError(exception, verbose));
            return ExitCodes.InternalError;
        }
    }

    /// <summary>The root command with every subcommand.</summary>
    public static RootCommand BuildRoot(CliContext context)
    {
        var root = new RootCommand("NetSolve: queueing-network planning for hospital units. Finds where patient pathways saturate, "
            + "what-if and staffing answers, from Jackson-network formulas and simulation.");
        root.Options.Add(CommonOptions.Verbose());
        root.Subcommands.Add(new CheckCommand().Create(context));
        root.Subcommands.Add(new SolveCommand().Create(context));
        root.Subcommands.Add(FitCommand.Create(context));
        root.Subcommands.Add(new GrowthCommand().Create(context));
        root.Subcommands.Add(CompareCommand.Create(context));
        root.Subcommands.Add(new StaffCommand().Create(context));
        root.Subcommands.Add(new PathwayCommand().Create(context));
        root.Subcommands.Add(new SimulateCommand().Create(context));
        root.Subcommands.Add(new MapCommand().Create(context));
        root.Subcommands.Add(new ReportCommand().Create(context));
        return root;
    }

    /// <summary>Wrong usage: every problem, one line each, then where to read about usage; exit 2.</summary>
    private static int Usage(IEnumerable<string> problems, CliContext context)
    {
        foreach (string problem in problems)
        {
            context.Report(Messages.Usage(problem));
        }

        context.Report(Messages.UsageHint);
        return ExitCodes.Usage;
    }
}
